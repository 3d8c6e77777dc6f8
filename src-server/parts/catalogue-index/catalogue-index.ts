import { type FrequencyRange, type SampledCurve, interpolateAt, segmentIndex } from '../../rf/curves';
import { gammaMagnitudeFromVswr } from '../../rf/mismatch';
import type { Connector, FormFactor, Lifecycle, MeasurementKind, PartPolarization, ReviewState } from '../part.types';
import { type SpecBandClaim, claimedMaxVswr, specBandsCover } from '../spec-coverage';

/**
 * The in-memory search index of the catalogue: every part's filterable fields, its newest |Γ| and
 * efficiency curves and its spec bands. A coverage query then costs a few µs per part and is exact
 * for any threshold, where a table of precomputed intervals would fix the thresholds in advance.
 * Pure: the service loads it from the database and refreshes the parts whose revision moved.
 */
export interface IndexedPart {
  readonly id: number;
  readonly manufacturer: string;
  readonly mpn: string;
  readonly title: string;
  readonly formFactor: FormFactor;
  readonly connector: Connector;
  readonly polarization: PartPolarization;
  readonly lifecycle: Lifecycle;
  readonly reviewState: ReviewState;
  /** Lower-cased manufacturer, MPN, title and notes. */
  readonly searchText: string;
  /** Lowest unit price per currency over all offers. */
  readonly lowestPrices: ReadonlyMap<string, number>;
  readonly measuredKinds: readonly MeasurementKind[];
  readonly updatedAtMs: number;
  /** |Γ| of the newest S11 measurement. */
  readonly gamma: SampledCurve | null;
  /** Radiation efficiency in % of the newest efficiency measurement. */
  readonly efficiency: SampledCurve | null;
  readonly specBands: readonly SpecBandClaim[];
}

export interface CoverageQuery {
  readonly ranges: readonly FrequencyRange[];
  readonly vswrMax: number;
  readonly minEfficiencyPct?: number;
}

export const SORT_KEYS = ['mpn', 'manufacturer', 'title', 'formFactor', 'connector', 'polarization', 'lifecycle', 'reviewState', 'updatedAt', 'price'] as const;
export type SortKey = (typeof SORT_KEYS)[number];

export interface CatalogueQuery {
  readonly q?: string;
  readonly formFactor?: readonly FormFactor[];
  readonly connector?: readonly Connector[];
  readonly polarization?: readonly PartPolarization[];
  readonly status?: readonly ReviewState[];
  readonly lifecycle?: readonly Lifecycle[];
  readonly priceMax?: number;
  /** Currency of priceMax and of the price sort. */
  readonly currency: string;
  readonly coverage?: CoverageQuery;
  readonly sort: SortKey;
  readonly order: 'asc' | 'desc';
  readonly offset: number;
  /** 0 returns every match (export). */
  readonly limit: number;
}

/** Max (or min) of a sampled curve over [fromHz, toHz], edges interpolated; undefined when the range leaves the data. */
export function extremeInRange(curve: SampledCurve, range: FrequencyRange, mode: 'max' | 'min'): number | undefined {
  const atFrom = interpolateAt(curve, range.fromHz);
  if (atFrom === undefined) return undefined;
  const atTo = interpolateAt(curve, range.toHz);
  if (atTo === undefined) return undefined;
  const f = curve.frequenciesHz;
  const v = curve.values;
  let best = mode === 'max' ? Math.max(atFrom, atTo) : Math.min(atFrom, atTo);
  for (let i = segmentIndex(f, range.fromHz); i < f.length && f[i] < range.toHz; i++) {
    if (f[i] <= range.fromHz) continue;
    if (mode === 'max' ? v[i] > best : v[i] < best) best = v[i];
  }
  return best;
}

/** Measured curves first; where a curve does not reach the range, the spec bands decide. */
export function meetsCoverage(part: IndexedPart, query: CoverageQuery): boolean {
  const gammaLimit = gammaMagnitudeFromVswr(query.vswrMax);
  for (const range of query.ranges) {
    const worstGamma = part.gamma ? extremeInRange(part.gamma, range, 'max') : undefined;
    if (worstGamma !== undefined) {
      if (worstGamma > gammaLimit) return false;
    } else if (!specBandsCover(part.specBands, range, (b) => { const v = claimedMaxVswr(b); return v !== null && v <= query.vswrMax; })) {
      return false;
    }
    if (query.minEfficiencyPct !== undefined) {
      const minEfficiency = part.efficiency ? extremeInRange(part.efficiency, range, 'min') : undefined;
      if (minEfficiency !== undefined) {
        if (minEfficiency < query.minEfficiencyPct) return false;
      } else if (!specBandsCover(part.specBands, range, (b) => b.efficiencyPct !== null && b.efficiencyPct >= query.minEfficiencyPct!)) {
        return false;
      }
    }
  }
  return true;
}

const compareText = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

const MAX_CACHED_RESULTS = 64;

