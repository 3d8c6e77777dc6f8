import { FormEvent, useState } from 'react';
import { Button, Callout, Checkbox, Dialog, DialogBody, DialogFooter, FormGroup, HTMLSelect, InputGroup, Intent, TextArea } from '@blueprintjs/core';
import { ApiError } from '../../../lib/api-client';
import { useCreateRegulatoryLimit } from '../api/create-regulatory-limit';
import { useUpdateRegulatoryLimit } from '../api/update-regulatory-limit';
import {
  LIMIT_KIND_LABELS,
  type LimitKind,
  type Region,
  REGIONS,
  type RegulatoryLimit,
  type RegulatoryLimitInput,
  TECHNOLOGY_LABELS,
  type Technology,
} from '../types';

export interface RegulatoryLimitDialogProps {
  /** The limit to edit; a new limit when null. */
  limit: RegulatoryLimit | null;
  onClose: () => void;
}

type Draft = Record<Exclude<keyof RegulatoryLimitInput, 'technologies'>, string> & { technologies: Technology[] };

/** A new limit governs licence-exempt radios unless the admin says otherwise. */
const LICENCE_EXEMPT: Technology[] = ['wifi', 'ble', 'ism', 'other'];

const toDraft = (l: RegulatoryLimit | null): Draft => ({
  region: l?.region ?? 'EU',
  technologies: l?.technologies ?? LICENCE_EXEMPT,
  title: l?.title ?? '',
  fromMhz: l ? String(l.fromMhz) : '',
  toMhz: l ? String(l.toMhz) : '',
  kind: l?.kind ?? 'eirp',
  valueDbm: l ? String(l.valueDbm) : '',
  valueText: l?.valueText ?? '',
  gainThresholdDbi: l?.gainThresholdDbi?.toString() ?? '',
  reductionDbPerDb: l?.reductionDbPerDb?.toString() ?? '',
  conditions: l?.conditions ?? '',
  source: l?.source ?? '',
  note: l?.note ?? '',
});

// Empty optional numbers go as null; text that is not a number goes as-is so the server names the field.
const num = (v: string) => (v.trim() === '' ? null : Number.isFinite(Number(v)) ? Number(v) : v);

/** Create or correct a regulatory limit (admins). */
export function RegulatoryLimitDialog({ limit, onClose }: RegulatoryLimitDialogProps) {
  const create = useCreateRegulatoryLimit();
  const update = useUpdateRegulatoryLimit();
  const mutation = limit ? update : create;
  const [draft, setDraft] = useState<Draft>(() => toDraft(limit));
  const error = mutation.error instanceof ApiError ? mutation.error : null;
  const fe = error?.fieldErrors ?? {};
  const set = (key: Exclude<keyof Draft, 'technologies'>) => (value: string) => setDraft((d) => ({ ...d, [key]: value }));
  const toggleTechnology = (technology: Technology) =>
    setDraft((d) => ({
      ...d,
      technologies: d.technologies.includes(technology) ? d.technologies.filter((t) => t !== technology) : [...d.technologies, technology],
    }));
  const gainRule = draft.kind === 'conducted-gain-rule';

  const field = (key: Exclude<keyof Draft, 'technologies'>, label: string, helper?: string) => (
    <FormGroup label={label} labelFor={`limit-${key}`} intent={fe[key] ? Intent.DANGER : Intent.NONE} helperText={fe[key] ?? helper}>
      <InputGroup id={`limit-${key}`} value={draft[key]} onValueChange={set(key)} />
    </FormGroup>
  );

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const body: RegulatoryLimitInput = {
      region: draft.region as Region,
      technologies: draft.technologies,
      title: draft.title,
      kind: draft.kind as LimitKind,
      valueText: draft.valueText,
      source: draft.source,
      fromMhz: num(draft.fromMhz),
      toMhz: num(draft.toMhz),
      valueDbm: num(draft.valueDbm),
      gainThresholdDbi: gainRule ? num(draft.gainThresholdDbi) : null,
      reductionDbPerDb: gainRule ? num(draft.reductionDbPerDb) : null,
      conditions: draft.conditions || null,
      note: draft.note || null,
    };
    const done = { onSuccess: onClose };
    if (limit) update.mutate({ id: limit.id, ...body }, done);
    else create.mutate(body, done);
  };

  return (
    <Dialog isOpen onClose={onClose} title={limit ? `Edit ${limit.title}` : 'New regulatory limit'} icon="take-action" style={{ width: 640 }}>
      <form onSubmit={submit}>
        <DialogBody>
          {error && !Object.keys(fe).length && (
            <Callout intent={Intent.DANGER} className="bw-gap">
              {error.message}
            </Callout>
          )}
          <div className="bw-form-grid">
            <FormGroup label="Region" labelFor="limit-region" intent={fe.region ? Intent.DANGER : Intent.NONE} helperText={fe.region}>
              <HTMLSelect id="limit-region" value={draft.region} onChange={(e) => set('region')(e.currentTarget.value)} options={[...REGIONS]} />
            </FormGroup>
            <FormGroup label="Kind" labelFor="limit-kind" intent={fe.kind ? Intent.DANGER : Intent.NONE} helperText={fe.kind}>
              <HTMLSelect
                id="limit-kind"
                value={draft.kind}
                onChange={(e) => set('kind')(e.currentTarget.value)}
                options={Object.entries(LIMIT_KIND_LABELS).map(([value, label]) => ({ value, label }))}
              />
            </FormGroup>
          </div>
          <FormGroup
            label="Radios it governs"
            intent={fe.technologies ? Intent.DANGER : Intent.NONE}
            helperText={fe.technologies ?? 'A licensed mobile limit governs LTE and 5G NR; a licence-exempt rule the others'}
          >
            {(Object.entries(TECHNOLOGY_LABELS) as [Technology, string][]).map(([technology, label]) => (
              <Checkbox key={technology} inline label={label} checked={draft.technologies.includes(technology)} onChange={() => toggleTechnology(technology)} />
            ))}
          </FormGroup>
          {field('title', 'Title')}
          <div className="bw-form-grid">
            {field('fromMhz', 'From (MHz)')}
            {field('toMhz', 'To (MHz)')}
            {field('valueDbm', 'Limit (dBm)', 'Unrounded: 25 mW is 13.979 dBm')}
            {field('valueText', "Regulator's wording", 'e.g. 25 mW e.r.p.')}
            {gainRule && field('gainThresholdDbi', 'Gain threshold (dBi)')}
            {gainRule && field('reductionDbPerDb', 'Reduction (dB per dB above)')}
          </div>
          <FormGroup label="Conditions" labelFor="limit-conditions" intent={fe.conditions ? Intent.DANGER : Intent.NONE} helperText={fe.conditions}>
            <TextArea id="limit-conditions" value={draft.conditions} onChange={(e) => set('conditions')(e.currentTarget.value)} fill rows={2} />
          </FormGroup>
          {field('source', 'Source document', 'Document and clause, e.g. 47 CFR 15.247(b)(3)')}
          {field('note', 'Note', 'Corroboration, or "from memory" when no copy was at hand')}
        </DialogBody>
        <DialogFooter
          actions={
            <>
              <Button text="Cancel" onClick={onClose} />
              <Button type="submit" intent={Intent.PRIMARY} loading={mutation.isPending} text={limit ? 'Save limit' : 'Create limit'} />
            </>
          }
        />
      </form>
    </Dialog>
  );
}
