import { useState } from 'react';
import { Callout, FormGroup, H4, HTMLSelect, InputGroup, Intent } from '@blueprintjs/core';
import { useConversion } from '../api/convert';
import type { ConversionRequest } from '../types';
import { fixed, parseNumber, significant } from './format';
import { ResultList } from './ResultList';

type ReflectionInput = 'vswr' | 'returnLossDb' | 'gammaMagnitude';
const REFLECTION_INPUTS: Array<{ value: ReflectionInput; label: string }> = [
  { value: 'vswr', label: 'VSWR' },
  { value: 'returnLossDb', label: 'Return loss (dB)' },
  { value: 'gammaMagnitude', label: '|Γ|' },
];

function ConversionError({ error }: { error: Error | null }) {
  return error ? (
    <Callout intent={Intent.DANGER} compact>
      {error.message}
    </Callout>
  ) : null;
}

function ReflectionCard() {
  const [quantity, setQuantity] = useState<ReflectionInput>('vswr');
  const [text, setText] = useState('2');
  const value = parseNumber(text);
  const input = value === null ? null : ({ [quantity]: value } as ConversionRequest);
  const { data, error } = useConversion(input);
  const r = data?.reflection;
  return (
    <section className="bw-panel bw-tool-card" aria-label="Reflection">
      <H4>Reflection</H4>
      <div className="bw-row">
        <FormGroup label="Known quantity" labelFor="conv-reflection-kind">
          <HTMLSelect
            id="conv-reflection-kind"
            value={quantity}
            options={REFLECTION_INPUTS}
            onChange={(e) => setQuantity(e.currentTarget.value as ReflectionInput)}
          />
        </FormGroup>
        <FormGroup label="Value" labelFor="conv-reflection-value">
          <InputGroup id="conv-reflection-value" value={text} onValueChange={setText} inputMode="decimal" />
        </FormGroup>
      </div>
      <ConversionError error={error} />
      {r && (
        <ResultList
          rows={[
            ['VSWR', fixed(r.vswr, 3)],
            ['Return loss', fixed(r.returnLossDb, 2, 'dB')],
            ['|Γ|', fixed(r.gammaMagnitude, 4)],
            ['Mismatch loss', fixed(r.mismatchLossDb, 3, 'dB')],
            ['Transmitted', fixed(r.transmittedPercent, 2, '%')],
            ['Reflected', fixed(r.reflectedPercent, 2, '%')],
          ]}
        />
      )}
    </section>
  );
}

function ImpedanceCard() {
  const [re, setRe] = useState('50');
  const [im, setIm] = useState('50');
  const [z0, setZ0] = useState('50');
  const [r, x, z] = [parseNumber(re), parseNumber(im), parseNumber(z0)];
  const input = r === null || x === null || z === null ? null : { impedanceOhms: { re: r, im: x }, z0Ohms: z };
  const { data, error } = useConversion(input);
  return (
    <section className="bw-panel bw-tool-card" aria-label="Impedance to reflection">
      <H4>Impedance → Γ</H4>
      <div className="bw-row">
        <FormGroup label="R (Ω)" labelFor="conv-z-re">
          <InputGroup id="conv-z-re" value={re} onValueChange={setRe} inputMode="decimal" />
        </FormGroup>
        <FormGroup label="X (Ω)" labelFor="conv-z-im">
          <InputGroup id="conv-z-im" value={im} onValueChange={setIm} inputMode="decimal" />
        </FormGroup>
        <FormGroup label="Z0 (Ω)" labelFor="conv-z-z0">
          <InputGroup id="conv-z-z0" value={z0} onValueChange={setZ0} inputMode="decimal" />
        </FormGroup>
      </div>
      <ConversionError error={error} />
      {data?.gamma && data.reflection && (
        <ResultList
          rows={[
            ['Γ', `${fixed(data.gamma.re, 4)} ${data.gamma.im < 0 ? '−' : '+'} j${fixed(Math.abs(data.gamma.im), 4)}`],
            ['|Γ| ∠', `${fixed(data.gamma.magnitude, 4)} ∠ ${fixed(data.gamma.angleDeg, 2)}°`],
            ['VSWR', fixed(data.reflection.vswr, 3)],
            ['Return loss', fixed(data.reflection.returnLossDb, 2, 'dB')],
            ['Transmitted', fixed(data.reflection.transmittedPercent, 2, '%')],
          ]}
        />
      )}
    </section>
  );
}

