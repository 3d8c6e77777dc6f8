import { useMemo, useState } from 'react';
import { useParams } from 'react-router-dom';
import { Button, Callout, FileInput, FormGroup, HTMLSelect, HTMLTable, Intent, OverlayToaster, Position, ProgressBar, Tab, Tabs, Tag } from '@blueprintjs/core';
import { PageHeader } from '../../../components/PageHeader';
import { QueryState } from '../../../components/QueryState';
import type { ShadedRange } from '../../../components/FrequencyChart';
import { downloadPartFile } from '../api/download-part-file';
import { usePart } from '../api/get-part';
import { useUploadDocument } from '../api/upload-document';
import { DOCUMENT_KINDS, type DocumentKind, type LibraryBand, type PartDetail } from '../types';
import { BandPicker } from './BandPicker';
import { MeasurementUploadDialog } from './MeasurementUploadDialog';
import { PartCurves } from './PartCurves';
import { PartEditorDialog } from './PartEditorDialog';
import { PartHistory } from './PartHistory';
import { PartReviewAid } from './PartReviewAid';
import { PartSourcing } from './PartSourcing';
import { ReviewActions } from './ReviewActions';
import { LIFECYCLE_INTENT, LIFECYCLE_LABEL, REVIEW_STATE_INTENT, bandSpan, fmt, rangesParam } from './part-labels';

const toaster = OverlayToaster.createAsync({ position: Position.TOP });
const fail = (e: Error) => toaster.then((t) => t.show({ intent: Intent.DANGER, message: e.message }));
const mm = (a: number | null, b: number | null) => (a === null && b === null ? '—' : `${fmt(a, 1)} × ${fmt(b, 1)} mm`);

function Overview({ part }: { part: PartDetail }) {
  const rows: [string, string][] = [
    ['Manufacturer', part.manufacturer],
    ['MPN', part.mpn],
    ['Form factor', part.formFactor],
    ['Mounting', part.mounting ?? '—'],
    ['Feed / connector', part.connector],
    ['Polarization', part.polarization],
    ['Nominal impedance', `${part.nominalImpedanceOhms} Ω`],
    ['Size', `${fmt(part.lengthMm, 1)} × ${fmt(part.widthMm, 1)} × ${fmt(part.heightMm, 1)} mm`],
    ['Evaluation ground plane', mm(part.evalGroundLengthMm, part.evalGroundWidthMm)],
    ['Operating temperature', part.tempMinC === null ? '—' : `${part.tempMinC} … ${part.tempMaxC} °C`],
    ['Created by', part.createdBy?.name ?? '—'],
    ['Submitted', part.submittedBy ? `${part.submittedBy.name}, ${new Date(part.submittedAt!).toLocaleDateString()}` : '—'],
    ['Reviewed', part.reviewedBy ? `${part.reviewedBy.name}, ${new Date(part.reviewedAt!).toLocaleDateString()}` : '—'],
    ['Version', String(part.version)],
  ];
  return (
    <div className="bw-grid-2">
      <section className="bw-panel">
        <HTMLTable compact className="bw-properties">
          <tbody>
            {rows.map(([k, v]) => (
              <tr key={k}>
                <th>{k}</th>
                <td>{v}</td>
              </tr>
            ))}
          </tbody>
        </HTMLTable>
        {part.notes && <p className="bw-gap">{part.notes}</p>}
      </section>
      <section className="bw-panel">
        <h3>Datasheet bands</h3>
        {part.specBands.length === 0 ? (
          <p className="bw-muted">None.</p>
        ) : (
          <HTMLTable compact striped>
            <thead>
              <tr>
                <th>MHz</th>
                <th>Max VSWR</th>
                <th>Min RL (dB)</th>
                <th>Efficiency (%)</th>
                <th>Peak (dBi)</th>
                <th>Average (dBi)</th>
              </tr>
            </thead>
            <tbody>
              {part.specBands.map((b) => (
                <tr key={b.id}>
                  <td>
                    {b.fromMhz}–{b.toMhz}
                  </td>
                  <td>{fmt(b.maxVswr)}</td>
                  <td>{fmt(b.minReturnLossDb, 1)}</td>
                  <td>
                    {fmt(b.efficiencyPct, 0)}
                    {b.efficiencyPct !== null && <span className="bw-muted">{` ${b.efficiencyBasis}, band ${b.efficiencyStatistic}`}</span>}
                  </td>
                  <td>
                    {fmt(b.peakGainDbi, 1)}
                    {b.peakGainDbi !== null && b.gainBasis === 'realized' && <span className="bw-muted"> realized</span>}
                  </td>
                  <td>{fmt(b.averageGainDbi, 1)}</td>
                </tr>
              ))}
            </tbody>
          </HTMLTable>
        )}
        <h3>Measurements</h3>
        {part.measurements.length === 0 ? (
          <p className="bw-muted">None uploaded.</p>
        ) : (
          <HTMLTable compact striped data-testid="measurements">
            <thead>
              <tr>
                <th>Kind</th>
                <th>File</th>
                <th>Points</th>
                <th>MHz</th>
                <th>Ground plane</th>
                <th />
              </tr>
            </thead>
            <tbody>
              {part.measurements.map((m) => (
                <tr key={m.id}>
                  <td>
                    {m.kind}{' '}
                    {m.current && (
                      <Tag minimal intent={Intent.PRIMARY}>
                        current
                      </Tag>
                    )}
                  </td>
                  <td>
                    <a onClick={() => downloadPartFile(part.id, 'measurements', m.id, m.fileName).catch(fail)}>{m.fileName}</a>
                  </td>
                  <td>{m.pointCount}</td>
                  <td>
                    {fmt(m.fromMhz, 1)}–{fmt(m.toMhz, 1)}
                  </td>
                  <td>{mm(m.groundLengthMm, m.groundWidthMm)}</td>
                  <td className="bw-muted">{m.sourceFormat}</td>
                </tr>
              ))}
            </tbody>
          </HTMLTable>
        )}
      </section>
    </div>
  );
}

