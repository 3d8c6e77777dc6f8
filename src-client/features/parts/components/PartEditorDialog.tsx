import { useEffect, useState } from 'react';
import { Button, Callout, Classes, Dialog, DialogBody, DialogFooter, FormGroup, HTMLSelect, InputGroup, Intent, TextArea } from '@blueprintjs/core';
import { ApiError } from '../../../lib/api-client';
import { useCreatePart } from '../api/create-part';
import { useUpdatePart } from '../api/update-part';
import {
  CONNECTORS,
  type EfficiencyBasis,
  FORM_FACTORS,
  type FigureStatistic,
  type GainBasis,
  LIFECYCLES,
  POLARIZATIONS,
  type PartDetail,
  type PartInput,
  type SpecBand,
} from '../types';

export interface PartEditorDialogProps {
  isOpen: boolean;
  onClose: () => void;
  onSaved: (id: number) => void;
  /** The part to edit; a new draft when absent. */
  part?: PartDetail;
}

type BandRow = Record<'fromMhz' | 'toMhz' | 'maxVswr' | 'efficiencyPct' | 'peakGainDbi', string> & {
  efficiencyBasis: EfficiencyBasis;
  efficiencyStatistic: FigureStatistic;
  gainBasis: GainBasis;
};
/** What most datasheets quote: total efficiency averaged over the band, and the antenna's peak gain. */
const USUAL_BASES = { efficiencyBasis: 'total', efficiencyStatistic: 'average', gainBasis: 'peak' } as const;
const EMPTY_BAND: BandRow = { fromMhz: '', toMhz: '', maxVswr: '', efficiencyPct: '', peakGainDbi: '', ...USUAL_BASES };
const BASIS_SELECTS = [
  {
    key: 'efficiencyBasis',
    label: 'efficiency basis',
    options: [
      { value: 'total', label: 'total efficiency' },
      { value: 'radiation', label: 'radiation efficiency' },
    ],
  },
  {
    key: 'efficiencyStatistic',
    label: 'efficiency over the band',
    options: [
      { value: 'average', label: 'band average' },
      { value: 'minimum', label: 'band minimum' },
    ],
  },
  {
    key: 'gainBasis',
    label: 'gain basis',
    options: [
      { value: 'peak', label: 'antenna gain' },
      { value: 'realized', label: 'realized gain' },
    ],
  },
] as const;
const TEXT_FIELDS = ['manufacturer', 'mpn', 'title', 'mounting', 'notes'] as const;
const NUMBER_FIELDS = ['nominalImpedanceOhms', 'evalGroundLengthMm', 'evalGroundWidthMm', 'lengthMm', 'widthMm', 'heightMm', 'tempMinC', 'tempMaxC'] as const;
const NUMBER_LABELS: Record<(typeof NUMBER_FIELDS)[number], string> = {
  nominalImpedanceOhms: 'Impedance (Ω)',
  evalGroundLengthMm: 'Eval ground length (mm)',
  evalGroundWidthMm: 'Eval ground width (mm)',
  lengthMm: 'Length (mm)',
  widthMm: 'Width (mm)',
  heightMm: 'Height (mm)',
  tempMinC: 'Min temp (°C)',
  tempMaxC: 'Max temp (°C)',
};

const str = (v: unknown) => (v === null || v === undefined ? '' : String(v));
const num = (v: string) => (v.trim() === '' ? null : Number(v));
const bandRow = (b: SpecBand): BandRow => ({
  fromMhz: str(b.fromMhz),
  toMhz: str(b.toMhz),
  maxVswr: str(b.maxVswr),
  efficiencyPct: str(b.efficiencyPct),
  peakGainDbi: str(b.peakGainDbi),
  efficiencyBasis: b.efficiencyBasis,
  efficiencyStatistic: b.efficiencyStatistic,
  gainBasis: b.gainBasis,
});

