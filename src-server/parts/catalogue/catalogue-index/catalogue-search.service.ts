import { Injectable, Logger } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import type { AuthUser } from '../../../common/auth.decorators';
import { ValidationFailedError } from '../../../common/domain-error';
import type { FrequencyRange } from '../../../rf/curves';
import type { RevisionReader } from '../../../common/revision-cache';
import { catalogueRevisionReader } from '../../catalogue-revision';
import { loadCurrentCurves } from '../../measurements/measurement-curves';
import { specBandClaim } from '../../part-mapping';
import type { MeasurementKind } from '../../part.types';
import type { SpecBandClaim } from '../../spec-coverage';
import type { PartSearchDto } from '../../dto/part-search.dto';
import type { PartListDto, PartSummaryDto } from '../../dto/part-response.dto';
import { CatalogueIndex, type CatalogueQuery, type IndexedPart } from './catalogue-index';

/** The highest frequency any band or part field accepts, MHz. */
export const MAX_RANGE_MHZ = 300_000;

/** `791-862,880-960` → ranges in Hz; a reversed or out-of-range bound (e.g. 309 digits) is a 400 naming the field and position. */
export function parseCovers(covers: string, field = 'covers'): FrequencyRange[] {
  return covers.split(',').map((text, i) => {
    const [from, to] = text.split('-').map((v) => Number(v.trim()));
    if (!(to <= MAX_RANGE_MHZ)) throw new ValidationFailedError([{ field, message: `range ${i + 1} must end at or below ${MAX_RANGE_MHZ} MHz` }]);
    if (!(from < to))
      throw new ValidationFailedError([{ field, message: `range ${i + 1} (${text.trim().slice(0, 40)}) must go from a lower to a higher frequency` }]);
    return { fromHz: from * 1e6, toHz: to * 1e6 };
  });
}

const summaries = new WeakMap<IndexedPart, PartSummaryDto>();

/** The list DTO of a part, written once per indexed version (a reload replaces the IndexedPart). */
export function summaryOf(part: IndexedPart): PartSummaryDto {
  let summary = summaries.get(part);
  if (!summary) {
    summary = writeSummary(part);
    summaries.set(part, summary);
  }
  return summary;
}

function writeSummary(part: IndexedPart): PartSummaryDto {
  return {
    id: part.id,
    manufacturer: part.manufacturer,
    mpn: part.mpn,
    title: part.title,
    formFactor: part.formFactor,
    connector: part.connector,
    polarization: part.polarization,
    lifecycle: part.lifecycle,
    reviewState: part.reviewState,
    measuredKinds: [...part.measuredKinds],
    lowestPrices: [...part.lowestPrices].map(([currency, price]) => ({ currency, unitPrice: price.toFixed(4) })),
    updatedAt: new Date(part.updatedAtMs).toISOString(),
  };
}

interface PartRow {
  id: number;
  manufacturer: string;
  mpn: string;
  title: string;
  form_factor: IndexedPart['formFactor'];
  connector: IndexedPart['connector'];
  polarization: IndexedPart['polarization'];
  lifecycle: IndexedPart['lifecycle'];
  review_state: IndexedPart['reviewState'];
  search_text: string;
  updated_at: Date;
}

/**
 * Serves GET /api/parts from the in-memory CatalogueIndex. Before each search it reads the one-row
 * catalogue revision (a primary-key lookup) and reloads only the parts written since, so every server
 * process sees every write, including the ones other processes made.
 */
@Injectable()
export class CatalogueSearchService {
  private readonly logger = new Logger(CatalogueSearchService.name);
  private readonly index = new CatalogueIndex();
  private loadedRevision = -1;
  private refreshing: Promise<void> | null = null;
  /** A read that began after the caller's call, so a client sees its own writes. */
  private readonly revision: RevisionReader;

  constructor(@InjectDataSource() private readonly dataSource: DataSource) {
    this.revision = catalogueRevisionReader(dataSource);
  }

  async search(dto: PartSearchDto, actor: AuthUser): Promise<PartListDto> {
    const query = this.toQuery(dto, actor, dto.limit ?? 50);
    await this.ensureFresh();
    const { items, total } = this.index.search(query);
    return { items: items.map(summaryOf), total };
  }

  /** Every match of the search, unpaged, for the CSV export. */
  async searchAll(dto: PartSearchDto, actor: AuthUser): Promise<IndexedPart[]> {
    const query = { ...this.toQuery(dto, actor, 0), offset: 0 };
    await this.ensureFresh();
    return this.index.search(query).items;
  }

