import { type DragEvent, useCallback, useMemo, useState } from 'react';
import { Callout, FileInput, FormGroup, H4, HTMLSelect, Intent, ProgressBar, SegmentedControl, Tag } from '@blueprintjs/core';
import { FrequencyChart, type FrequencySeries, type ShadedRange, type ThresholdLine } from '../../../components/FrequencyChart';
import { ApiError } from '../../../lib/api-client';
import { useAnalyzeTouchstone } from '../api/analyze-touchstone';
import { useOverlayBands } from '../api/get-overlay-bands';
import type { MatchCriterionName, TouchstoneAnalysis } from '../types';
import { fixed, mhz, significant } from './format';
import { ResultList } from './ResultList';

type Threshold = 'vswr-2' | 'vswr-3' | 'rl-10';
const THRESHOLDS: Record<Threshold, { label: string; criterion: MatchCriterionName; vswrMax?: number }> = {
  'vswr-2': { label: 'VSWR ≤ 2', criterion: 'vswr', vswrMax: 2 },
  'vswr-3': { label: 'VSWR ≤ 3', criterion: 'vswr', vswrMax: 3 },
  'rl-10': { label: 'S11 ≤ −10 dB', criterion: 'return-loss-10db' },
};
// VSWR beyond 6 says nothing more for selection; the axis stops there so the matched region stays readable.
const VSWR_AXIS: [number, number] = [1, 6];

function FileProblem({ error }: { error: Error }) {
  const line = error instanceof ApiError ? (error.body.line as number | null | undefined) : undefined;
  return (
    <Callout intent={Intent.DANGER} title="This file could not be read" className="bw-gap" role="alert">
      {typeof line === 'number' && (
        <Tag intent={Intent.DANGER} minimal className="bw-tool-line-tag">
          Line {line}
        </Tag>
      )}
      <span>{error.message}</span>
      {error instanceof ApiError && <div className="bw-muted">Code {error.code}</div>}
    </Callout>
  );
}

function AnalysisView({
  analysis,
  overlayLabel,
  overlay,
}: {
  analysis: TouchstoneAnalysis;
  overlayLabel?: string;
  overlay?: { fromHz: number; toHz: number };
}) {
  const frequencyHz = useMemo(() => analysis.curve.map((p) => p.frequencyHz), [analysis]);
  const series = useMemo<FrequencySeries[]>(
    () => [
      { label: 'VSWR', unit: '', values: analysis.curve.map((p) => p.vswr), range: VSWR_AXIS },
      { label: 'Return loss', unit: 'dB', values: analysis.curve.map((p) => p.returnLossDb), side: 'right' },
    ],
    [analysis],
  );
  const ranges = useMemo<ShadedRange[]>(
    () => [
      ...analysis.matchedRanges.map((r) => ({ ...r, kind: 'match' as const, label: 'matched' })),
      ...(overlay && overlayLabel ? [{ ...overlay, label: overlayLabel, kind: 'band' as const }] : []),
    ],
    [analysis, overlay, overlayLabel],
  );
  const threshold = useMemo<ThresholdLine>(
    () =>
      analysis.criterion === 'vswr'
        ? { value: analysis.thresholdVswr, unit: '', label: `VSWR ${significant(analysis.thresholdVswr, 3)}` }
        : { value: analysis.thresholdReturnLossDb, unit: 'dB', label: `RL ${significant(analysis.thresholdReturnLossDb, 3)} dB` },
    [analysis],
  );
  const criterionText =
    analysis.criterion === 'vswr' ? `VSWR ≤ ${significant(analysis.thresholdVswr, 3)}` : `return loss ≥ ${significant(analysis.thresholdReturnLossDb, 3)} dB`;
  return (
    <>
      <FrequencyChart
        title={`VSWR and return loss of port ${analysis.port}`}
        frequencyHz={frequencyHz}
        series={series}
        ranges={ranges}
        threshold={threshold}
        height={320}
      />
      <div className="bw-grid-2">
        <div>
          <H4>Matched ranges ({criterionText})</H4>
          {analysis.matchedRanges.length === 0 ? (
            <p className="bw-muted">No frequency in the file meets the criterion.</p>
          ) : (
            <ul className="bw-tool-ranges" aria-label="Matched ranges">
              {analysis.matchedRanges.map((r) => (
                <li key={`${r.fromHz}-${r.toHz}`}>
                  <Tag intent={Intent.SUCCESS} minimal>
                    {mhz(r.fromHz)} – {mhz(r.toHz)}
                  </Tag>{' '}
                  <span className="bw-muted">{significant((r.toHz - r.fromHz) / 1e6, 4)} MHz wide</span>
                </li>
              ))}
            </ul>
          )}
          {analysis.matchedRangeCount > analysis.matchedRanges.length && (
            <p className="bw-muted">
              The first {analysis.matchedRanges.length} of {analysis.matchedRangeCount} matched ranges are listed; a curve that crosses the limit this often is
              usually noisy.
            </p>
          )}
        </div>
        <ResultList
          rows={[
            ['File', `Touchstone ${analysis.version}, ${analysis.ports}-port, ${analysis.parameter} ${analysis.format}`],
            ['Reference', analysis.referenceOhms.map((r) => `${significant(r, 4)} Ω`).join(', ')],
            ['Points', `${analysis.points}${analysis.resampled ? ` (plot resampled to ${analysis.curve.length})` : ''}`],
            ['Measured', `${mhz(analysis.minFrequencyHz)} – ${mhz(analysis.maxFrequencyHz)}`],
            [
              'Best match',
              `${mhz(analysis.bestMatch.frequencyHz)}: VSWR ${fixed(analysis.bestMatch.vswr, 2)}, RL ${fixed(analysis.bestMatch.returnLossDb, 1, 'dB')}`,
            ],
          ]}
        />
      </div>
    </>
  );
}

