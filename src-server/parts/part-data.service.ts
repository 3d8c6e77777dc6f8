import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import type { SampledCurve } from '../rf/curves';
import type { ReflectionCurve } from '../rf/reflection';
import { type GroundPlane, loadCurrentCurves } from './measurements/measurement-curves';
import { specBandClaim } from './part-mapping';
import type { Connector, EfficiencyBasis, FormFactor, GainBasis, Lifecycle, PartPolarization, ReviewState } from './part.types';
import type { SpecBandClaim } from './spec-coverage';

/** Everything the rules engine needs about one part, curves included (newest measurement of each kind). */
export interface PartEvaluationData {
  id: number;
  manufacturer: string;
  mpn: string;
  title: string;
  formFactor: FormFactor;
  connector: Connector;
  polarization: PartPolarization;
  lifecycle: Lifecycle;
  reviewState: ReviewState;
  nominalImpedanceOhms: number;
  /** The ground plane the datasheet figures hold for; null when the datasheet does not say. */
  evalGroundPlane: GroundPlane | null;
  /** Datasheet bands in Hz (maxVswr, minReturnLossDb, efficiencyPct, peak/average gain). */
  specBands: SpecBandClaim[];
  /** Complex Γ over frequency (RF module's ReflectionCurve, |Γ| included) and the ground plane it was measured on. */
  s11: { measurementId: number; groundPlane: GroundPlane; curve: ReflectionCurve } | null;
  /** Efficiency in %, radiation or total as `basis` says. */
  efficiency: { measurementId: number; groundPlane: GroundPlane; curve: SampledCurve; basis: EfficiencyBasis } | null;
  /** dBi, peak or realized as `basis` says. */
  peakGain: { measurementId: number; groundPlane: GroundPlane; curve: SampledCurve; basis: GainBasis } | null;
  averageGain: { measurementId: number; groundPlane: GroundPlane; curve: SampledCurve; basis: GainBasis } | null;
}

interface Row {
  id: number;
  manufacturer: string;
  mpn: string;
  title: string;
  form_factor: FormFactor;
  connector: Connector;
  polarization: PartPolarization;
  lifecycle: Lifecycle;
  review_state: ReviewState;
  nominal_impedance_ohms: number;
  eval_ground_length_mm: number | null;
  eval_ground_width_mm: number | null;
}

/** Bulk loading for the compatibility matrix: three queries for any number of parts, never one per part. */
@Injectable()
export class PartDataService {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  /** Parts in the order asked; unknown ids are left out. */
  async getPartData(ids: number[]): Promise<PartEvaluationData[]> {
    const unique = [...new Set(ids)];
    if (unique.length === 0) return [];
    const loaded = await this.load('p.id IN (?)', [unique]);
    const byId = new Map(loaded.map((p) => [p.id, p]));
    return unique.flatMap((id) => (byId.has(id) ? [byId.get(id)!] : []));
  }

  /** The whole catalogue in given review states (default: approved and restricted), for "find candidates". */
  async loadCatalogueForEvaluation(states: ReviewState[] = ['approved', 'restricted']): Promise<PartEvaluationData[]> {
    return this.load('p.review_state IN (?)', [states]);
  }

  private async load(where: string, params: unknown[]): Promise<PartEvaluationData[]> {
    const manager = this.dataSource.manager;
    const rows: Row[] = await manager.query(
      `SELECT p.id, m.name AS manufacturer, p.mpn, p.title, p.form_factor, p.connector, p.polarization, p.lifecycle, p.review_state,
              p.nominal_impedance_ohms, p.eval_ground_length_mm, p.eval_ground_width_mm
         FROM parts p JOIN manufacturers m ON m.id = p.manufacturer_id WHERE ${where} ORDER BY p.id`,
      params,
    );
    if (rows.length === 0) return [];
    const ids = rows.map((r) => r.id);
    const [bands, curves] = await Promise.all([
      manager.query(
        `SELECT part_id, from_mhz AS fromMhz, to_mhz AS toMhz, max_vswr AS maxVswr, min_return_loss_db AS minReturnLossDb, efficiency_pct AS efficiencyPct, efficiency_basis AS efficiencyBasis, efficiency_statistic AS efficiencyStatistic, gain_basis AS gainBasis,
                peak_gain_dbi AS peakGainDbi, average_gain_dbi AS averageGainDbi FROM part_spec_bands WHERE part_id IN (?) ORDER BY part_id, from_mhz`,
        [ids],
      ),
      loadCurrentCurves(manager, { ids }),
    ]);
    const bandsBy = new Map<number, SpecBandClaim[]>();
    for (const band of bands as ({ part_id: number } & Parameters<typeof specBandClaim>[0])[]) {
      (bandsBy.get(band.part_id) ?? bandsBy.set(band.part_id, []).get(band.part_id)!).push(specBandClaim(band));
    }
    return rows.map((r) => {
      const c = curves.get(r.id);
      return {
        id: r.id,
        manufacturer: r.manufacturer,
        mpn: r.mpn,
        title: r.title,
        formFactor: r.form_factor,
        connector: r.connector,
        polarization: r.polarization,
        lifecycle: r.lifecycle,
        reviewState: r.review_state,
        nominalImpedanceOhms: r.nominal_impedance_ohms,
        evalGroundPlane:
          r.eval_ground_length_mm !== null || r.eval_ground_width_mm !== null ? { lengthMm: r.eval_ground_length_mm, widthMm: r.eval_ground_width_mm } : null,
        specBands: bandsBy.get(r.id) ?? [],
        s11: c?.s11 ? { measurementId: c.s11.measurementId, groundPlane: c.s11.groundPlane, curve: c.s11.curve } : null,
        efficiency: c?.efficiency ?? null,
        peakGain: c?.peakGain ?? null,
        averageGain: c?.averageGain ?? null,
      };
    });
  }
}
