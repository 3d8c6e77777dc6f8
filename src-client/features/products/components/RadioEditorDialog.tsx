import { FormEvent, useMemo, useState } from 'react';
import { Button, Callout, Dialog, DialogBody, DialogFooter, FormGroup, HTMLSelect, InputGroup, Intent, Tag, TextArea } from '@blueprintjs/core';
import { ApiError } from '../../../lib/api-client';
import { useBandChoices } from '../api/get-band-choices';
import { useCreateRadio } from '../api/create-radio';
import { useUpdateRadio } from '../api/update-radio';
import {
  type BandChoice,
  CONNECTOR_LABELS,
  type Connector,
  type Polarization,
  POLARIZATIONS,
  type Radio,
  RECEIVE_ONLY,
  type Technology,
  TECHNOLOGY_LABELS,
} from '../types';
import { numberOrNull, textOf } from './form-values';

export interface RadioEditorDialogProps {
  productId: number;
  /** The radio to edit; a new radio when null. */
  radio: Radio | null;
  onClose: () => void;
}

interface BandRow {
  bandId: number;
  gain: string;
  /** Channels the radio uses in the band, as typed: "869.4–869.65; 868.0–868.6" (MHz). */
  channels: string;
}

type AntennaRole = Radio['antennaRoles'][number];
type GnssBandwidth = NonNullable<Radio['gnssBandwidth']>;

/** The antenna sets a radio can ask for, in words. */
const ANTENNA_SETS: { label: string; roles: AntennaRole[] }[] = [
  { label: 'One antenna', roles: ['main'] },
  { label: 'Main and diversity', roles: ['main', 'diversity'] },
  { label: 'MIMO 2 × 2 (main, MIMO 2)', roles: ['main', 'mimo-2'] },
  { label: 'MIMO 4 × 4 (main, MIMO 2, 3, 4)', roles: ['main', 'mimo-2', 'mimo-3', 'mimo-4'] },
];
const antennaSetOf = (roles: readonly string[] | undefined) =>
  Math.max(
    0,
    ANTENNA_SETS.findIndex((set) => set.roles.join() === (roles ?? ['main']).join()),
  );

const channelsText = (channels: { fromMhz: number; toMhz: number }[] | null | undefined) => (channels ?? []).map((c) => `${c.fromMhz}–${c.toMhz}`).join('; ');

/** "869.4–869.65; 868-868.6" → ranges in MHz; null when a piece is not "from–to" with from below to. */
export function parseChannels(text: string): { fromMhz: number; toMhz: number }[] | null {
  const pieces = text
    .split(/[;,]/)
    .map((piece) => piece.trim())
    .filter(Boolean);
  const ranges = pieces.map((piece) => {
    const [from, to, extra] = piece.split(/[–-]/).map((x) => Number(x.trim()));
    return extra === undefined && Number.isFinite(from) && Number.isFinite(to) && from < to ? { fromMhz: from, toMhz: to } : null;
  });
  return ranges.every((r) => r !== null) ? (ranges as { fromMhz: number; toMhz: number }[]) : null;
}

const describe = (b: BandChoice) => b.ranges.map((r) => `${r.fromMhz}–${r.toMhz}`).join(', ') + ' MHz';

