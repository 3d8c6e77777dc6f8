import { cleanup, render, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { FrequencyStrip, type StripRow } from './FrequencyStrip';
import { formatMhz, logAxis, mergeIntervals, piecewiseAxis } from './frequency-axis';

// 3GPP TS 36.101 Table 5.5-1 (B12, B20) and IS-GPS-200 (L1 1575.42 ± 10.23 MHz).
const rows: StripRow[] = [
  {
    id: 'cell',
    label: 'Cellular',
    ranges: [
      { role: 'uplink', fromMhz: 699, toMhz: 716, label: 'B12' },
      { role: 'downlink', fromMhz: 729, toMhz: 746, label: 'B12' },
      { role: 'uplink', fromMhz: 832, toMhz: 862, label: 'B20' },
      { role: 'downlink', fromMhz: 791, toMhz: 821, label: 'B20' },
    ],
    covered: [{ fromMhz: 690, toMhz: 800, label: 'Part X' }],
  },
  { id: 'gnss', label: 'GNSS', ranges: [{ role: 'receive', fromMhz: 1565.19, toMhz: 1585.65, label: 'GPS L1' }] },
  { id: 'nr', label: '5G', ranges: [{ role: 'tdd', fromMhz: 3300, toMhz: 3800, label: 'n78' }] },
];

describe('formatMhz', () => {
  it('writes MHz below 1 GHz and GHz above, without trailing zeros', () => {
    expect(formatMhz(700)).toBe('700 MHz');
    expect(formatMhz(868.1)).toBe('868.1 MHz');
    expect(formatMhz(1575.42)).toBe('1.58 GHz');
    expect(formatMhz(2000)).toBe('2 GHz');
    expect(formatMhz(5900)).toBe('5.9 GHz');
    expect(formatMhz(999.5)).toBe('999.5 MHz');
  });
});

describe('logAxis', () => {
  it('places a decade at equal distances and keeps ticks in order', () => {
    const axis = logAxis(100, 10000, 1000);
    expect(axis.x(100)).toBeCloseTo(0);
    expect(axis.x(1000)).toBeCloseTo(500);
    expect(axis.x(10000)).toBeCloseTo(1000);
    const xs = axis.ticks.map((t) => t.x);
    expect([...xs].sort((a, b) => a - b)).toEqual(xs);
    expect(axis.ticks.map((t) => t.label)).toContain('1 GHz');
  });
});

describe('piecewiseAxis', () => {
  it('is monotonic, shortens the gap between clusters and marks the break', () => {
    const axis = piecewiseAxis(
      [
        { fromMhz: 699, toMhz: 746 },
        { fromMhz: 3300, toMhz: 3800 },
      ],
      800,
    );
    expect(axis.breaks).toHaveLength(1);
    const fs = [672, 699, 716, 746, 3300, 3600, 3800];
    const xs = fs.map(axis.x);
    for (let i = 1; i < xs.length; i++) expect(xs[i]).toBeGreaterThanOrEqual(xs[i - 1]);
    // On one log axis the 746→3300 MHz gap would take most of the width; here it is only the break.
    expect(axis.x(3300 * 0.96) - axis.x(746 * 1.04)).toBeLessThan(30);
  });

  it('merges overlapping intervals', () => {
    expect(
      mergeIntervals([
        { fromMhz: 1710, toMhz: 1785 },
        { fromMhz: 1700, toMhz: 1720 },
        { fromMhz: 1805, toMhz: 1880 },
      ]),
    ).toEqual([
      { fromMhz: 1700, toMhz: 1785 },
      { fromMhz: 1805, toMhz: 1880 },
    ]);
  });
});

describe(FrequencyStrip.name, () => {
  afterEach(cleanup);

  it('draws one row per radio and one bar per range, with a hover title naming band, role and edges', () => {
    const { container } = render(<FrequencyStrip rows={rows} />);
    expect(screen.getAllByTestId('strip-row')).toHaveLength(3);
    expect(container.querySelectorAll('[data-role]')).toHaveLength(6);
    const titles = [...container.querySelectorAll('[data-role] > title')].map((t) => t.textContent);
    expect(titles).toContain('Cellular: B12 uplink (device transmits), 699 MHz – 716 MHz');
    expect(titles).toContain('GNSS: GPS L1 receive only, 1.57 GHz – 1.59 GHz');
  });

  it('tells the roles apart by pattern, not only by colour', () => {
    const { container } = render(<FrequencyStrip rows={rows} />);
    const fillOf = (role: string) => container.querySelector(`[data-role="${role}"] rect`)!.getAttribute('fill')!;
    const fills = ['uplink', 'downlink', 'receive', 'tdd'].map(fillOf);
    expect(new Set(fills).size).toBe(4);
    for (const fill of fills) {
      const id = fill.match(/^url\(#(.+)\)$/)![1];
      const pattern = container.querySelector(`pattern[id="${id}"]`)!;
      expect(pattern).not.toBeNull();
    }
    // Uplink is hatched, receive is dotted, downlink solid: different pattern contents.
    const contents = ['uplink', 'receive', 'downlink'].map((r) => {
      const id = fillOf(r).match(/#([^#)]+)\)/)![1];
      return [...container.querySelector(`pattern[id="${id}"]`)!.children].map((c) => c.tagName).join(',');
    });
    expect(new Set(contents).size).toBe(3);
    expect(screen.getByText('Uplink (device transmits)')).toBeTruthy();
    expect(screen.getByText('Receive only')).toBeTruthy();
  });

  it('labels ticks in MHz and GHz and marks the shortened gaps', () => {
    const { container } = render(<FrequencyStrip rows={rows} />);
    const labels = [...container.querySelectorAll('.bw-strip__tick-label')].map((t) => t.textContent ?? '');
    expect(labels.some((l) => l.endsWith(' MHz'))).toBe(true);
    expect(labels.some((l) => l.endsWith(' GHz'))).toBe(true);
    expect(screen.getAllByTestId('axis-break').length).toBeGreaterThanOrEqual(2);
  });

  it('stacks overlapping bands of one row in separate lanes instead of drawing them over each other', () => {
    // B5 UL 824–849 and B26 UL 814–849 overlap (3GPP TS 36.101 Table 5.5-1); B8 UL 880–915 does not.
    const { container } = render(
      <FrequencyStrip
        rows={[
          {
            id: 1,
            label: 'Cell',
            ranges: [
              { role: 'uplink', fromMhz: 824, toMhz: 849, label: 'B5' },
              { role: 'uplink', fromMhz: 814, toMhz: 849, label: 'B26' },
              { role: 'uplink', fromMhz: 880, toMhz: 915, label: 'B8' },
            ],
          },
        ]}
      />,
    );
    const ys = [...container.querySelectorAll('[data-role] rect')].map((r) => Number(r.getAttribute('y')));
    expect(ys[0]).not.toBe(ys[1]);
    expect(Math.min(...ys)).toBe(ys[2]);
  });

  it('draws the covered-ranges layer when given, with its own legend entry', () => {
    const { container } = render(<FrequencyStrip rows={rows} />);
    const covered = screen.getAllByTestId('covered-range');
    expect(covered).toHaveLength(1);
    expect(covered[0].querySelector('title')!.textContent).toBe('Part X covers 690 MHz – 800 MHz');
    expect(screen.getByText('Covered by the part')).toBeTruthy();
    expect(container.querySelectorAll('.bw-strip__legend-item').length).toBeGreaterThan(1);
    const without = within(render(<FrequencyStrip rows={rows.map((r) => ({ ...r, covered: [] }))} scale="log" />).container);
    expect(without.queryAllByTestId('covered-range')).toHaveLength(0);
    expect(without.queryAllByTestId('axis-break')).toHaveLength(0);
    expect(without.queryByText('Covered by the part')).toBeNull();
  });
});
