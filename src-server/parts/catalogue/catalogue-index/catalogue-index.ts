import { type FrequencyRange, type SampledCurve, interpolateAt, segmentIndex } from '../../../rf/curves';
import { gammaMagnitudeFromReturnLossDb, gammaMagnitudeFromVswr, vswrFromReturnLossDb } from '../../../rf/mismatch';
import type { Connector, EfficiencyBasis, FormFactor, Lifecycle, MeasurementKind, PartPolarization, ReviewState } from '../../part.types';
import { type SpecBandClaim, claimedMaxVswr, specBandsCover } from '../../spec-coverage';
import { type EfficiencySource, minTotalEfficiencyPctInRange } from '../../../compatibility/engine/compute-facts';

/**
 * The in-memory search index of the catalogue: every part's filterable fields, its newest |Γ| and
 * efficiency curves and its spec bands. A coverage query is exact for any threshold; a screen built
 * at load (see CoverageScreen) turns most parts away in a binary search before the exact check.
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
  /** Efficiency in % of the newest efficiency measurement, of the basis below. */
  readonly efficiency: SampledCurve | null;
  readonly efficiencyBasis: EfficiencyBasis;
  readonly specBands: readonly SpecBandClaim[];
}

export interface CoverageQuery {
  /** Every range of every band asked for, each checked on its own (never one span from the lowest to the highest edge). */
  readonly ranges: readonly FrequencyRange[];
  readonly vswrMax: number;
  /** Floor on total efficiency, as the matrix counts it (minTotalEfficiencyPct). */
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

const efficiencySources = new WeakMap<IndexedPart, EfficiencySource>();

/** The part as the rules engine reads its efficiency: one object per indexed part, so the engine's per-part caches hold. */
function efficiencySourceOf(part: IndexedPart): EfficiencySource {
  let source = efficiencySources.get(part);
  if (!source) {
    source = {
      efficiencyPercent: part.efficiency,
      efficiencyBasis: part.efficiencyBasis,
      specBands: part.specBands.map((b) => ({ ...b, efficiencyPercent: b.efficiencyPct })),
    };
    efficiencySources.set(part, source);
  }
  return source;
}

/**
 * Measured curves first; where a curve does not reach the range, the spec bands decide. The efficiency floor
 * applies to total efficiency worked out by the rules engine itself (minTotalEfficiencyPctInRange), so a part
 * the search finds is one the matrix and the candidates judge by the same figure.
 */
export function meetsCoverage(part: IndexedPart, query: CoverageQuery): boolean {
  const gammaLimit = gammaMagnitudeFromVswr(query.vswrMax);
  for (const range of query.ranges) {
    const worstGamma = part.gamma ? extremeInRange(part.gamma, range, 'max') : undefined;
    if (worstGamma !== undefined) {
      if (worstGamma > gammaLimit) return false;
    } else if (
      !specBandsCover(part.specBands, range, (b) => {
        const v = claimedMaxVswr(b);
        return v !== null && v <= query.vswrMax;
      })
    ) {
      return false;
    }
    if (query.minEfficiencyPct !== undefined) {
      const minTotal = minTotalEfficiencyPctInRange(efficiencySourceOf(part), part.gamma, range);
      if (minTotal === null || minTotal < query.minEfficiencyPct) return false;
    }
  }
  return true;
}

/**
 * VSWR limits the screen is built for: common datasheet figures, with RL 10 dB (VSWR ≈ 1.925,
 * Pozar 4th ed. §2.3) among them. A query uses the tightest one still at or above its own limit.
 */
const SCREEN_GAMMA_LIMITS: readonly number[] = [...[1.5, 2, 2.5, 3, 4, 6].map(gammaMagnitudeFromVswr), gammaMagnitudeFromReturnLossDb(10)].sort(
  (a, b) => a - b,
);
/** The same levels as VSWR, for spec bands, which claimedMaxVswr states as VSWR. */
const SCREEN_SPEC_VSWR: readonly number[] = [1.5, 2, 2.5, 3, 4, 6, vswrFromReturnLossDb(10)].sort((a, b) => a - b);
/** Far above the facts' rounding to 1e-9 (roundFactValue), far below any figure that matters. */
const ROUNDING_SLACK_PCT = 1e-6;
/** Efficiency floors in % the screen is built for; a query uses the highest one at or below its own floor. */
const SCREEN_EFFICIENCY_FLOORS: readonly number[] = [10, 20, 30, 40, 50, 60, 70, 80, 90];

/** Binary search: the first index whose frequency is >= frequencyHz (length when none). */
function firstAtOrAbove(frequenciesHz: ArrayLike<number>, frequencyHz: number): number {
  let low = 0;
  let high = frequenciesHz.length;
  while (low < high) {
    const middle = (low + high) >>> 1;
    if (frequenciesHz[middle] < frequencyHz) low = middle + 1;
    else high = middle;
  }
  return low;
}

/**
 * One curve's screen: for each level, the index of the next sample at or after i that breaks the
 * level (n when none). A sample that breaks a level stricter-or-equal to the query's, lying in
 * [fromHz, toHz], is itself in extremeInRange's extreme (edges on a sample interpolate to it), so
 * the range fails: rejections are exact, and anything not rejected gets the exact check.
 */
interface CurveScreen {
  readonly frequenciesHz: ArrayLike<number>;
  /** The range interpolateAt accepts, slack included: outside it the curve has no say. */
  readonly lowestHz: number;
  readonly highestHz: number;
  /** nextBreak[level][i], flattened as level * n + i. */
  readonly nextBreak: Uint16Array;
  /** Per level, one bit per BIN_HZ-wide frequency bin holding a sample that breaks the level; flattened as level * BIN_WORDS + word. */
  readonly dirtyBins: Uint32Array;
}

/** Fixed bins over 0..10.24 GHz: a bin wholly inside a range that holds a breaking sample fails it without a search. */
const BIN_HZ = 10e6;
const BIN_COUNT = 1024;
const BIN_WORDS = BIN_COUNT / 32;

function binOf(frequencyHz: number): number {
  let bin = Math.floor(frequencyHz / BIN_HZ);
  // Division rounds; the bin's own edges decide.
  if (bin * BIN_HZ > frequencyHz) bin -= 1;
  else if ((bin + 1) * BIN_HZ <= frequencyHz) bin += 1;
  return bin;
}

/** [word, mask, word, mask, …] of the bins lying wholly inside the range (none for a narrow one). */
export function binsInside(range: FrequencyRange): Int32Array {
  const startBin = binOf(range.fromHz);
  const first = Math.max(0, startBin * BIN_HZ < range.fromHz ? startBin + 1 : startBin);
  // The bin holding toHz ends above it; the one before ends at or below it.
  const last = Math.min(BIN_COUNT - 1, binOf(range.toHz) - 1);
  const pairs: number[] = [];
  for (let bin = first; bin <= last; bin++) {
    const word = bin >>> 5;
    if (pairs.length === 0 || pairs[pairs.length - 2] !== word) pairs.push(word, 0);
    pairs[pairs.length - 1] |= 1 << (bin & 31);
  }
  return Int32Array.from(pairs);
}

const EDGE_TOLERANCE = 1e-12;

function curveScreen(curve: SampledCurve, levels: readonly number[], breaks: (value: number, level: number) => boolean): CurveScreen | null {
  const f = curve.frequenciesHz;
  const n = f.length;
  if (n === 0 || n >= 0xffff) return null;
  const slack = EDGE_TOLERANCE * Math.max(Math.abs(f[0]), Math.abs(f[n - 1]));
  const nextBreak = new Uint16Array(levels.length * n);
  const dirtyBins = new Uint32Array(levels.length * BIN_WORDS);
  for (let level = 0; level < levels.length; level++) {
    let next = n;
    for (let i = n - 1; i >= 0; i--) {
      if (breaks(curve.values[i], levels[level])) {
        next = i;
        const bin = binOf(f[i]);
        if (bin >= 0 && bin < BIN_COUNT) dirtyBins[level * BIN_WORDS + (bin >>> 5)] |= 1 << (bin & 31);
      }
      nextBreak[level * n + i] = next;
    }
  }
  return { frequenciesHz: f, lowestHz: f[0] - slack, highestHz: f[n - 1] + slack, nextBreak, dirtyBins };
}

/** True when some sample inside [fromHz, toHz] breaks the level (the curve covers the range). */
function breaksIn(screen: CurveScreen, level: number, range: FrequencyRange, bins: Int32Array): boolean {
  const dirty = screen.dirtyBins;
  const base = level * BIN_WORDS;
  for (let k = 0; k < bins.length; k += 2) if ((dirty[base + bins[k]] & bins[k + 1]) !== 0) return true;
  const f = screen.frequenciesHz;
  const n = f.length;
  const start = firstAtOrAbove(f, range.fromHz);
  if (start >= n) return false;
  const next = screen.nextBreak[level * n + start];
  return next < n && f[next] <= range.toHz;
}

/** interpolateAt's own test at both edges, so the screen and meetsCoverage agree on which source decides. */
const within = (screen: CurveScreen, frequencyHz: number) => frequencyHz >= screen.lowestHz && frequencyHz <= screen.highestHz;
const covers = (screen: CurveScreen, range: FrequencyRange) => within(screen, range.fromHz) && within(screen, range.toHz);

export interface CoverageScreen {
  readonly gamma: CurveScreen | null;
  readonly efficiency: CurveScreen | null;
  /**
   * Per spec VSWR level, then per efficiency floor: [lowest, highest] Hz of the spec bands meeting it.
   * A range outside the hull at a level no stricter than the query's cannot be covered by them.
   */
  readonly specVswrHull: Float64Array;
  readonly specEfficiencyHull: Float64Array;
}

function specHull(bands: readonly SpecBandClaim[], levels: readonly number[], meets: (band: SpecBandClaim, level: number) => boolean): Float64Array {
  const hull = new Float64Array(levels.length * 2);
  for (let level = 0; level < levels.length; level++) {
    let lowest = Infinity;
    let highest = -Infinity;
    for (const band of bands) {
      if (!meets(band, levels[level])) continue;
      lowest = Math.min(lowest, band.fromHz);
      highest = Math.max(highest, band.toHz);
    }
    hull[level * 2] = lowest;
    hull[level * 2 + 1] = highest;
  }
  return hull;
}

/** Level -1 (a query looser than every level): nothing is turned away here. */
const outsideHull = (hull: Float64Array, level: number, range: FrequencyRange) =>
  level >= 0 && (range.fromHz < hull[level * 2] || range.toHz > hull[level * 2 + 1]);

export function coverageScreen(part: IndexedPart): CoverageScreen {
  return {
    gamma: part.gamma ? curveScreen(part.gamma, SCREEN_GAMMA_LIMITS, (value, limit) => value > limit) : null,
    // Total efficiency is at most the stated figure (× (1 − |Γ|²) ≤ 1), so a stated sample under the floor fails it; the slack covers the facts' rounding.
    efficiency: part.efficiency ? curveScreen(part.efficiency, SCREEN_EFFICIENCY_FLOORS, (value, floor) => value < floor - ROUNDING_SLACK_PCT) : null,
    specVswrHull: specHull(part.specBands, SCREEN_SPEC_VSWR, (band, level) => {
      const v = claimedMaxVswr(band);
      return v !== null && v <= level;
    }),
    specEfficiencyHull: specHull(
      part.specBands,
      SCREEN_EFFICIENCY_FLOORS,
      (band, floor) => band.efficiencyPct !== null && band.efficiencyPct >= floor - ROUNDING_SLACK_PCT,
    ),
  };
}

/** The screen levels a query may use: -1 where no level is safe for it. */
export interface ScreenLevels {
  readonly gamma: number;
  readonly specVswr: number;
  readonly efficiency: number;
  /** binsInside of each query range. */
  readonly bins: readonly Int32Array[];
}

export function screenLevels(query: CoverageQuery): ScreenLevels {
  const gammaLimit = gammaMagnitudeFromVswr(query.vswrMax);
  const gamma = SCREEN_GAMMA_LIMITS.findIndex((limit) => limit >= gammaLimit);
  let efficiency = -1;
  if (query.minEfficiencyPct !== undefined) {
    for (let level = 0; level < SCREEN_EFFICIENCY_FLOORS.length; level++) if (SCREEN_EFFICIENCY_FLOORS[level] <= query.minEfficiencyPct) efficiency = level;
  }
  const specVswr = SCREEN_SPEC_VSWR.findIndex((level) => level >= query.vswrMax);
  return { gamma, specVswr, efficiency, bins: query.ranges.map(binsInside) };
}

/**
 * True only when meetsCoverage is certainly false: a measured sample breaks a level at least as strict
 * as the query's, or a range the curve does not reach lies outside every spec band. False: ask meetsCoverage.
 */
export function screenRejects(screen: CoverageScreen, levels: ScreenLevels, query: CoverageQuery): boolean {
  for (let r = 0; r < query.ranges.length; r++) {
    const range = query.ranges[r];
    const gammaCovers = screen.gamma !== null && covers(screen.gamma, range);
    if (gammaCovers) {
      if (levels.gamma >= 0 && breaksIn(screen.gamma!, levels.gamma, range, levels.bins[r])) return true;
    } else if (outsideHull(screen.specVswrHull, levels.specVswr, range)) {
      return true;
    }
    if (query.minEfficiencyPct === undefined) continue;
    const efficiencyCovers = screen.efficiency !== null && covers(screen.efficiency, range);
    if (efficiencyCovers) {
      if (levels.efficiency >= 0 && breaksIn(screen.efficiency!, levels.efficiency, range, levels.bins[r])) return true;
    } else if (outsideHull(screen.specEfficiencyHull, levels.efficiency, range)) {
      return true;
    }
  }
  return false;
}

const compareText = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

const MAX_CACHED_RESULTS = 64;

export class CatalogueIndex {
  private readonly parts = new Map<number, IndexedPart>();
  private readonly screens = new Map<IndexedPart, CoverageScreen>();
  /** Parts in ascending order per sort key, built on first use after a change. */
  private readonly sorted = new Map<string, IndexedPart[]>();
  /** The screens in the same order as each sorted list: a Map lookup per part cost more than the screen. */
  private readonly sortedScreens = new Map<IndexedPart[], CoverageScreen[]>();
  /** Every match of recent queries (paging and sorting aside from offset/limit), cleared on every change. */
  private readonly results = new Map<string, IndexedPart[]>();