/** Create a draft or edit a part; spec bands are edited as rows and saved together with the part. */
export function PartEditorDialog({ isOpen, onClose, onSaved, part }: PartEditorDialogProps) {
  const create = useCreatePart();
  const update = useUpdatePart();
  const [values, setValues] = useState<Record<string, string>>({});
  const [bands, setBands] = useState<BandRow[]>([]);
  const [error, setError] = useState<ApiError | null>(null);

  useEffect(() => {
    if (!isOpen) return;
    setError(null);
    setValues({
      formFactor: part?.formFactor ?? 'chip',
      connector: part?.connector ?? 'solder-pad',
      polarization: part?.polarization ?? 'linear',
      lifecycle: part?.lifecycle ?? 'active',
      ...Object.fromEntries([...TEXT_FIELDS, ...NUMBER_FIELDS].map((f) => [f, str(part?.[f] ?? (f === 'nominalImpedanceOhms' ? 50 : ''))])),
    });
    setBands(part?.specBands.map(bandRow) ?? []);
  }, [isOpen, part]);

  const field = (name: string) => error?.fieldErrors[name];
  const save = () => {
    const text = (f: (typeof TEXT_FIELDS)[number]) => values[f]?.trim() ?? '';
    const fields: Omit<PartInput, 'manufacturer' | 'mpn' | 'title'> = {
      ...Object.fromEntries(NUMBER_FIELDS.map((f) => [f, num(values[f] ?? '')])),
      mounting: text('mounting') || null,
      notes: text('notes') || null,
      formFactor: values.formFactor as PartDetail['formFactor'],
      connector: values.connector as PartDetail['connector'],
      polarization: values.polarization as PartDetail['polarization'],
      lifecycle: values.lifecycle as PartDetail['lifecycle'],
      specBands: bands.map((b) => ({
        fromMhz: Number(b.fromMhz),
        toMhz: Number(b.toMhz),
        maxVswr: num(b.maxVswr),
        minReturnLossDb: null,
        efficiencyPct: num(b.efficiencyPct),
        efficiencyBasis: b.efficiencyBasis,
        efficiencyStatistic: b.efficiencyStatistic,
        peakGainDbi: num(b.peakGainDbi),
        averageGainDbi: null,
        gainBasis: b.gainBasis,
      })),
    };
    if (fields.nominalImpedanceOhms === null) delete fields.nominalImpedanceOhms;
    const names = { manufacturer: text('manufacturer'), mpn: text('mpn'), title: text('title') };
    const done = {
      onSuccess: (p: PartDetail) => {
        onSaved(p.id);
        onClose();
      },
      onError: (e: Error) => setError(e as ApiError),
    };
    // A new part sends every name, so the server names a blank one; an edit leaves a blanked name as it was.
    if (part) update.mutate({ ...fields, ...Object.fromEntries(Object.entries(names).filter(([, v]) => v !== '')), id: part.id, version: part.version }, done);
    else create.mutate({ ...fields, ...names }, done);
  };

  const input = (name: string, label: string) => (
    <FormGroup key={name} label={label} labelFor={`part-${name}`} intent={field(name) ? Intent.DANGER : Intent.NONE} helperText={field(name)}>
      <InputGroup
        id={`part-${name}`}
        value={values[name] ?? ''}
        intent={field(name) ? Intent.DANGER : Intent.NONE}
        onChange={(e) => {
          const value = e.currentTarget.value;
          setValues((v) => ({ ...v, [name]: value }));
        }}
      />
    </FormGroup>
  );
  const select = (name: string, label: string, options: readonly string[]) => (
    <FormGroup key={name} label={label} labelFor={`part-${name}`}>
      <HTMLSelect
        id={`part-${name}`}
        value={values[name]}
        options={[...options]}
        onChange={(e) => {
          const value = e.currentTarget.value;
          setValues((v) => ({ ...v, [name]: value }));
        }}
      />
    </FormGroup>
  );

  return (
    <Dialog isOpen={isOpen} onClose={onClose} title={part ? `Edit ${part.mpn}` : 'New draft part'} style={{ width: 1000 }}>
      <DialogBody>
        {error && !Object.keys(error.fieldErrors).length && (
          <Callout intent={Intent.DANGER} className="bw-gap">
            {error.message}
          </Callout>
        )}
        <div className="bw-form-grid">
          {input('manufacturer', 'Manufacturer')}
          {input('mpn', 'Manufacturer part number')}
          {input('title', 'Title')}
          {select('formFactor', 'Form factor', FORM_FACTORS)}
          {select('connector', 'Feed / connector', CONNECTORS)}
          {select('polarization', 'Polarization', POLARIZATIONS)}
          {select('lifecycle', 'Lifecycle', LIFECYCLES)}
          {input('mounting', 'Mounting')}
          {NUMBER_FIELDS.map((f) => input(f, NUMBER_LABELS[f]))}
        </div>
        <FormGroup label="Notes" labelFor="part-notes">
          <TextArea
            id="part-notes"
            fill
            value={values.notes ?? ''}
            onChange={(e) => {
              const notes = e.currentTarget.value;
              setValues((v) => ({ ...v, notes }));
            }}
          />
        </FormGroup>
        <h4 className={Classes.HEADING}>Datasheet bands</h4>
        <p className="bw-muted">Used by search and checks where no measured curve covers a range.</p>
        <p className="bw-muted">
          Total efficiency includes the mismatch loss; radiation efficiency leaves it out and is combined with the band&apos;s VSWR. Most datasheets quote total
          efficiency averaged over the band, and the antenna&apos;s peak gain: these are preselected.
        </p>
        {bands.map((band, i) => (
          <div key={i} className="bw-row bw-gap">
            {(['fromMhz', 'toMhz', 'maxVswr', 'efficiencyPct', 'peakGainDbi'] as const).map((k) => (
              <InputGroup
                key={k}
                aria-label={`Band ${i + 1} ${k}`}
                placeholder={{ fromMhz: 'from MHz', toMhz: 'to MHz', maxVswr: 'max VSWR', efficiencyPct: 'eff. %', peakGainDbi: 'peak dBi' }[k]}
                value={band[k]}
                intent={field(`specBands.${i}.${k}`) ? Intent.DANGER : Intent.NONE}
                style={{ width: 100 }}
                onChange={(e) => {
                  const value = e.currentTarget.value;
                  setBands((rows) => rows.map((r, j) => (j === i ? { ...r, [k]: value } : r)));
                }}
              />
            ))}
            {BASIS_SELECTS.map((select) => (
              <HTMLSelect
                key={select.key}
                aria-label={`Band ${i + 1} ${select.label}`}
                value={band[select.key]}
                onChange={(e) => {
                  const value = e.currentTarget.value;
                  setBands((rows) => rows.map((r, j) => (j === i ? { ...r, [select.key]: value } : r)));
                }}
              >
                {select.options.map((o) => (
                  <option key={o.value} value={o.value}>
                    {o.label}
                  </option>
                ))}
              </HTMLSelect>
            ))}
            <Button icon="cross" variant="minimal" aria-label={`Remove band ${i + 1}`} onClick={() => setBands((rows) => rows.filter((_, j) => j !== i))} />
          </div>
        ))}
        <Button icon="add" text="Add band" onClick={() => setBands((rows) => [...rows, { ...EMPTY_BAND }])} />
      </DialogBody>
      <DialogFooter
        actions={
          <>
            <Button text="Cancel" onClick={onClose} />
            <Button intent={Intent.PRIMARY} text={part ? 'Save' : 'Create draft'} loading={create.isPending || update.isPending} onClick={save} />
          </>
        }
      />
    </Dialog>
  );
}
