import { Colors } from '@blueprintjs/core';
import type uPlot from 'uplot';

/** Unit the frequency axis is drawn in; the data always arrives in Hz. */
export type FrequencyUnit = 'Hz' | 'kHz' | 'MHz' | 'GHz';

/** One y series over the shared frequency points. */
export interface FrequencySeries {
  /** Legend and tooltip name, e.g. "VSWR". */
  label: string;
  /** One value per frequency point; null leaves a gap. */
  values: ReadonlyArray<number | null>;
  /** Unit shown on the axis and in the legend, e.g. "dB" or "" for ratios. Series with the same unit share one axis. */
  unit: string;
  /** Which side the series' axis sits on. @default 'left' for the first unit, 'right' for the second */
  side?: 'left' | 'right';
  /** Fixed axis range [min, max] in the series' unit; auto-ranged when omitted. */
  range?: [number, number];
  /** Draws the axis with larger values downwards (return loss read as a dip). @default false */
  inverted?: boolean;
  /** Axis title for this series' unit (the first series of a unit decides). @default the series labels and unit */
  axisLabel?: string;
  /** Dashed stroke, for a second (e.g. snapped) solution. @default false */
  dashed?: boolean;
}

/** A frequency range to shade behind the curves. */
export interface ShadedRange {
  fromHz: number;
  toHz: number;
  /** Short text drawn at the top of the range, e.g. "B20" or "VSWR ≤ 2". */
  label?: string;
  /** 'match' = a range that meets the criterion (success colour), 'band' = a radio band overlay. @default 'band' */
  kind?: 'match' | 'band';
}

/** A horizontal line, e.g. the VSWR limit. */
export interface ThresholdLine {
  value: number;
  /** Unit of the series the value belongs to (picks the axis). */
  unit: string;
  label?: string;
}

export interface ChartInput {
  frequencyHz: ReadonlyArray<number>;
  series: ReadonlyArray<FrequencySeries>;
  ranges?: ReadonlyArray<ShadedRange>;
  threshold?: ThresholdLine;
  xUnit?: FrequencyUnit;
  width: number;
  height: number;
}

export interface ChartConfig {
  options: uPlot.Options;
  data: uPlot.AlignedData;
}

export const FREQUENCY_UNIT_HZ: Record<FrequencyUnit, number> = { Hz: 1, kHz: 1e3, MHz: 1e6, GHz: 1e9 };

// Blueprint's palette keeps the chart in the product's colours without raw hex in components.
export const SERIES_COLOURS = [Colors.BLUE3, Colors.ORANGE3, Colors.VIOLET3, Colors.TURQUOISE3, Colors.GRAY3];
// GREEN3 is Intent.SUCCESS's colour, so "matched" looks the same here as everywhere else.
const MATCH_FILL = withAlpha(Colors.GREEN3, 0.18);
const BAND_FILL = withAlpha(Colors.BLUE3, 0.1);
const BAND_EDGE = Colors.BLUE3;
const THRESHOLD_COLOUR = Colors.RED3;
const LABEL_COLOUR = Colors.DARK_GRAY3;

/** Scale key for a unit; ratios have an empty unit and still need a key. */
export const scaleKeyFor = (unit: string): string => `y:${unit || 'ratio'}`;

/** Maps the chart's props to uPlot options and data; pure, so it is unit-tested without a canvas. */
export function buildChartOptions(input: ChartInput): ChartConfig {
  const xUnit = input.xUnit ?? 'MHz';
  const divisor = FREQUENCY_UNIT_HZ[xUnit];
  const x = Float64Array.from(input.frequencyHz, (hz) => hz / divisor);

  const units: string[] = [];
  for (const s of input.series) if (!units.includes(s.unit)) units.push(s.unit);

  const scales: uPlot.Scales = { x: { time: false } };
  const axes: uPlot.Axis[] = [{ label: `Frequency (${xUnit})`, stroke: LABEL_COLOUR, grid: { stroke: Colors.LIGHT_GRAY2 } }];
  units.forEach((unit, index) => {
    const first = input.series.find((s) => s.unit === unit)!;
    const side = first.side ?? (index === 0 ? 'left' : 'right');
    scales[scaleKeyFor(unit)] = {
      auto: first.range === undefined,
      ...(first.range ? { range: first.range } : {}),
      ...(first.inverted ? { dir: -1 } : {}),
    };
    axes.push({
      scale: scaleKeyFor(unit),
      side: side === 'left' ? 3 : 1,
      label: first.axisLabel ?? (units.length > 1 || unit ? axisLabel(input.series, unit) : undefined),
      stroke: LABEL_COLOUR,
      grid: { show: index === 0, stroke: Colors.LIGHT_GRAY2 },
    });
  });

  const series: uPlot.Series[] = [
    { label: `Frequency (${xUnit})`, value: (_u, v) => (v == null ? '—' : formatNumber(v)) },
    ...input.series.map((s, i) => ({
      label: s.unit ? `${s.label} (${s.unit})` : s.label,
      scale: scaleKeyFor(s.unit),
      stroke: SERIES_COLOURS[i % SERIES_COLOURS.length],
      width: 2,
      dash: s.dashed ? [6, 4] : undefined,
      spanGaps: false,
      points: { show: false },
      value: (_u: uPlot, v: number | null) => (v == null ? '—' : formatNumber(v)),
    })),
  ];

  const ranges = (input.ranges ?? []).map((r) => ({ ...r, from: r.fromHz / divisor, to: r.toHz / divisor }));
  const threshold = input.threshold;

  const options: uPlot.Options = {
    width: Math.max(200, Math.floor(input.width)),
    height: input.height,
    scales,
    axes,
    series,
    cursor: { drag: { x: true, y: false } },
    legend: { show: true },
    hooks: {
      // Ranges go under the curves, the threshold over them.
      drawClear: [(u) => drawRanges(u, ranges)],
      draw: threshold ? [(u) => drawThreshold(u, threshold)] : [],
    },
  };
  const data = [x, ...input.series.map((s) => Array.from(s.values))] as unknown as uPlot.AlignedData;
  return { options, data };
}

