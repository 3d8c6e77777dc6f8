import { Intent } from '@blueprintjs/core';
import type { Lifecycle, LibraryBand, ReviewState } from '../types';

/** One colour per state, everywhere in the catalogue. */
export const REVIEW_STATE_INTENT: Record<ReviewState, Intent> = {
  draft: Intent.NONE,
  'in-review': Intent.PRIMARY,
  approved: Intent.SUCCESS,
  restricted: Intent.WARNING,
  retired: Intent.DANGER,
};

export const LIFECYCLE_INTENT: Record<Lifecycle, Intent> = { active: Intent.NONE, nrnd: Intent.WARNING, eol: Intent.DANGER };

export const LIFECYCLE_LABEL: Record<Lifecycle, string> = { active: 'active', nrnd: 'not for new designs', eol: 'end of life' };

/** The span an antenna must cover for a band: lowest to highest edge of all its ranges (band edges: 3GPP TS 36.101 Table 5.5-1). */
export function bandSpan(band: LibraryBand): { fromMhz: number; toMhz: number } {
  return { fromMhz: Math.min(...band.ranges.map((r) => r.fromMhz)), toMhz: Math.max(...band.ranges.map((r) => r.toMhz)) };
}

/**
 * The search's `covers`: every range of every band, each checked on its own as the matrix checks it, so a part
 * that misses only the gap between a band's uplink and downlink is still found.
 */
export const rangesParam = (bands: LibraryBand[]) =>
  bands
    .flatMap((b) => b.ranges.map((r) => `${r.fromMhz}-${r.toMhz}`))
    .filter((range, i, all) => all.indexOf(range) === i)
    .join(',');

export const fmt = (value: number | null | undefined, digits = 2) =>
  value === null || value === undefined || !Number.isFinite(value) ? '—' : Number(value.toFixed(digits)).toString();
