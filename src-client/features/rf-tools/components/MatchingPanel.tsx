import { type FormEvent, useMemo, useState } from 'react';
import { Button, Callout, FormGroup, H4, HTMLSelect, InputGroup, Intent } from '@blueprintjs/core';
import { FrequencyChart, type FrequencySeries } from '../../../components/FrequencyChart';
import { useMatching } from '../api/design-match';
import type { MatchingRequest, MatchingSolution } from '../types';
import { fixed, parseNumber, significant } from './format';
import { LSectionSchematic } from './LSectionSchematic';

type Field = 'frequencyMhz' | 'loadRe' | 'loadIm' | 'z0' | 'sweepFromMhz' | 'sweepToMhz';
// An invented antenna feed at 868 MHz, just to start from.
const START: Record<Field, string> = { frequencyMhz: '868', loadRe: '22', loadIm: '31', z0: '50', sweepFromMhz: '800', sweepToMhz: '940' };
const LABELS: Record<Field, string> = {
  frequencyMhz: 'Design frequency (MHz)',
  loadRe: 'Load R (Ω)',
  loadIm: 'Load X (Ω)',
  z0: 'Z0 (Ω)',
  sweepFromMhz: 'Sweep from (MHz)',
  sweepToMhz: 'Sweep to (MHz)',
};

function toRequest(values: Record<Field, string>, series: 'E12' | 'E24'): MatchingRequest | null {
  const n = Object.fromEntries(Object.entries(values).map(([k, v]) => [k, parseNumber(v)])) as Record<Field, number | null>;
  if (n.frequencyMhz === null || n.loadRe === null || n.loadIm === null || n.z0 === null) return null;
  const sweep = n.sweepFromMhz !== null && n.sweepToMhz !== null ? { fromHz: n.sweepFromMhz * 1e6, toHz: n.sweepToMhz * 1e6, points: 281 } : undefined;
  return { frequencyHz: n.frequencyMhz * 1e6, loadOhms: { re: n.loadRe, im: n.loadIm }, z0Ohms: n.z0, series, ...(sweep ? { sweep } : {}) };
}

// The exact match peaks at hundreds of dB; nothing above 50 dB matters on a board.
const RETURN_LOSS_AXIS: [number, number] = [0, 50];

const TOPOLOGY_TEXT: Record<MatchingSolution['topology'], string> = {
  'shunt-at-load': 'Shunt part at the load',
  'series-at-load': 'Series part at the load',
};

function SolutionCard({ solution, index, request }: { solution: MatchingSolution; index: number; request: MatchingRequest }) {
  const frequencyHz = useMemo(() => solution.exact.sweep.map((p) => p.frequencyHz), [solution]);
  const series = useMemo<FrequencySeries[]>(
    () => [
      { label: 'Exact', unit: 'dB', values: solution.exact.sweep.map((p) => p.returnLossDb), range: RETURN_LOSS_AXIS, axisLabel: 'Return loss (dB)' },
      { label: `Snapped (${request.series})`, unit: 'dB', values: solution.snapped.sweep.map((p) => p.returnLossDb), dashed: true },
    ],
    [solution, request.series],
  );
  const threshold = useMemo(() => ({ value: 10, unit: 'dB', label: 'RL 10 dB' }), []);
  const load = request.loadOhms;
  return (
    <section className="bw-panel" aria-label={`Solution ${index + 1}`}>
      <H4>
        Solution {index + 1}: {TOPOLOGY_TEXT[solution.topology]}
      </H4>
      <LSectionSchematic
        exact={solution.exact.elements}
        snapped={solution.snapped.elements}
        series={request.series}
        z0Ohms={request.z0Ohms}
        loadLabel={`${significant(load.re, 4)} ${load.im < 0 ? '−' : '+'} j${significant(Math.abs(load.im), 4)} Ω`}
      />
      <p className="bw-muted">
        With {request.series} values the return loss at {significant(request.frequencyHz / 1e6, 6)} MHz is {fixed(solution.snappedReturnLossDb, 1, 'dB')}.
      </p>
      {frequencyHz.length > 0 && (
        <FrequencyChart
          title={`Return loss of solution ${index + 1} across the sweep`}
          frequencyHz={frequencyHz}
          series={series}
          threshold={threshold}
          height={220}
          description="Return loss in dB, higher is better; the load is taken as constant over the sweep."
        />
      )}
    </section>
  );
}

/** L-section matching starting point; solutions from POST /api/rf/matching. */
export function MatchingPanel() {
  const [values, setValues] = useState(START);
  const [series, setSeries] = useState<'E12' | 'E24'>('E24');
  const [submitted, setSubmitted] = useState<MatchingRequest | null>(() => toRequest(START, 'E24'));
  const matching = useMatching(submitted);
  const fieldErrors = (matching.error as { fieldErrors?: Record<string, string> } | null)?.fieldErrors ?? {};

  const onSubmit = (event: FormEvent) => {
    event.preventDefault();
    setSubmitted(toRequest(values, series));
  };

  return (
    <div>
      <form className="bw-panel" onSubmit={onSubmit} aria-label="Matching inputs">
        <div className="bw-form-grid">
          {(Object.keys(LABELS) as Field[]).map((key) => (
            <FormGroup key={key} label={LABELS[key]} labelFor={`match-${key}`}>
              <InputGroup id={`match-${key}`} value={values[key]} onValueChange={(v) => setValues((old) => ({ ...old, [key]: v }))} inputMode="decimal" />
            </FormGroup>
          ))}
          <FormGroup label="Preferred values" labelFor="match-series">
            <HTMLSelect id="match-series" value={series} options={['E24', 'E12']} onChange={(e) => setSeries(e.currentTarget.value as 'E12' | 'E24')} />
          </FormGroup>
        </div>
        <Button type="submit" intent={Intent.PRIMARY} icon="build" loading={matching.isFetching}>
          Find L-sections
        </Button>
      </form>
      {matching.error && (
        <Callout intent={Intent.DANGER} className="bw-gap">
          {matching.error.message}
          {Object.keys(fieldErrors).length > 0 && (
            <ul>
              {Object.entries(fieldErrors).map(([field, message]) => (
                <li key={field}>
                  {field}: {message}
                </li>
              ))}
            </ul>
          )}
        </Callout>
      )}
      {matching.data && submitted && (
        <>
          {matching.data.solutions.length === 0 && <Callout intent={Intent.WARNING}>No lossless L-section matches this load.</Callout>}
          <div className="bw-match-grid">
            {matching.data.solutions.map((solution, index) => (
              <SolutionCard key={index} solution={solution} index={index} request={submitted} />
            ))}
          </div>
          <p className="bw-muted">
            A starting point: lossless parts, a load that does not change over the sweep, no board parasitics. Tune the final values on the real board.
          </p>
        </>
      )}
    </div>
  );
}
