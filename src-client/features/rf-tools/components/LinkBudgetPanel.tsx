import { useState } from 'react';
import { Callout, FormGroup, H4, InputGroup, Intent, Tag } from '@blueprintjs/core';
import { useLinkBudget } from '../api/link-budget';
import type { LinkBudgetRequest } from '../types';
import { fixed, metres, parseNumber, significant } from './format';
import { ResultList } from './ResultList';

type Field = 'frequencyMhz' | 'distanceM' | 'txPowerDbm' | 'txGainDbi' | 'rxGainDbi' | 'lossesDb' | 'rxSensitivityDbm';
const FIELDS: Array<{ key: Field; label: string }> = [
  { key: 'frequencyMhz', label: 'Frequency (MHz)' },
  { key: 'distanceM', label: 'Distance (m)' },
  { key: 'txPowerDbm', label: 'Transmit power (dBm)' },
  { key: 'txGainDbi', label: 'Transmit antenna gain (dBi)' },
  { key: 'rxGainDbi', label: 'Receive antenna gain (dBi)' },
  { key: 'lossesDb', label: 'Other losses (dB)' },
  { key: 'rxSensitivityDbm', label: 'Receiver sensitivity (dBm)' },
];
const START: Record<Field, string> = {
  frequencyMhz: '868',
  distanceM: '1000',
  txPowerDbm: '14',
  txGainDbi: '0',
  rxGainDbi: '2',
  lossesDb: '6',
  rxSensitivityDbm: '-120',
};

function toRequest(values: Record<Field, string>): LinkBudgetRequest | null {
  const n = Object.fromEntries(FIELDS.map(({ key }) => [key, parseNumber(values[key])])) as Record<Field, number | null>;
  if (Object.values(n).some((v) => v === null)) return null;
  const { frequencyMhz, ...rest } = n as Record<Field, number>;
  return { frequencyHz: frequencyMhz * 1e6, ...rest };
}

/** Free-space link budget; figures from POST /api/rf/link-budget. */
export function LinkBudgetPanel() {
  const [values, setValues] = useState(START);
  const request = toRequest(values);
  const { data, error } = useLinkBudget(request);
  return (
    <div className="bw-grid-2">
      <section className="bw-panel" aria-label="Link inputs">
        <H4>Link</H4>
        <div className="bw-form-grid">
          {FIELDS.map(({ key, label }) => (
            <FormGroup key={key} label={label} labelFor={`lb-${key}`}>
              <InputGroup id={`lb-${key}`} value={values[key]} onValueChange={(v) => setValues((old) => ({ ...old, [key]: v }))} inputMode="decimal" />
            </FormGroup>
          ))}
        </div>
        {!request && (
          <Callout intent={Intent.WARNING} compact>
            Fill in every field with a number.
          </Callout>
        )}
      </section>
      <section className="bw-panel" aria-label="Link budget result">
        <H4>Budget</H4>
        {error && (
          <Callout intent={Intent.DANGER} compact>
            {error.message}
          </Callout>
        )}
        {data && (
          <>
            <ResultList
              rows={[
                ['EIRP', fixed(data.eirpDbm, 2, 'dBm')],
                ['ERP', fixed(data.erpDbm, 2, 'dBm')],
                ['Free-space path loss', fixed(data.pathLossDb, 2, 'dB')],
                ['Received power', fixed(data.receivedDbm, 2, 'dBm')],
                [
                  'Margin',
                  <Tag key="margin" minimal intent={data.marginDb >= 0 ? Intent.SUCCESS : Intent.DANGER}>
                    {fixed(data.marginDb, 2, 'dB')}
                  </Tag>,
                ],
                ['Free-space range at 0 dB margin', metres(data.maxRangeM)],
              ]}
            />
            <p className="bw-muted bw-tool-note">
              Every 6 dB of margin lost halves the free-space range (× {significant(data.rangeRatioFor6DbLess, 3)}); every 6 dB gained doubles it. Real links
              lose more to walls, bodies and the ground: treat this as the best case.
            </p>
          </>
        )}
      </section>
    </div>
  );
}
