import { describe, expect, it, vi } from 'vitest';
import { render, screen } from '@testing-library/react';
import { buildChartOptions, scaleKeyFor, withAlpha } from './frequency-chart-options';

// uPlot draws on a canvas, which jsdom lacks: the mapping is tested as a pure function instead.
vi.mock('uplot', () => ({
  default: class {
    setSize() {}
    destroy() {}
  },
}));
vi.mock('uplot/dist/uPlot.min.css', () => ({}));

const base = {
  frequencyHz: [820e6, 868e6, 915e6],
  width: 640,
  height: 240,
};

describe(buildChartOptions.name, () => {
  it('converts the frequency axis from Hz to the chosen unit and keeps one data row per series', () => {
    const { data, options } = buildChartOptions({
      ...base,
      xUnit: 'MHz',
      series: [{ label: 'VSWR', unit: '', values: [3, 1.5, 2] }],
    });
    expect(Array.from(data[0] as ArrayLike<number>)).toEqual([820, 868, 915]);
    expect(data[1]).toEqual([3, 1.5, 2]);
    expect(options.axes?.[0].label).toBe('Frequency (MHz)');
    expect(options.width).toBe(640);
    expect(options.height).toBe(240);
  });

  it('gives each unit its own scale and axis, first on the left and second on the right', () => {
    const { options } = buildChartOptions({
      ...base,
      xUnit: 'GHz',
      series: [
        { label: 'VSWR', unit: '', values: [1, 2, 3], range: [1, 5] },
        { label: 'Return loss', unit: 'dB', values: [-20, -10, -6], inverted: true },
      ],
    });
    expect(options.series.map((s) => s.scale)).toEqual([undefined, scaleKeyFor(''), scaleKeyFor('dB')]);
    expect(options.axes?.slice(1).map((a) => [a.scale, a.side])).toEqual([
      [scaleKeyFor(''), 3],
      [scaleKeyFor('dB'), 1],
    ]);
    expect(options.scales?.[scaleKeyFor('')]).toMatchObject({ auto: false, range: [1, 5] });
    expect(options.scales?.[scaleKeyFor('dB')]).toMatchObject({ auto: true, dir: -1 });
    expect(options.series[2].label).toBe('Return loss (dB)');
  });

  it('shares one axis between series of the same unit and dashes the ones asked for', () => {
    const { options } = buildChartOptions({
      ...base,
      series: [
        { label: 'Exact', unit: 'dB', values: [1, 2, 3] },
        { label: 'Snapped', unit: 'dB', values: [1, 2, 4], dashed: true },
      ],
    });
    expect(options.axes).toHaveLength(2);
    expect(options.axes?.[1].label).toBe('Exact, Snapped (dB)');
    const titled = buildChartOptions({ ...base, series: [{ label: 'Exact', unit: 'dB', values: [1, 2, 3], axisLabel: 'Return loss (dB)' }] });
    expect(titled.options.axes?.[1].label).toBe('Return loss (dB)');
    expect(options.series[1].dash).toBeUndefined();
    expect(options.series[2].dash).toEqual([6, 4]);
    expect(options.series[1].stroke).not.toEqual(options.series[2].stroke);
  });

  it('registers the range hook under the curves and the threshold hook only when a threshold is given', () => {
    const without = buildChartOptions({ ...base, series: [{ label: 'VSWR', unit: '', values: [1, 2, 3] }] });
    expect(without.options.hooks?.draw).toHaveLength(0);
    const withLine = buildChartOptions({
      ...base,
      series: [{ label: 'VSWR', unit: '', values: [1, 2, 3] }],
      ranges: [{ fromHz: 850e6, toHz: 900e6, kind: 'match', label: 'VSWR ≤ 2' }],
      threshold: { value: 2, unit: '', label: 'VSWR 2' },
    });
    expect(withLine.options.hooks?.drawClear).toHaveLength(1);
    expect(withLine.options.hooks?.draw).toHaveLength(1);
  });

  it('keeps a minimum width so a collapsed container still draws', () => {
    const { options } = buildChartOptions({ ...base, width: 0, series: [] });
    expect(options.width).toBe(200);
  });
});

describe(withAlpha.name, () => {
  it('turns a hex colour into rgba', () => {
    expect(withAlpha('#238551', 0.5)).toBe('rgba(35, 133, 81, 0.5)');
  });
});

describe('FrequencyChart', () => {
  it('names the figure and describes its ranges for screen readers', async () => {
    const { FrequencyChart } = await import('./FrequencyChart');
    render(
      <FrequencyChart
        title="VSWR against frequency"
        frequencyHz={base.frequencyHz}
        series={[{ label: 'VSWR', unit: '', values: [3, 1.5, 2] }]}
        ranges={[{ fromHz: 863e6, toHz: 870e6, label: 'EU868' }]}
      />,
    );
    expect(screen.getByRole('img', { name: 'VSWR against frequency' })).toBeTruthy();
    expect(screen.getByText(/EU868: 863–870 MHz/)).toBeTruthy();
  });
});