function axisLabel(series: ReadonlyArray<FrequencySeries>, unit: string): string {
  const names = series.filter((s) => s.unit === unit).map((s) => s.label);
  const uniqueNames = [...new Set(names)].join(', ');
  return unit ? `${uniqueNames} (${unit})` : uniqueNames;
}

/** '#rrggbb' + alpha → 'rgba(...)' for translucent fills. */
export function withAlpha(hex: string, alpha: number): string {
  const n = Number.parseInt(hex.replace('#', ''), 16);
  return `rgba(${(n >> 16) & 255}, ${(n >> 8) & 255}, ${n & 255}, ${alpha})`;
}

export function formatNumber(v: number): string {
  const abs = Math.abs(v);
  if (abs !== 0 && (abs >= 1e5 || abs < 1e-3)) return v.toExponential(3);
  return Number(v.toPrecision(5)).toString();
}

function drawRanges(u: uPlot, ranges: Array<ShadedRange & { from: number; to: number }>) {
  if (ranges.length === 0) return;
  const { ctx, bbox } = u;
  const min = u.scales.x.min ?? 0;
  const max = u.scales.x.max ?? 0;
  ctx.save();
  ctx.beginPath();
  ctx.rect(bbox.left, bbox.top, bbox.width, bbox.height);
  ctx.clip();
  const fontPx = Math.round(11 * devicePixelRatio);
  ctx.font = `${fontPx}px "Noto Sans", sans-serif`;
  ctx.textBaseline = 'top';
  ranges.forEach((r, i) => {
    if (r.to < min || r.from > max) return;
    const left = u.valToPos(Math.max(r.from, min), 'x', true);
    const right = u.valToPos(Math.min(r.to, max), 'x', true);
    const isMatch = r.kind === 'match';
    ctx.fillStyle = isMatch ? MATCH_FILL : BAND_FILL;
    ctx.fillRect(left, bbox.top, Math.max(1, right - left), bbox.height);
    if (!isMatch) {
      ctx.strokeStyle = BAND_EDGE;
      ctx.lineWidth = devicePixelRatio;
      ctx.setLineDash([4 * devicePixelRatio, 3 * devicePixelRatio]);
      ctx.strokeRect(left, bbox.top, Math.max(1, right - left), bbox.height);
      ctx.setLineDash([]);
    }
    if (r.label) {
      ctx.fillStyle = LABEL_COLOUR;
      // Match labels sit at the bottom and band labels at the top, so both stay readable when they overlap.
      const y = isMatch ? bbox.top + bbox.height - fontPx - 4 * devicePixelRatio : bbox.top + 4 * devicePixelRatio + (i % 2) * (fontPx + 3 * devicePixelRatio);
      ctx.fillText(r.label, left + 4 * devicePixelRatio, y);
    }
  });
  ctx.restore();
}

function drawThreshold(u: uPlot, threshold: ThresholdLine) {
  const key = scaleKeyFor(threshold.unit);
  const scale = u.scales[key];
  if (!scale || scale.min == null || scale.max == null) return;
  if (threshold.value < Math.min(scale.min, scale.max) || threshold.value > Math.max(scale.min, scale.max)) return;
  const { ctx, bbox } = u;
  const y = u.valToPos(threshold.value, key, true);
  ctx.save();
  ctx.strokeStyle = THRESHOLD_COLOUR;
  ctx.lineWidth = 1.5 * devicePixelRatio;
  ctx.setLineDash([6 * devicePixelRatio, 4 * devicePixelRatio]);
  ctx.beginPath();
  ctx.moveTo(bbox.left, y);
  ctx.lineTo(bbox.left + bbox.width, y);
  ctx.stroke();
  if (threshold.label) {
    ctx.setLineDash([]);
    ctx.fillStyle = THRESHOLD_COLOUR;
    ctx.font = `${Math.round(11 * devicePixelRatio)}px "Noto Sans", sans-serif`;
    ctx.textBaseline = 'bottom';
    ctx.textAlign = 'right';
    ctx.fillText(threshold.label, bbox.left + bbox.width - 4 * devicePixelRatio, y - 2 * devicePixelRatio);
  }
  ctx.restore();
}
