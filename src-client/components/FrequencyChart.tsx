import { useEffect, useId, useMemo, useRef, useState } from 'react';
import uPlot from 'uplot';
import 'uplot/dist/uPlot.min.css';
import {
  buildChartOptions,
  formatNumber,
  FREQUENCY_UNIT_HZ,
  type FrequencySeries,
  type FrequencyUnit,
  type ShadedRange,
  type ThresholdLine,
} from './frequency-chart-options';

export type { FrequencySeries, FrequencyUnit, ShadedRange, ThresholdLine } from './frequency-chart-options';

export interface FrequencyChartProps {
  /** Accessible name of the plot, also shown as its caption. */
  title: string;
  /** The x values in Hz, ascending; every series has one value per point. */
  frequencyHz: ReadonlyArray<number>;
  /** One or more y series; series with the same unit share an axis (first unit left, second right). */
  series: ReadonlyArray<FrequencySeries>;
  /** Frequency ranges shaded behind the curves (matched ranges, band overlays), with optional labels. @default [] */
  ranges?: ReadonlyArray<ShadedRange>;
  /** Optional horizontal limit line on the axis of the given unit. */
  threshold?: ThresholdLine;
  /** Unit of the frequency axis; the data stays in Hz. @default 'MHz' */
  xUnit?: FrequencyUnit;
  /** Plot height in px; the width follows the container. @default 280 */
  height?: number;
  /** One-sentence text alternative for screen readers; a summary of the ranges is appended. */
  description?: string;
}

/** The product's one plot of quantities against frequency (uPlot, resizes with its container). */
export function FrequencyChart({ title, frequencyHz, series, ranges = [], threshold, xUnit = 'MHz', height = 280, description }: FrequencyChartProps) {
  const containerRef = useRef<HTMLDivElement>(null);
  const plotRef = useRef<uPlot | null>(null);
  const [width, setWidth] = useState(0);
  const descriptionId = useId();

  useEffect(() => {
    const element = containerRef.current;
    if (!element) return;
    setWidth(element.clientWidth);
    const observer = new ResizeObserver((entries) => {
      const next = Math.floor(entries[0]?.contentRect.width ?? 0);
      if (next > 0) setWidth(next);
    });
    observer.observe(element);
    return () => observer.disconnect();
  }, []);

  const config = useMemo(
    () => buildChartOptions({ frequencyHz, series, ranges, threshold, xUnit, width: width || 600, height }),
    // Width is applied with setSize below, so a resize does not rebuild the plot.
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [frequencyHz, series, ranges, threshold, xUnit, height],
  );

  useEffect(() => {
    const element = containerRef.current;
    if (!element || width === 0) return;
    const plot = new uPlot({ ...config.options, width }, config.data, element);
    plotRef.current = plot;
    return () => {
      plot.destroy();
      plotRef.current = null;
    };
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [config, width === 0]);

  useEffect(() => {
    if (width > 0) plotRef.current?.setSize({ width, height });
  }, [width, height]);

  const divisor = FREQUENCY_UNIT_HZ[xUnit];
  const rangeSummary = ranges.length
    ? ranges
        .map((r) => `${r.label ?? (r.kind === 'match' ? 'match' : 'range')}: ${formatNumber(r.fromHz / divisor)}–${formatNumber(r.toHz / divisor)} ${xUnit}`)
        .join('; ')
    : '';

  return (
    <figure className="bw-chart" role="group" aria-labelledby={`${descriptionId}-title`} aria-describedby={descriptionId}>
      <figcaption id={`${descriptionId}-title`} className="bw-chart__title">
        {title}
      </figcaption>
      <div ref={containerRef} className="bw-chart__plot" role="img" aria-label={title} />
      <p id={descriptionId} className="bw-visually-hidden">
        {description ?? `${series.map((s) => s.label).join(', ')} against frequency, ${frequencyHz.length} points.`} {rangeSummary}
      </p>
    </figure>
  );
}