/** Adds or edits one radio: what it is, how it feeds its antenna, and which bands it must cover. */
export function RadioEditorDialog({ productId, radio, onClose }: RadioEditorDialogProps) {
  const choices = useBandChoices();
  const create = useCreateRadio();
  const update = useUpdateRadio();
  const mutation = radio ? update : create;
  const [name, setName] = useState(radio?.name ?? '');
  const [technology, setTechnology] = useState<Technology>(radio?.technology ?? 'lte');
  const [module, setModule] = useState(radio?.module ?? '');
  const [power, setPower] = useState(textOf(radio?.transmitPowerDbm));
  const [polarization, setPolarization] = useState<Polarization>(radio?.polarization ?? 'linear');
  const [connector, setConnector] = useState<Connector>(radio?.connector ?? 'solder-pad');
  const [feedLoss, setFeedLoss] = useState(textOf(radio?.feedLossDb ?? 0));
  const [notes, setNotes] = useState(radio?.notes ?? '');
  const [rows, setRows] = useState<BandRow[]>(
    radio?.bands.map((b) => ({ bandId: b.band.id, gain: textOf(b.certifiedMaxGainDbi), channels: channelsText(b.channels) })) ?? [],
  );
  const [gnssBandwidth, setGnssBandwidth] = useState<GnssBandwidth>(radio?.gnssBandwidth ?? 'main-lobe');
  const [antennaSet, setAntennaSet] = useState(antennaSetOf(radio?.antennaRoles));
  const [channelError, setChannelError] = useState<number | null>(null);
  const [setPick, setSetPick] = useState('');
  const [bandPick, setBandPick] = useState('');
  const receiveOnly = RECEIVE_ONLY.includes(technology);

  const error = mutation.error instanceof ApiError ? mutation.error : null;
  const fe = error?.fieldErrors ?? {};
  const conflict = error?.status === 409;
  const byId = useMemo(() => new Map((choices.data?.bands ?? []).map((b) => [b.id, b])), [choices.data]);
  const ofTechnology = useMemo(() => (choices.data?.bands ?? []).filter((b) => b.technology === technology), [choices.data, technology]);
  const usableSets = useMemo(() => (choices.data?.sets ?? []).filter((s) => s.bands.some((b) => b.technology === technology)), [choices.data, technology]);

  const addBands = (ids: number[]) =>
    setRows((cur) => [...cur, ...ids.filter((id) => !cur.some((r) => r.bandId === id)).map((bandId) => ({ bandId, gain: '', channels: '' }))]);
  const changeTechnology = (next: Technology) => {
    setTechnology(next);
    // Bands of another technology would be refused; drop them, and the power of a receive-only radio.
    setRows((cur) => cur.filter((r) => byId.get(r.bandId)?.technology === next));
    if (RECEIVE_ONLY.includes(next)) setPower('');
    if (next === 'gnss') setPolarization('RHCP');
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const badChannels = rows.findIndex((r) => r.channels.trim() !== '' && parseChannels(r.channels) === null);
    setChannelError(badChannels >= 0 ? badChannels : null);
    if (badChannels >= 0) return;
    const input = {
      name,
      technology,
      module,
      polarization,
      connector,
      notes: notes.trim() ? notes : null,
      transmitPowerDbm: receiveOnly ? null : numberOrNull(power),
      feedLossDb: numberOrNull(feedLoss) ?? 0,
      bands: rows.map((r) => ({
        bandId: r.bandId,
        certifiedMaxGainDbi: receiveOnly ? null : numberOrNull(r.gain),
        channels: receiveOnly || r.channels.trim() === '' ? null : parseChannels(r.channels),
      })),
      gnssBandwidth: technology === 'gnss' ? gnssBandwidth : null,
      antennaRoles: ANTENNA_SETS[antennaSet].roles,
    };
    if (radio) update.mutate({ productId, radioId: radio.id, version: radio.version, ...input }, { onSuccess: onClose });
    else create.mutate({ productId, ...input }, { onSuccess: onClose });
  };

  const field = (
    id: string,
    label: string,
    key: string,
    value: string,
    onChange: (v: string) => void,
    opts: { unit?: string; disabled?: boolean; helper?: string } = {},
  ) => (
    <FormGroup label={label} labelFor={id} intent={fe[key] ? Intent.DANGER : Intent.NONE} helperText={fe[key] ?? opts.helper} disabled={opts.disabled}>
      <InputGroup
        id={id}
        value={value}
        onValueChange={onChange}
        disabled={opts.disabled}
        intent={fe[key] ? Intent.DANGER : Intent.NONE}
        rightElement={opts.unit ? <span className="bw-unit">{opts.unit}</span> : undefined}
      />
    </FormGroup>
  );

  return (
    <Dialog isOpen onClose={onClose} title={radio ? `Edit radio ${radio.name}` : 'Add a radio'} icon="satellite" style={{ width: 720 }}>
      <form onSubmit={submit}>
        <DialogBody>
          {conflict && (
            <Callout intent={Intent.WARNING} className="bw-gap" title="Changed by someone else">
              {error!.message} Close this editor and open it again to see their version.
            </Callout>
          )}
          {error && !conflict && !Object.keys(fe).length && (
            <Callout intent={Intent.DANGER} className="bw-gap">
              {error.message}
            </Callout>
          )}
          <div className="bw-form-grid">
            {field('radio-name', 'Radio name', 'name', name, setName)}
            <FormGroup label="Technology" labelFor="radio-technology" intent={fe.technology ? Intent.DANGER : Intent.NONE} helperText={fe.technology}>
              <HTMLSelect
                id="radio-technology"
                value={technology}
                onChange={(e) => changeTechnology(e.currentTarget.value as Technology)}
                options={(Object.keys(TECHNOLOGY_LABELS) as Technology[]).map((t) => ({ value: t, label: TECHNOLOGY_LABELS[t] }))}
              />
            </FormGroup>
            {field('radio-module', 'Module', 'module', module, setModule, { helper: 'Free text: maker and model' })}
            {field('radio-power', 'Transmit power', 'transmitPowerDbm', power, setPower, {
              unit: 'dBm',
              disabled: receiveOnly,
              helper: receiveOnly ? 'Receive-only radio: no transmit power' : 'Conducted, at the module pin',
            })}
            <FormGroup
              label="Required polarization"
              labelFor="radio-polarization"
              helperText={technology === 'gnss' ? 'Satellites transmit RHCP; a linear antenna loses about 3 dB' : undefined}
            >
              <HTMLSelect
                id="radio-polarization"
                value={polarization}
                onChange={(e) => setPolarization(e.currentTarget.value as Polarization)}
                options={POLARIZATIONS}
              />
            </FormGroup>
            <FormGroup label="Feed / connector" labelFor="radio-connector">
              <HTMLSelect
                id="radio-connector"
                value={connector}
                onChange={(e) => setConnector(e.currentTarget.value as Connector)}
                options={Object.entries(CONNECTOR_LABELS).map(([value, label]) => ({ value, label }))}
              />
            </FormGroup>
            {field('radio-feed-loss', 'Feed loss', 'feedLossDb', feedLoss, setFeedLoss, { unit: 'dB', helper: 'Cable, connector and trace loss' })}
            <FormGroup label="Antennas" labelFor="radio-antennas" helperText="One part is chosen for each antenna; each is judged on every band">
              <HTMLSelect
                id="radio-antennas"
                value={String(antennaSet)}
                onChange={(e) => setAntennaSet(Number(e.currentTarget.value))}
                options={ANTENNA_SETS.map((set, i) => ({ value: String(i), label: set.label }))}
              />
            </FormGroup>
            {technology === 'gnss' && (
              <FormGroup
                label="Signal bandwidth judged"
                labelFor="radio-gnss-bandwidth"
                helperText="Main lobe: the open-service signal's main lobe (usual for receivers); full band: the whole signal band"
              >
                <HTMLSelect
                  id="radio-gnss-bandwidth"
                  value={gnssBandwidth}
                  onChange={(e) => setGnssBandwidth(e.currentTarget.value as GnssBandwidth)}
                  options={[
                    { value: 'main-lobe', label: 'Main lobe of each signal' },
                    { value: 'full-band', label: 'Full signal band' },
                  ]}
                />
              </FormGroup>
            )}
          </div>

          <FormGroup
            label="Bands"
            intent={fe.bands ? Intent.DANGER : Intent.NONE}
            helperText={fe.bands ?? `Only ${TECHNOLOGY_LABELS[technology]} bands fit this radio.`}
          >
            <div className="bw-row bw-gap">
              <HTMLSelect
                aria-label="Band set"
                value={setPick}
                onChange={(e) => setSetPick(e.currentTarget.value)}
                options={[
                  { value: '', label: usableSets.length ? 'Choose a band set…' : 'No band set for this technology' },
                  ...usableSets.map((s) => ({ value: String(s.id), label: s.name })),
                ]}
              />
              <Button
                icon="layers"
                text="Add bands from set"
                disabled={!setPick}
                onClick={() => {
                  const chosen = usableSets.find((s) => String(s.id) === setPick);
                  if (chosen) addBands(chosen.bands.filter((b) => b.technology === technology).map((b) => b.id));
                }}
              />
              <HTMLSelect
                aria-label="Band"
                value={bandPick}
                onChange={(e) => setBandPick(e.currentTarget.value)}
                options={[
                  { value: '', label: 'Choose a band…' },
                  ...ofTechnology
                    .filter((b) => !rows.some((r) => r.bandId === b.id))
                    .map((b) => ({ value: String(b.id), label: `${b.designation} — ${describe(b)}` })),
                ]}
              />
              <Button
                icon="add"
                text="Add band"
                disabled={!bandPick}
                onClick={() => {
                  addBands([Number(bandPick)]);
                  setBandPick('');
                }}
              />
            </div>
            {usableSets.find((s) => String(s.id) === setPick) && (
              <p className="bw-muted bw-small">{usableSets.find((s) => String(s.id) === setPick)!.description}</p>
            )}
            <table className="bw-band-rows" data-testid="radio-bands">
              <tbody>
                {rows.map((row, i) => {
                  const band = byId.get(row.bandId);
                  const bandError = fe[`bands.${i}.bandId`];
                  const gainError = fe[`bands.${i}.certifiedMaxGainDbi`];
                  return (
                    <tr key={row.bandId}>
                      <td>
                        <Tag minimal intent={bandError ? Intent.DANGER : Intent.NONE}>
                          {band?.designation ?? `#${row.bandId}`}
                        </Tag>
                      </td>
                      <td className="bw-muted">
                        {band ? describe(band) : ''}
                        {bandError && <div className="bw-error-text">{bandError}</div>}
                      </td>
                      <td>
                        {!receiveOnly && (
                          <InputGroup
                            size="small"
                            aria-label={`Certified max gain for ${band?.designation ?? row.bandId}`}
                            placeholder="max gain"
                            value={row.gain}
                            intent={gainError ? Intent.DANGER : Intent.NONE}
                            rightElement={<span className="bw-unit">dBi</span>}
                            onValueChange={(v) => setRows((cur) => cur.map((r, j) => (j === i ? { ...r, gain: v } : r)))}
                          />
                        )}
                        {gainError && <div className="bw-error-text">{gainError}</div>}
                      </td>
                      <td>
                        {!receiveOnly && (
                          <InputGroup
                            size="small"
                            aria-label={`Channels used in ${band?.designation ?? row.bandId}`}
                            placeholder="channels used, from–to (optional)"
                            value={row.channels}
                            intent={channelError === i || fe[`bands.${i}.channels`] ? Intent.DANGER : Intent.NONE}
                            rightElement={<span className="bw-unit">MHz</span>}
                            onValueChange={(v) => setRows((cur) => cur.map((r, j) => (j === i ? { ...r, channels: v } : r)))}
                          />
                        )}
                        {channelError === i && <div className="bw-error-text">Write each channel as from–to in MHz, separated by semicolons</div>}
                        {Object.entries(fe)
                          .filter(([key]) => key.startsWith(`bands.${i}.channels`))
                          .map(([key, message]) => (
                            <div key={key} className="bw-error-text">
                              {message}
                            </div>
                          ))}
                      </td>
                      <td>
                        <Button
                          size="small"
                          variant="minimal"
                          icon="cross"
                          aria-label={`Remove ${band?.designation ?? row.bandId}`}
                          onClick={() => setRows((cur) => cur.filter((_, j) => j !== i))}
                        />
                      </td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
            {!receiveOnly && rows.length > 0 && (
              <p className="bw-muted bw-small">
                Certified max gain: the antenna gain the module&apos;s certification allows in that band (dBi), from its grant. Channels (optional): the parts
                of the band the radio transmits in; power limits are then judged on those channels instead of the tightest part of the band.
              </p>
            )}
          </FormGroup>
          <FormGroup label="Notes" labelFor="radio-notes">
            <TextArea id="radio-notes" value={notes} onChange={(e) => setNotes(e.currentTarget.value)} fill rows={2} />
          </FormGroup>
        </DialogBody>
        <DialogFooter
          actions={
            <>
              <Button text="Cancel" onClick={onClose} />
              <Button type="submit" intent={Intent.PRIMARY} loading={mutation.isPending} text="Save radio" />
            </>
          }
        />
      </form>
    </Dialog>
  );
}