function Documents({ part }: { part: PartDetail }) {
  const upload = useUploadDocument();
  const [file, setFile] = useState<File | null>(null);
  const [kind, setKind] = useState<DocumentKind>('datasheet');
  const [progress, setProgress] = useState<number | null>(null);
  return (
    <section className="bw-panel">
      {part.documents.length === 0 ? (
        <p className="bw-muted">No documents.</p>
      ) : (
        <HTMLTable compact striped>
          <thead>
            <tr>
              <th>Title</th>
              <th>Kind</th>
              <th>Type</th>
              <th>Size</th>
              <th>SHA-256</th>
            </tr>
          </thead>
          <tbody>
            {part.documents.map((d) => (
              <tr key={d.id}>
                <td>
                  <a onClick={() => downloadPartFile(part.id, 'documents', d.id, d.fileName).catch(fail)}>{d.title}</a>
                </td>
                <td>{d.kind}</td>
                <td>{d.contentType}</td>
                <td>{(d.sizeBytes / 1024).toFixed(1)} KiB</td>
                <td className="bw-mono">{d.sha256.slice(0, 16)}…</td>
              </tr>
            ))}
          </tbody>
        </HTMLTable>
      )}
      {part.permissions.uploadData && (
        <div className="bw-row bw-gap">
          <HTMLSelect aria-label="Document kind" value={kind} options={[...DOCUMENT_KINDS]} onChange={(e) => setKind(e.currentTarget.value as DocumentKind)} />
          <FileInput
            text={file?.name ?? 'PDF, PNG, SVG or DXF…'}
            hasSelection={!!file}
            inputProps={{ 'aria-label': 'Document file' }}
            onInputChange={(e) => setFile((e.target as HTMLInputElement).files?.[0] ?? null)}
          />
          <Button
            icon="upload"
            text="Attach"
            disabled={!file}
            loading={upload.isPending}
            onClick={() =>
              file &&
              upload.mutate(
                { id: part.id, file, kind, onProgress: setProgress },
                {
                  onSuccess: () => {
                    setFile(null);
                    setProgress(null);
                  },
                  onError: (e) => {
                    setProgress(null);
                    fail(e);
                  },
                },
              )
            }
          />
          {progress !== null && <ProgressBar value={progress} className="bw-progress-inline" />}
        </div>
      )}
    </section>
  );
}