export class CatalogueIndex {
  private readonly parts = new Map<number, IndexedPart>();
  /** Parts in ascending order per sort key, built on first use after a change. */
  private readonly sorted = new Map<string, IndexedPart[]>();
  /** Every match of recent queries (paging and sorting aside from offset/limit), cleared on every change. */
  private readonly results = new Map<string, IndexedPart[]>();

  get size(): number {
    return this.parts.size;
  }

  upsert(parts: Iterable<IndexedPart>): void {
    for (const part of parts) this.parts.set(part.id, part);
    this.sorted.clear();
    this.results.clear();
  }

  get(id: number): IndexedPart | undefined {
    return this.parts.get(id);
  }

  private inOrder(sort: SortKey, currency: string): IndexedPart[] {
    const key = sort === 'price' ? `price:${currency}` : sort;
    let list = this.sorted.get(key);
    if (!list) {
      const text = (p: IndexedPart): string => {
        switch (sort) {
          case 'manufacturer': return `${p.manufacturer.toLowerCase()}\u0000${p.mpn.toLowerCase()}`;
          case 'title': return p.title.toLowerCase();
          case 'formFactor': return p.formFactor;
          case 'connector': return p.connector;
          case 'polarization': return p.polarization;
          case 'lifecycle': return p.lifecycle;
          case 'reviewState': return p.reviewState;
          default: return p.mpn.toLowerCase();
        }
      };
      const all = [...this.parts.values()];
      if (sort === 'updatedAt') list = all.sort((a, b) => a.updatedAtMs - b.updatedAtMs || a.id - b.id);
      else if (sort === 'price') {
        // Parts without a price in this currency sort last either way; see search().
        list = all.sort((a, b) => (a.lowestPrices.get(currency) ?? Infinity) - (b.lowestPrices.get(currency) ?? Infinity) || a.id - b.id);
      } else {
        const keys = new Map(all.map((p) => [p.id, text(p)]));
        list = all.sort((a, b) => compareText(keys.get(a.id)!, keys.get(b.id)!) || a.id - b.id);
      }
      this.sorted.set(key, list);
    }
    return list;
  }

  /** The page of a query; the full match list is kept for the next page of the same query until the catalogue changes. */
  search(query: CatalogueQuery): { items: IndexedPart[]; total: number } {
    const key = JSON.stringify({ ...query, offset: 0, limit: 0 });
    let all = this.results.get(key);
    if (!all) {
      all = this.matchAll(query);
      if (this.results.size >= MAX_CACHED_RESULTS) this.results.delete(this.results.keys().next().value!);
      this.results.set(key, all);
    }
    const items = query.limit === 0 ? all.slice(query.offset) : all.slice(query.offset, query.offset + query.limit);
    return { items, total: all.length };
  }

  /** One pass over the parts in sort order, collecting every match. */
  private matchAll(query: CatalogueQuery): IndexedPart[] {
    const tokens = (query.q ?? '').toLowerCase().split(/\s+/).filter((t) => t.length > 0);
    const sets = {
      formFactor: query.formFactor?.length ? new Set<string>(query.formFactor) : null,
      connector: query.connector?.length ? new Set<string>(query.connector) : null,
      polarization: query.polarization?.length ? new Set<string>(query.polarization) : null,
      status: query.status?.length ? new Set<string>(query.status) : null,
      lifecycle: query.lifecycle?.length ? new Set<string>(query.lifecycle) : null,
    };
    const coverage = query.coverage;
    const matches = (p: IndexedPart): boolean => {
      if (sets.status && !sets.status.has(p.reviewState)) return false;
      if (sets.formFactor && !sets.formFactor.has(p.formFactor)) return false;
      if (sets.connector && !sets.connector.has(p.connector)) return false;
      if (sets.polarization && !sets.polarization.has(p.polarization)) return false;
      if (sets.lifecycle && !sets.lifecycle.has(p.lifecycle)) return false;
      if (query.priceMax !== undefined) {
        const price = p.lowestPrices.get(query.currency);
        if (price === undefined || price > query.priceMax) return false;
      }
      for (const token of tokens) if (!p.searchText.includes(token)) return false;
      if (coverage && !meetsCoverage(p, coverage)) return false;
      return true;
    };
    const ordered = this.inOrder(query.sort, query.currency);
    const items: IndexedPart[] = [];
    const unpriced: IndexedPart[] = [];
    const descending = query.order === 'desc';
    const priceSort = query.sort === 'price';
    for (let k = 0; k < ordered.length; k++) {
      const part = ordered[descending ? ordered.length - 1 - k : k];
      if (!matches(part)) continue;
      if (priceSort && !part.lowestPrices.has(query.currency)) {
        unpriced.push(part);
        continue;
      }
      items.push(part);
    }
    // Parts without a price in the currency come last in either order.
    for (const part of descending ? unpriced.reverse() : unpriced) items.push(part);
    return items;
  }
}