/** Drop or pick a Touchstone file; analysed by POST /api/rf/touchstone/analyze, nothing stored. */
export function TouchstonePanel() {
  const [file, setFile] = useState<File | null>(null);
  const [threshold, setThreshold] = useState<Threshold>('vswr-2');
  const [port, setPort] = useState(1);
  const [bandKey, setBandKey] = useState('');
  const [progress, setProgress] = useState<number | null>(null);
  const [dragging, setDragging] = useState(false);
  const analyze = useAnalyzeTouchstone();
  const bands = useOverlayBands();

  const run = useCallback(
    (next: { file: File; threshold: Threshold; port: number }) => {
      const choice = THRESHOLDS[next.threshold];
      setProgress(0);
      analyze.mutate(
        { file: next.file, port: next.port, criterion: choice.criterion, vswrMax: choice.vswrMax, onUploadProgress: setProgress },
        { onSettled: () => setProgress(null) },
      );
    },
    [analyze],
  );

  const choose = (picked: File | undefined) => {
    if (!picked) return;
    setFile(picked);
    setPort(1);
    run({ file: picked, threshold, port: 1 });
  };

  const onDrop = (event: DragEvent<HTMLDivElement>) => {
    event.preventDefault();
    setDragging(false);
    choose(event.dataTransfer.files[0]);
  };

  const analysis = analyze.data;
  // Only bands that overlap the measured range are worth overlaying once a file is loaded.
  const bandList = (bands.data?.bands ?? []).filter((b) => !analysis || (b.toHz >= analysis.minFrequencyHz && b.fromHz <= analysis.maxFrequencyHz));
  const band = bandList.find((b) => b.key === bandKey);

  return (
    <section className="bw-panel" aria-label="Touchstone preview">
      <div
        className={`bw-dropzone${dragging ? ' bw-dropzone--active' : ''}`}
        onDragOver={(e) => {
          e.preventDefault();
          setDragging(true);
        }}
        onDragLeave={() => setDragging(false)}
        onDrop={onDrop}
      >
        <div>Drop a .s1p, .s2p or .ts file here, or pick one (at most 25 MiB unless your administrator set another limit; nothing is stored).</div>
        <FileInput
          text={file ? file.name : 'Choose a Touchstone file…'}
          buttonText="Browse"
          inputProps={{ accept: '.s1p,.s2p,.ts,.txt', 'aria-label': 'Touchstone file' }}
          onInputChange={(e) => choose((e.currentTarget as HTMLInputElement).files?.[0])}
        />
      </div>
      <div className="bw-row bw-gap">
        <FormGroup label="Match criterion">
          <SegmentedControl
            options={(Object.keys(THRESHOLDS) as Threshold[]).map((value) => ({ value, label: THRESHOLDS[value].label }))}
            value={threshold}
            onValueChange={(value) => {
              setThreshold(value as Threshold);
              if (file) run({ file, threshold: value as Threshold, port });
            }}
          />
        </FormGroup>
        {analysis && analysis.ports > 1 && (
          <FormGroup label="Port" labelFor="ts-port">
            <HTMLSelect
              id="ts-port"
              value={port}
              options={[
                { value: 1, label: 'Port 1 (S11)' },
                { value: 2, label: 'Port 2 (S22)' },
              ]}
              onChange={(e) => {
                const next = Number(e.currentTarget.value);
                setPort(next);
                if (file) run({ file, threshold, port: next });
              }}
            />
          </FormGroup>
        )}
        <FormGroup label="Band overlay" labelFor="ts-band" helperText={bands.data && !bands.data.fromLibrary ? 'Built-in short list' : undefined}>
          <HTMLSelect
            id="ts-band"
            value={bandKey}
            options={[
              { value: '', label: 'None' },
              ...bandList.map((b) => ({ value: b.key, label: `${b.label} (${significant(b.fromHz / 1e6, 6)}–${significant(b.toHz / 1e6, 6)} MHz)` })),
            ]}
            onChange={(e) => setBandKey(e.currentTarget.value)}
          />
        </FormGroup>
      </div>
      {progress !== null && (
        <div className="bw-gap" aria-label="Upload progress">
          <ProgressBar value={progress < 1 ? progress : undefined} intent={Intent.PRIMARY} />
          <div className="bw-muted">{progress < 1 ? `Uploading ${Math.round(progress * 100)} %` : 'Reading the file…'}</div>
        </div>
      )}
      {analyze.error && <FileProblem error={analyze.error} />}
      {analysis && !analyze.error && <AnalysisView analysis={analysis} overlay={band} overlayLabel={band?.label} />}
      {!analysis && !analyze.error && progress === null && <p className="bw-muted">No file yet.</p>}
    </section>
  );
}