/** One part: overview, curves with band overlays and per-range figures, documents, sourcing, history. */
export function PartPage() {
  const id = Number(useParams().id);
  const [picked, setPicked] = useState<LibraryBand[]>([]);
  const ranges = picked.length ? rangesParam(picked) : undefined;
  const part = usePart(id, ranges);
  const [editing, setEditing] = useState(false);
  const [uploading, setUploading] = useState(false);
  const [tab, setTab] = useState('overview');
  const overlays = useMemo<ShadedRange[]>(
    () => [
      ...(part.data?.specBands ?? []).map((b) => ({ fromHz: b.fromMhz * 1e6, toHz: b.toMhz * 1e6, label: 'spec' })),
      ...picked.map((b) => {
        const s = bandSpan(b);
        return { fromHz: s.fromMhz * 1e6, toHz: s.toMhz * 1e6, label: b.designation };
      }),
    ],
    [part.data?.specBands, picked],
  );
  const p = part.data;
  return (
    <QueryState isPending={part.isPending} error={part.error}>
      {p && (
        <>
          <PageHeader
            title={`${p.manufacturer} ${p.mpn}`}
            subtitle={
              <>
                {p.title}{' '}
                <Tag minimal intent={REVIEW_STATE_INTENT[p.reviewState]} data-testid="review-state">
                  {p.reviewState}
                </Tag>{' '}
                <Tag minimal intent={LIFECYCLE_INTENT[p.lifecycle]}>
                  {LIFECYCLE_LABEL[p.lifecycle]}
                </Tag>
              </>
            }
            actions={
              <>
                {p.permissions.uploadData && <Button icon="upload" text="Upload data" onClick={() => setUploading(true)} />}
                {p.permissions.edit && <Button icon="edit" text="Edit" onClick={() => setEditing(true)} />}
                <ReviewActions part={p} />
              </>
            }
          />
          {p.reviewComment && (
            <Callout intent={p.reviewState === 'draft' ? Intent.DANGER : Intent.WARNING} title="Review comment" className="bw-gap">
              {p.reviewComment}
            </Callout>
          )}
          <Tabs id="part-tabs" selectedTabId={tab} onChange={(t) => setTab(String(t))} renderActiveTabPanelOnly>
            <Tab
              id="overview"
              title="Overview"
              panel={
                <>
                  <Overview part={p} />
                  <PartReviewAid partId={p.id} />
                </>
              }
            />
            <Tab
              id="curves"
              title="Curves and figures"
              panel={
                <>
                  <FormGroup label="Show bands" inline>
                    <BandPicker selected={picked} onChange={setPicked} label="Overlay band" />
                  </FormGroup>
                  <PartCurves part={p} overlays={overlays} />
                </>
              }
            />
            <Tab id="documents" title={`Documents (${p.documents.length})`} panel={<Documents part={p} />} />
            <Tab id="sourcing" title={`Sourcing (${p.offers.length})`} panel={<PartSourcing part={p} />} />
            <Tab id="history" title="History" panel={<PartHistory partId={p.id} />} />
          </Tabs>
          <PartEditorDialog isOpen={editing} part={p} onClose={() => setEditing(false)} onSaved={() => setEditing(false)} />
          <MeasurementUploadDialog
            partId={p.id}
            isOpen={uploading}
            onClose={() => setUploading(false)}
            defaultGround={{ lengthMm: p.evalGroundLengthMm, widthMm: p.evalGroundWidthMm }}
          />
        </>
      )}
    </QueryState>
  );
}
