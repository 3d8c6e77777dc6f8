import { useMemo } from 'react';
import { Callout, HTMLTable } from '@blueprintjs/core';
import { FrequencyChart, type ShadedRange } from '../../../components/FrequencyChart';
import { ScreeningCaution } from '../../../components/ScreeningCaution';
import { useMeasurementPoints } from '../api/get-measurement-points';
import type { PartDetail } from '../types';
import { fmt } from './part-labels';

export interface PartCurvesProps {
  part: PartDetail;
  /** Band overlays (spec bands and bands the user picked), in Hz. */
  overlays: ShadedRange[];
}

/** VSWR / return loss, efficiency and gain against frequency, with band overlays and per-range figures. */
export function PartCurves({ part, overlays }: PartCurvesProps) {
  const current = (kind: string) => part.measurements.find((m) => m.kind === kind && m.current)?.id;
  const s11 = useMeasurementPoints(part.id, current('s11'));
  const efficiency = useMeasurementPoints(part.id, current('efficiency'));
  const peak = useMeasurementPoints(part.id, current('peak-gain'));
  const average = useMeasurementPoints(part.id, current('average-gain'));
  const sameGrid =
    peak.data &&
    average.data &&
    peak.data.frequenciesHz.length === average.data.frequenciesHz.length &&
    peak.data.frequenciesHz.every((f, i) => f === average.data!.frequenciesHz[i]);
  const vswrSeries = useMemo(
    () =>
      s11.data
        ? [
            { label: 'VSWR', unit: '', values: s11.data.vswr!.map((v) => Math.min(v, 10)), range: [1, 6] as [number, number], axisLabel: 'VSWR' },
            { label: 'Return loss', unit: 'dB', values: s11.data.returnLossDb!, inverted: true, axisLabel: 'Return loss (dB)' },
          ]
        : [],
    [s11.data],
  );

  return (
    <>
      <ScreeningCaution compact />
      {s11.data ? (
        <FrequencyChart
          title="Match: VSWR and return loss"
          frequencyHz={s11.data.frequenciesHz}
          series={vswrSeries}
          ranges={overlays}
          threshold={{ value: 2, unit: '', label: 'VSWR 2' }}
        />
      ) : (
        <Callout className="bw-gap">No S11 measurement; search and checks use the datasheet bands.</Callout>
      )}
      {efficiency.data && (
        <FrequencyChart
          title={part.measurements.find((m) => m.kind === 'efficiency' && m.current)?.basis === 'total' ? 'Total efficiency' : 'Radiation efficiency'}
          frequencyHz={efficiency.data.frequenciesHz}
          series={[{ label: 'Efficiency', unit: '%', values: efficiency.data.values, range: [0, 100] }]}
          ranges={overlays}
          height={220}
        />
      )}
      {peak.data && (
        <FrequencyChart
          title="Gain"
          frequencyHz={peak.data.frequenciesHz}
          height={220}
          ranges={overlays}
          series={[
            { label: 'Peak gain', unit: 'dBi', values: peak.data.values },
            ...(sameGrid ? [{ label: 'Average gain', unit: 'dBi', values: average.data!.values }] : []),
          ]}
        />
      )}
      <h3>Figures per range</h3>
      <HTMLTable compact striped className="bw-figures" data-testid="range-figures">
        <thead>
          <tr>
            <th>Range (MHz)</th>
            <th>Match from</th>
            <th>Share at VSWR ≤ 2</th>
            <th>Worst VSWR</th>
            <th>at MHz</th>
            <th>Min RL (dB)</th>
            <th>Efficiency from</th>
            <th>Min eff. (%)</th>
            <th>Avg eff. (%)</th>
            <th>Peak gain (dBi)</th>
            <th>Notes</th>
          </tr>
        </thead>
        <tbody>
          {part.figures.map((f, i) => (
            <tr key={i}>
              <td>
                {f.fromMhz}–{f.toMhz}
              </td>
              <td>{f.matchSource}</td>
              <td>{f.coveredFractionVswr2 === null ? '—' : `${fmt(f.coveredFractionVswr2 * 100, 0)} %`}</td>
              <td>{fmt(f.worstVswr)}</td>
              <td>{fmt(f.worstVswrAtMhz, 1)}</td>
              <td>{fmt(f.minReturnLossDb, 1)}</td>
              <td>
                {f.efficiencySource}
                {f.efficiencyBasis && <span className="bw-muted">{` (${f.efficiencyBasis})`}</span>}
              </td>
              <td>{fmt(f.minEfficiencyPct, 1)}</td>
              <td>{fmt(f.averageEfficiencyPct, 1)}</td>
              <td>{fmt(f.peakGainDbi, 1)}</td>
              <td className="bw-muted">{f.notes.join('; ')}</td>
            </tr>
          ))}
        </tbody>
      </HTMLTable>
    </>
  );
}