  private toQuery(dto: PartSearchDto, actor: AuthUser, limit: number): CatalogueQuery {
    const coverage = dto.covers ? { ranges: parseCovers(dto.covers), vswrMax: dto.vswrMax ?? 2, minEfficiencyPct: dto.minEfficiencyPct } : undefined;
    if (!dto.covers && (dto.vswrMax !== undefined || dto.minEfficiencyPct !== undefined)) {
      throw new ValidationFailedError([{ field: dto.vswrMax !== undefined ? 'vswrMax' : 'minEfficiencyPct', message: 'needs covers= ranges to apply to' }]);
    }
    return {
      q: dto.q,
      formFactor: dto.formFactor,
      connector: dto.connector,
      polarization: dto.polarization,
      lifecycle: dto.lifecycle,
      // Procurement buys approved parts; it sees other states only when it asks for them.
      status: dto.status?.length ? dto.status : actor.role === 'procurement' ? ['approved'] : undefined,
      priceMax: dto.priceMax,
      currency: dto.currency ?? 'USD',
      coverage,
      sort: dto.sort ?? 'mpn',
      order: dto.order ?? 'asc',
      offset: dto.offset ?? 0,
      limit,
    };
  }

  async ensureFresh(): Promise<void> {
    const revision = await this.revision.current();
    if (revision === this.loadedRevision) return;
    // One reload at a time; requests arriving meanwhile wait for it.
    while (this.refreshing) await this.refreshing;
    if (Number(revision) <= this.loadedRevision) return;
    this.refreshing = this.reload(Number(revision)).finally(() => (this.refreshing = null));
    await this.refreshing;
  }

  private async reload(targetRevision: number): Promise<void> {
    const since = this.loadedRevision;
    const started = Date.now();
    const manager = this.dataSource.manager;
    const changed = 'SELECT id FROM parts WHERE revision > ?';
    const [rows, prices, bands, kinds, curves] = await Promise.all([
      manager.query(
        `SELECT p.id, m.name AS manufacturer, p.mpn, p.title, p.form_factor, p.connector, p.polarization, p.lifecycle, p.review_state, p.search_text, p.updated_at
           FROM parts p JOIN manufacturers m ON m.id = p.manufacturer_id WHERE p.revision > ?`,
        [since],
      ) as Promise<PartRow[]>,
      manager.query(
        `SELECT part_id, currency, MIN(min_unit_price) AS price FROM part_offers WHERE part_id IN (${changed}) AND min_unit_price IS NOT NULL GROUP BY part_id, currency`,
        [since],
      ) as Promise<{ part_id: number; currency: string; price: string }[]>,
      manager.query(
        `SELECT part_id, from_mhz AS fromMhz, to_mhz AS toMhz, max_vswr AS maxVswr, min_return_loss_db AS minReturnLossDb, efficiency_pct AS efficiencyPct, efficiency_basis AS efficiencyBasis, efficiency_statistic AS efficiencyStatistic, gain_basis AS gainBasis, peak_gain_dbi AS peakGainDbi, average_gain_dbi AS averageGainDbi FROM part_spec_bands WHERE part_id IN (${changed})`,
        [since],
      ),
      manager.query(`SELECT DISTINCT part_id, kind FROM part_measurements WHERE part_id IN (${changed})`, [since]) as Promise<
        { part_id: number; kind: MeasurementKind }[]
      >,
      loadCurrentCurves(manager, { sql: changed, params: [since] }, ['s11', 'efficiency']),
    ]);
    const group = <T extends { part_id: number }>(list: T[]) => {
      const map = new Map<number, T[]>();
      for (const item of list) (map.get(item.part_id) ?? map.set(item.part_id, []).get(item.part_id)!).push(item);
      return map;
    };
    const pricesBy = group(prices);
    const bandsBy = group(bands as (SpecBandClaimRow & { part_id: number })[]);
    const kindsBy = group(kinds);
    this.index.upsert(
      rows.map((row): IndexedPart => {
        const current = curves.get(row.id);
        const s11 = current?.s11?.curve;
        return {
          id: row.id,
          manufacturer: row.manufacturer,
          mpn: row.mpn,
          title: row.title,
          formFactor: row.form_factor,
          connector: row.connector,
          polarization: row.polarization,
          lifecycle: row.lifecycle,
          reviewState: row.review_state,
          searchText: row.search_text.toLowerCase(),
          lowestPrices: new Map((pricesBy.get(row.id) ?? []).map((p) => [p.currency, Number(p.price)])),
          measuredKinds: (kindsBy.get(row.id) ?? []).map((k) => k.kind).sort(),
          updatedAtMs: new Date(row.updated_at).getTime(),
          gamma: s11 ? { frequenciesHz: s11.frequenciesHz, values: s11.gammaMagnitude } : null,
          efficiency: current?.efficiency?.curve ?? null,
          efficiencyBasis: current?.efficiency?.basis ?? 'radiation',
          specBands: (bandsBy.get(row.id) ?? []).map((b): SpecBandClaim => specBandClaim(b)).sort((a, b) => a.fromHz - b.fromHz),
        };
      }),
    );
    this.loadedRevision = Math.max(this.loadedRevision, targetRevision);
    if (rows.length > 100) this.logger.log(`search index: ${rows.length} parts loaded in ${Date.now() - started} ms (${this.index.size} in all)`);
  }
}

type SpecBandClaimRow = Parameters<typeof specBandClaim>[0];
