import { returnLossDbFromVswr } from '../../rf/mismatch';
import { powerRatioToDb } from '../../rf/units';
import { FACT_CATALOG, isFactName } from './fact-catalog';
import { leafHolds } from './operators';
import type { EngineCondition } from './rule-binding';
import type { Facts } from './types';

/** How far a fact sits from the threshold that would make the condition true, in dB. */
export interface Margin {
  /** Positive: the condition is that far from holding; negative: it holds by that much; ±∞: no number decides it. */
  readonly distanceDb: number;
  readonly fact: string | null;
  readonly value: number | null;
  readonly threshold: number | null;
}

const NO_NUMBER_TRUE: Margin = { distanceDb: -Infinity, fact: null, value: null, threshold: null };
const NO_NUMBER_FALSE: Margin = { distanceDb: Infinity, fact: null, value: null, threshold: null };

/** A fact on a common dB scale so margins of different rules compare: ratios as 10 log10, VSWR as −return loss. */
function onDbScale(fact: string, value: number): number {
  const unit = isFactName(fact) ? FACT_CATALOG[fact].unit : 'none';
  if (unit === 'db' || unit === 'dbm' || unit === 'dbi') return value;
  if (unit === 'vswr') return value <= 1 ? -Infinity : -returnLossDbFromVswr(value);
  return value > 0 ? powerRatioToDb(value) : -Infinity;
}

const isBelow = (operator: string) => operator === 'lessThan' || operator === 'lessThanInclusive';
const isAbove = (operator: string) => operator === 'greaterThan' || operator === 'greaterThanInclusive';

/**
 * The margin of a (bound) condition tree: a numeric comparison measures the gap to its threshold;
 * "all" needs every part to hold (the farthest decides), "any" one (the nearest decides).
 * Plain loops: a catalogue ranking asks this for every rule of every pair.
 */
export function marginOf(node: EngineCondition, facts: Facts): Margin {
  if ('all' in node) {
    if (node.all.length === 0) return NO_NUMBER_TRUE;
    let farthest = marginOf(node.all[0], facts);
    for (let k = 1; k < node.all.length; k++) {
      const m = marginOf(node.all[k], facts);
      if (m.distanceDb > farthest.distanceDb) farthest = m;
    }
    return farthest;
  }
  if ('any' in node) {
    if (node.any.length === 0) return NO_NUMBER_TRUE;
    let nearest = marginOf(node.any[0], facts);
    for (let k = 1; k < node.any.length; k++) {
      const m = marginOf(node.any[k], facts);
      if (m.distanceDb < nearest.distanceDb) nearest = m;
    }
    return nearest;
  }
  if ('not' in node) {
    const inner = marginOf(node.not, facts);
    return { ...inner, distanceDb: -inner.distanceDb };
  }
  const value = facts[node.fact];
  const threshold =
    typeof node.value === 'object' && node.value !== null && !Array.isArray(node.value) && 'fact' in node.value
      ? facts[(node.value as { fact: string }).fact]
      : node.value;
  const below = isBelow(node.operator);
  if ((below || isAbove(node.operator)) && typeof value === 'number' && typeof threshold === 'number' && Number.isFinite(threshold)) {
    const gap = onDbScale(node.fact, value) - onDbScale(node.fact, threshold);
    return { distanceDb: below ? gap : -gap, fact: node.fact, value, threshold };
  }
  return leafHolds(node, facts) ? NO_NUMBER_TRUE : NO_NUMBER_FALSE;
}
