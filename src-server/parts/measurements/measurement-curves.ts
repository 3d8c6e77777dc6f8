import type { EntityManager } from 'typeorm';
import { type ReflectionCurve, reflectionCurveFromGamma } from '../../rf/reflection';
import type { SampledCurve } from '../../rf/curves';
import type { EfficiencyBasis, GainBasis, MeasurementBasis, MeasurementKind } from '../part.types';
import { unpackFloat64 } from './point-codec';

export interface GroundPlane {
  lengthMm: number | null;
  widthMm: number | null;
}

export interface StoredS11 {
  measurementId: number;
  groundPlane: GroundPlane;
  referenceOhms: number;
  curve: ReflectionCurve;
}

export interface StoredCurve {
  measurementId: number;
  groundPlane: GroundPlane;
  /** % for efficiency, dBi for gains. */
  curve: SampledCurve & { frequenciesHz: Float64Array; values: Float64Array };
}

export interface CurrentCurves {
  s11: StoredS11 | null;
  efficiency: (StoredCurve & { basis: EfficiencyBasis }) | null;
  peakGain: (StoredCurve & { basis: GainBasis }) | null;
  averageGain: (StoredCurve & { basis: GainBasis }) | null;
}

export const emptyCurves = (): CurrentCurves => ({ s11: null, efficiency: null, peakGain: null, averageGain: null });

interface CurveRow {
  id: number;
  part_id: number;
  kind: MeasurementKind;
  basis: MeasurementBasis | null;
  reference_ohms: number | null;
  ground_length_mm: number | null;
  ground_width_mm: number | null;
  frequencies_hz: Buffer;
  values_a: Buffer;
  values_b: Buffer | null;
}

const ALL_KINDS: MeasurementKind[] = ['s11', 'efficiency', 'peak-gain', 'average-gain'];

/**
 * The newest curve of each kind for many parts in one query (the newest is the one checks use).
 * `partFilterSql` selects the part ids, e.g. `SELECT id FROM parts WHERE revision > ?`.
 */
export async function loadCurrentCurves(
  manager: EntityManager,
  partFilter: { ids: number[] } | { sql: string; params: unknown[] },
  kinds: MeasurementKind[] = ALL_KINDS,
): Promise<Map<number, CurrentCurves>> {
  const result = new Map<number, CurrentCurves>();
  if ('ids' in partFilter && partFilter.ids.length === 0) return result;
  const [partSql, partParams] = 'ids' in partFilter ? ['?', [partFilter.ids]] : [partFilter.sql, partFilter.params];
  const rows: CurveRow[] = await manager.query(
    `SELECT m.id, m.part_id, m.kind, m.basis, m.reference_ohms, m.ground_length_mm, m.ground_width_mm, m.frequencies_hz, m.values_a, m.values_b
       FROM part_measurements m
      WHERE m.id IN (SELECT MAX(id) FROM part_measurements WHERE part_id IN (${partSql}) AND kind IN (?) GROUP BY part_id, kind)`,
    [...partParams, kinds],
  );
  for (const row of rows) {
    const curves = result.get(row.part_id) ?? emptyCurves();
    result.set(row.part_id, curves);
    const groundPlane = { lengthMm: row.ground_length_mm, widthMm: row.ground_width_mm };
    const frequenciesHz = unpackFloat64(row.frequencies_hz);
    if (row.kind === 's11') {
      const referenceOhms = row.reference_ohms ?? 50;
      curves.s11 = {
        measurementId: row.id,
        groundPlane,
        referenceOhms,
        curve: reflectionCurveFromGamma(frequenciesHz, unpackFloat64(row.values_a), unpackFloat64(row.values_b), referenceOhms),
      };
    } else {
      const stored: StoredCurve = { measurementId: row.id, groundPlane, curve: { frequenciesHz, values: unpackFloat64(row.values_a) } };
      // A row without a basis (written before the basis existed, or by a bulk loader) is read as it always was: radiation, peak.
      if (row.kind === 'efficiency') curves.efficiency = { ...stored, basis: (row.basis as EfficiencyBasis | null) ?? 'radiation' };
      else if (row.kind === 'peak-gain') curves.peakGain = { ...stored, basis: (row.basis as GainBasis | null) ?? 'peak' };
      else curves.averageGain = { ...stored, basis: (row.basis as GainBasis | null) ?? 'peak' };
    }
  }
  return result;
}
