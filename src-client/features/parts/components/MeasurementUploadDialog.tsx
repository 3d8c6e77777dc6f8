import { useEffect, useState } from 'react';
import { Button, Callout, Dialog, DialogBody, DialogFooter, FileInput, FormGroup, HTMLSelect, InputGroup, Intent, ProgressBar } from '@blueprintjs/core';
import { FrequencyChart } from '../../../components/FrequencyChart';
import { ApiError } from '../../../lib/api-client';
import { useUploadMeasurement } from '../api/upload-measurement';
import { MEASUREMENT_KINDS, type CurvePreview, type MeasurementBasis, type MeasurementKind } from '../types';

export interface MeasurementUploadDialogProps {
  partId: number;
  isOpen: boolean;
  onClose: () => void;
  /** Ground plane prefilled from the part's evaluation board. */
  defaultGround?: { lengthMm: number | null; widthMm: number | null };
}

const KIND_LABEL: Record<MeasurementKind, string> = {
  s11: 'S11 (Touchstone .s1p/.s2p)',
  efficiency: 'Efficiency (CSV)',
  'peak-gain': 'Peak gain (CSV)',
  'average-gain': 'Average gain (CSV)',
};

/** What the curve includes, in words; the first choice is the usual one and is preselected. */
const BASIS_CHOICES: Record<MeasurementKind, { value: MeasurementBasis; label: string }[]> = {
  s11: [],
  efficiency: [
    { value: 'total', label: 'Total efficiency (includes mismatch loss)' },
    { value: 'radiation', label: 'Radiation efficiency (mismatch not included)' },
  ],
  'peak-gain': [
    { value: 'peak', label: 'Antenna gain (mismatch not included)' },
    { value: 'realized', label: 'Realized gain (includes mismatch loss)' },
  ],
  'average-gain': [
    { value: 'peak', label: 'Antenna gain (mismatch not included)' },
    { value: 'realized', label: 'Realized gain (includes mismatch loss)' },
  ],
};

const BASIS_HELP: Record<MeasurementKind, string> = {
  s11: '',
  efficiency:
    'Chamber reports and most datasheets give total efficiency, which already includes the mismatch; radiation efficiency leaves it out and is combined with the S11 curve.',
  'peak-gain': 'Datasheets usually give the antenna gain; choose realized gain if the figure already includes the mismatch.',
  'average-gain': 'Datasheets usually give the antenna gain; choose realized gain if the figure already includes the mismatch.',
};

const usualBasis = (kind: MeasurementKind): MeasurementBasis | undefined => BASIS_CHOICES[kind][0]?.value;