  get size(): number {
    return this.parts.size;
  }

  upsert(parts: Iterable<IndexedPart>): void {
    for (const part of parts) {
      const previous = this.parts.get(part.id);
      if (previous) this.screens.delete(previous);
      this.parts.set(part.id, part);
      this.screens.set(part, coverageScreen(part));
    }
    this.sorted.clear();
    this.sortedScreens.clear();
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
          case 'manufacturer':
            return `${p.manufacturer.toLowerCase()}\u0000${p.mpn.toLowerCase()}`;
          case 'title':
            return p.title.toLowerCase();
          case 'formFactor':
            return p.formFactor;
          case 'connector':
            return p.connector;
          case 'polarization':
            return p.polarization;
          case 'lifecycle':
            return p.lifecycle;
          case 'reviewState':
            return p.reviewState;
          default:
            return p.mpn.toLowerCase();
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
    const tokens = (query.q ?? '')
      .toLowerCase()
      .split(/\s+/)
      .filter((t) => t.length > 0);
    const sets = {
      formFactor: query.formFactor?.length ? new Set<string>(query.formFactor) : null,
      connector: query.connector?.length ? new Set<string>(query.connector) : null,
      polarization: query.polarization?.length ? new Set<string>(query.polarization) : null,
      status: query.status?.length ? new Set<string>(query.status) : null,
      lifecycle: query.lifecycle?.length ? new Set<string>(query.lifecycle) : null,
    };
    const coverage = query.coverage;
    const levels = coverage ? screenLevels(coverage) : null;
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
      return true;
    };
    const ordered = this.inOrder(query.sort, query.currency);
    let screens = this.sortedScreens.get(ordered);
    if (!screens) {
      screens = ordered.map((p) => this.screens.get(p)!);
      this.sortedScreens.set(ordered, screens);
    }
    const items: IndexedPart[] = [];
    const unpriced: IndexedPart[] = [];
    const descending = query.order === 'desc';
    const priceSort = query.sort === 'price';
    for (let k = 0; k < ordered.length; k++) {
      const at = descending ? ordered.length - 1 - k : k;
      if (coverage && screenRejects(screens[at], levels!, coverage)) continue;
      const part = ordered[at];
      if (!matches(part)) continue;
      if (coverage && !meetsCoverage(part, coverage)) continue;
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
