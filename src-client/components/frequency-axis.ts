/** Pure frequency-axis maths for FrequencyStrip: log and piecewise-log scales, ticks and labels. */

export interface FrequencyInterval {
  fromMhz: number;
  toMhz: number;
}

export interface FrequencyAxis {
  /** Pixel x of a frequency; frequencies in a hidden gap of a piecewise axis map to the gap. */
  x: (mhz: number) => number;
  ticks: { mhz: number; x: number; label: string }[];
  /** Pixel positions of the breaks of a piecewise axis (none for a log axis). */
  breaks: number[];
  width: number;
}

/** "700 MHz", "868 MHz", "1.58 GHz", "5.9 GHz": three significant figures at most, MHz below 1 GHz. */
export function formatMhz(mhz: number): string {
  if (mhz < 1000) return `${Number(mhz.toPrecision(4))} MHz`;
  return `${Number((mhz / 1000).toPrecision(3))} GHz`;
}

const NICE_STEPS = [1, 1.2, 1.5, 2, 2.5, 3, 4, 5, 6, 7, 8];

/** Candidate tick frequencies between from and to: 1-1.2-1.5-2… per decade. */
function candidates(fromMhz: number, toMhz: number): number[] {
  const out: number[] = [];
  for (let decade = 10 ** Math.floor(Math.log10(fromMhz)); decade <= toMhz; decade *= 10) {
    for (const step of NICE_STEPS) {
      const f = Number((step * decade).toPrecision(6));
      if (f >= fromMhz && f <= toMhz) out.push(f);
    }
  }
  return out;
}

/** 1 per decade first, then 2 and 5, then the rest: decade ticks survive when space is short. */
function tickPriority(mhz: number): number {
  const mantissa = Number((mhz / 10 ** Math.floor(Math.log10(mhz))).toPrecision(3));
  if (mantissa === 1) return 0;
  if (mantissa === 2 || mantissa === 5) return 1;
  return 2;
}

/** Keeps ticks at least minGapPx from each other, the most important first; returned in x order. */
function thin(ticks: { mhz: number; x: number }[], minGapPx: number): { mhz: number; x: number }[] {
  const kept: { mhz: number; x: number }[] = [];
  const byPriority = [...ticks].sort((a, b) => tickPriority(a.mhz) - tickPriority(b.mhz) || a.x - b.x);
  for (const t of byPriority) if (kept.every((k) => Math.abs(k.x - t.x) >= minGapPx)) kept.push(t);
  return kept.sort((a, b) => a.x - b.x);
}

/** Merges intervals that overlap or touch, sorted by start. */
export function mergeIntervals(intervals: FrequencyInterval[]): FrequencyInterval[] {
  const sorted = [...intervals].filter((i) => i.toMhz > 0 && i.fromMhz > 0).sort((a, b) => a.fromMhz - b.fromMhz);
  const merged: FrequencyInterval[] = [];
  for (const i of sorted) {
    const last = merged[merged.length - 1];
    if (last && i.fromMhz <= last.toMhz) last.toMhz = Math.max(last.toMhz, i.toMhz);
    else merged.push({ ...i });
  }
  return merged;
}

/** A log axis over [fromMhz, toMhz] drawn across width px. */
export function logAxis(fromMhz: number, toMhz: number, width: number, minTickGapPx = 56): FrequencyAxis {
  const lo = Math.log10(fromMhz);
  const span = Math.max(Math.log10(toMhz) - lo, 1e-9);
  const x = (mhz: number) => ((Math.log10(Math.max(mhz, 1e-9)) - lo) / span) * width;
  const ticks = thin(
    candidates(fromMhz, toMhz).map((mhz) => ({ mhz, x: x(mhz) })),
    minTickGapPx,
  ).map((t) => ({ ...t, label: formatMhz(t.mhz) }));
  return { x, ticks, breaks: [], width };
}

/**
 * A piecewise log axis: the clusters where something is drawn (each padded by `padding` of its
 * frequency) share the width in proportion to their log span, and the empty gaps between them
 * shrink to `gapPx` with a break mark. Keeps 700 MHz and 5 GHz bands readable on one strip.
 */
export function piecewiseAxis(
  intervals: FrequencyInterval[],
  width: number,
  { padding = 0.04, gapPx = 18, minClusterShare = 0.06, minTickGapPx = 56 } = {},
): FrequencyAxis {
  const clusters = mergeIntervals(intervals.map((i) => ({ fromMhz: i.fromMhz * (1 - padding), toMhz: i.toMhz * (1 + padding) })));
  if (!clusters.length) return logAxis(100, 10000, width, minTickGapPx);
  const usable = Math.max(width - gapPx * (clusters.length - 1), clusters.length);
  const spans = clusters.map((c) => Math.log10(c.toMhz / c.fromMhz));
  const total = spans.reduce((a, b) => a + b, 0);
  // Narrow clusters (a single GNSS signal) still get a readable minimum share.
  const shares = spans.map((s) => Math.max(s / total, minClusterShare));
  const shareSum = shares.reduce((a, b) => a + b, 0);
  const segments: { c: FrequencyInterval; x0: number; w: number }[] = [];
  let cursor = 0;
  clusters.forEach((c, i) => {
    const w = (shares[i] / shareSum) * usable;
    segments.push({ c, x0: cursor, w });
    cursor += w + gapPx;
  });
  const x = (mhz: number) => {
    for (let i = 0; i < segments.length; i++) {
      const s = segments[i];
      if (mhz < s.c.fromMhz) return i === 0 ? s.x0 : s.x0 - gapPx / 2;
      if (mhz <= s.c.toMhz) return s.x0 + (Math.log10(mhz / s.c.fromMhz) / Math.log10(s.c.toMhz / s.c.fromMhz)) * s.w;
    }
    const last = segments[segments.length - 1];
    return last.x0 + last.w;
  };
  const raw = segments.flatMap((s) => {
    const inner = candidates(s.c.fromMhz, s.c.toMhz);
    // A narrow cluster with no nice value inside gets its centre labelled.
    const picks = inner.length ? inner : [Number(Math.sqrt(s.c.fromMhz * s.c.toMhz).toPrecision(3))];
    return picks.map((mhz) => ({ mhz, x: x(mhz) }));
  });
  const ticks = thin(raw, minTickGapPx).map((t) => ({ ...t, label: formatMhz(t.mhz) }));
  const breaks = segments.slice(1).map((s) => s.x0 - gapPx / 2);
  return { x, ticks, breaks, width };
}