/** Check a file first (nothing stored: the preview or the offending line), then upload it with progress. */
export function MeasurementUploadDialog({ partId, isOpen, onClose, defaultGround }: MeasurementUploadDialogProps) {
  const upload = useUploadMeasurement();
  const [kind, setKind] = useState<MeasurementKind>('s11');
  const [basis, setBasis] = useState<MeasurementBasis | undefined>(undefined);
  const [file, setFile] = useState<File | null>(null);
  const [ground, setGround] = useState({ length: '', width: '' });
  const [conditions, setConditions] = useState('');
  const [units, setUnits] = useState({ frequencyUnit: '', valueUnit: '' });
  const [preview, setPreview] = useState<CurvePreview | null>(null);
  const [error, setError] = useState<ApiError | null>(null);
  const [progress, setProgress] = useState<number | null>(null);

  useEffect(() => {
    if (!isOpen) return;
    setFile(null);
    setPreview(null);
    setError(null);
    setProgress(null);
    setConditions('');
    setGround({ length: defaultGround?.lengthMm?.toString() ?? '', width: defaultGround?.widthMm?.toString() ?? '' });
  }, [isOpen, defaultGround?.lengthMm, defaultGround?.widthMm]);

  const send = (dryRun: boolean) => {
    if (!file) return;
    setError(null);
    setProgress(0);
    upload.mutate(
      {
        id: partId,
        file,
        kind,
        basis,
        dryRun,
        groundLengthMm: ground.length,
        groundWidthMm: ground.width,
        conditions,
        ...(kind === 's11' ? {} : units),
        onProgress: setProgress,
      },
      {
        onSuccess: (result) => {
          setProgress(null);
          setPreview(result.preview);
          if (!dryRun) onClose();
        },
        onError: (e) => {
          setProgress(null);
          setPreview(null);
          setError(e as ApiError);
        },
      },
    );
  };
  const rows = (error?.body.rows as { line: number; row: number; message: string }[] | undefined) ?? [];

  return (
    <Dialog isOpen={isOpen} onClose={onClose} title="Upload measured data" style={{ width: 720 }}>
      <DialogBody>
        <div className="bw-form-grid">
          <FormGroup label="Kind" labelFor="upload-kind">
            <HTMLSelect
              id="upload-kind"
              value={kind}
              onChange={(e) => {
                const next = e.currentTarget.value as MeasurementKind;
                setKind(next);
                setBasis(usualBasis(next));
                setPreview(null);
                setError(null);
              }}
            >
              {MEASUREMENT_KINDS.map((k) => (
                <option key={k} value={k}>
                  {KIND_LABEL[k]}
                </option>
              ))}
            </HTMLSelect>
          </FormGroup>
          <FormGroup label="File" labelFor="upload-file">
            <FileInput
              inputProps={{ id: 'upload-file', 'aria-label': 'Measurement file' }}
              text={file?.name ?? 'Choose file…'}
              hasSelection={!!file}
              onInputChange={(e) => {
                setFile((e.target as HTMLInputElement).files?.[0] ?? null);
                setPreview(null);
                setError(null);
              }}
            />
          </FormGroup>
          <FormGroup label="Ground plane length (mm)" labelFor="upload-gl">
            <InputGroup id="upload-gl" value={ground.length} onChange={(e) => setGround({ ...ground, length: e.currentTarget.value })} />
          </FormGroup>
          <FormGroup label="Ground plane width (mm)" labelFor="upload-gw">
            <InputGroup id="upload-gw" value={ground.width} onChange={(e) => setGround({ ...ground, width: e.currentTarget.value })} />
          </FormGroup>
          {kind !== 's11' && (
            <>
              <FormGroup label="The figures are" labelFor="upload-basis" helperText={BASIS_HELP[kind]}>
                <HTMLSelect id="upload-basis" value={basis} onChange={(e) => setBasis(e.currentTarget.value as MeasurementBasis)}>
                  {BASIS_CHOICES[kind].map((choice) => (
                    <option key={choice.value} value={choice.value}>
                      {choice.label}
                    </option>
                  ))}
                </HTMLSelect>
              </FormGroup>
              <FormGroup label="Frequency unit (if not in the header)" labelFor="upload-fu">
                <HTMLSelect
                  id="upload-fu"
                  value={units.frequencyUnit}
                  options={['', 'Hz', 'kHz', 'MHz', 'GHz']}
                  onChange={(e) => setUnits({ ...units, frequencyUnit: e.currentTarget.value })}
                />
              </FormGroup>
              <FormGroup label="Value unit (if not in the header)" labelFor="upload-vu">
                <HTMLSelect
                  id="upload-vu"
                  value={units.valueUnit}
                  options={kind === 'efficiency' ? ['', '%', 'dB', 'ratio'] : ['', 'dBi']}
                  onChange={(e) => setUnits({ ...units, valueUnit: e.currentTarget.value })}
                />
              </FormGroup>
            </>
          )}
        </div>
        <FormGroup label="Conditions" labelFor="upload-cond">
          <InputGroup
            id="upload-cond"
            placeholder="Fixture, enclosure, cable, chamber"
            value={conditions}
            onChange={(e) => setConditions(e.currentTarget.value)}
          />
        </FormGroup>
        {progress !== null && <ProgressBar value={progress} intent={Intent.PRIMARY} className="bw-gap" />}
        {error && (
          <Callout
            intent={Intent.DANGER}
            title={error.body.line ? `The file was refused at line ${String(error.body.line)}` : 'The file was refused'}
            className="bw-gap"
            data-testid="upload-error"
          >
            <p>{error.message}</p>
            {rows.length > 0 && (
              <ul>
                {rows.slice(0, 12).map((r) => (
                  <li key={r.line}>
                    Line {r.line} (row {r.row}): {r.message}
                  </li>
                ))}
              </ul>
            )}
            <p className="bw-muted">Nothing was stored.</p>
          </Callout>
        )}
        {preview && (
          <div data-testid="upload-preview">
            <Callout intent={Intent.SUCCESS} className="bw-gap">
              {preview.sourceFormat}: {preview.pointCount} points, {preview.fromMhz}–{preview.toMhz} MHz
              {preview.referenceOhms ? `, reference ${preview.referenceOhms} Ω` : ''}.
            </Callout>
            <FrequencyChart
              title={`Preview: ${preview.valueLabel}`}
              frequencyHz={preview.frequenciesMhz.map((f) => f * 1e6)}
              height={200}
              series={[
                {
                  label: preview.valueLabel,
                  unit: preview.kind === 's11' ? 'dB' : preview.kind === 'efficiency' ? '%' : 'dBi',
                  values: preview.values,
                  inverted: false,
                },
              ]}
            />
          </div>
        )}
      </DialogBody>
      <DialogFooter
        actions={
          <>
            <Button text="Cancel" onClick={onClose} />
            <Button text="Check file" disabled={!file} loading={upload.isPending && upload.variables?.dryRun} onClick={() => send(true)} />
            <Button
              intent={Intent.PRIMARY}
              text="Upload"
              disabled={!file || !!error}
              loading={upload.isPending && !upload.variables?.dryRun}
              onClick={() => send(false)}
            />
          </>
        }
      />
    </Dialog>
  );
}