function WavelengthCard() {
  const [text, setText] = useState('868');
  const value = parseNumber(text);
  const { data, error } = useConversion(value === null ? null : { frequencyHz: value * 1e6 });
  const w = data?.wavelength;
  return (
    <section className="bw-panel bw-tool-card" aria-label="Wavelength">
      <H4>Wavelength</H4>
      <FormGroup label="Frequency (MHz)" labelFor="conv-frequency">
        <InputGroup id="conv-frequency" value={text} onValueChange={setText} inputMode="decimal" />
      </FormGroup>
      <ConversionError error={error} />
      {w && (
        <ResultList
          rows={[
            ['λ (free space)', fixed(w.wavelengthMm, 2, 'mm')],
            ['λ/2', fixed(w.halfWaveMm, 2, 'mm')],
            ['λ/4', fixed(w.quarterWaveMm, 2, 'mm')],
          ]}
        />
      )}
    </section>
  );
}

function PowerCard() {
  const [unit, setUnit] = useState<'dbm' | 'mw'>('dbm');
  const [text, setText] = useState('14');
  const value = parseNumber(text);
  const input = value === null ? null : unit === 'dbm' ? { dbm: value } : { mw: value };
  const { data, error } = useConversion(input);
  return (
    <section className="bw-panel bw-tool-card" aria-label="Power">
      <H4>Power</H4>
      <div className="bw-row">
        <FormGroup label="Unit" labelFor="conv-power-unit">
          <HTMLSelect
            id="conv-power-unit"
            value={unit}
            options={[
              { value: 'dbm', label: 'dBm' },
              { value: 'mw', label: 'mW' },
            ]}
            onChange={(e) => setUnit(e.currentTarget.value as 'dbm' | 'mw')}
          />
        </FormGroup>
        <FormGroup label="Value" labelFor="conv-power-value">
          <InputGroup id="conv-power-value" value={text} onValueChange={setText} inputMode="decimal" />
        </FormGroup>
      </div>
      <ConversionError error={error} />
      {data?.power && (
        <ResultList
          rows={[
            ['dBm', fixed(data.power.dbm, 3, 'dBm')],
            ['mW', `${significant(data.power.mw, 5)}\u202fmW`],
            ['W', `${significant(data.power.watts, 5)}\u202fW`],
          ]}
        />
      )}
    </section>
  );
}

function EfficiencyCard() {
  const [unit, setUnit] = useState<'efficiencyPct' | 'efficiencyDb'>('efficiencyPct');
  const [text, setText] = useState('50');
  const value = parseNumber(text);
  const input = value === null ? null : ({ [unit]: value } as ConversionRequest);
  const { data, error } = useConversion(input);
  return (
    <section className="bw-panel bw-tool-card" aria-label="Efficiency">
      <H4>Efficiency</H4>
      <div className="bw-row">
        <FormGroup label="Unit" labelFor="conv-eff-unit">
          <HTMLSelect
            id="conv-eff-unit"
            value={unit}
            options={[
              { value: 'efficiencyPct', label: '%' },
              { value: 'efficiencyDb', label: 'dB' },
            ]}
            onChange={(e) => setUnit(e.currentTarget.value as 'efficiencyPct' | 'efficiencyDb')}
          />
        </FormGroup>
        <FormGroup label="Value" labelFor="conv-eff-value">
          <InputGroup id="conv-eff-value" value={text} onValueChange={setText} inputMode="decimal" />
        </FormGroup>
      </div>
      <ConversionError error={error} />
      {data?.efficiency && (
        <ResultList
          rows={[
            ['Percent', fixed(data.efficiency.percent, 2, '%')],
            ['Decibels', fixed(data.efficiency.db, 2, 'dB')],
          ]}
        />
      )}
    </section>
  );
}

/** Everyday conversions; every figure comes from POST /api/rf/conversions (the tested RF module). */
export function ConversionsPanel() {
  return (
    <div className="bw-tool-grid">
      <ReflectionCard />
      <ImpedanceCard />
      <WavelengthCard />
      <PowerCard />
      <EfficiencyCard />
    </div>
  );
}
