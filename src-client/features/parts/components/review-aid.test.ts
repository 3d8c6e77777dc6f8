import { describe, expect, it } from 'vitest';
import type { BandCheck } from '../types';
import { claimLines, directivityText, summaryOf } from './review-aid';

const band = (overrides: Partial<BandCheck> = {}): BandCheck => ({
  fromMhz: 1710,
  toMhz: 2690,
  claimedMaxVswr: 2,
  measuredWorstVswr: 6.7203,
  measuredWorstVswrAtMhz: 2690,
  vswrAgrees: false,
  claimedEfficiencyPct: null,
  claimedEfficiencyBasis: 'total',
  claimedEfficiencyStatistic: 'average',
  measuredEfficiencyPct: null,
  measuredEfficiencyBasis: null,
  efficiencyAgrees: null,
  claimedPeakGainDbi: null,
  claimedGainBasis: 'peak',
  measuredPeakGainDbi: null,
  measuredGainBasis: null,
  peakGainAgrees: null,
  directivity: null,
  ...overrides,
});

describe('review aid wording', () => {
  it('writes a VSWR claim against the measured worst, as the issue words it', () => {
    expect(claimLines(band())).toEqual([{ quantity: 'vswr', text: 'claims VSWR ≤ 2 over 1710–2690 MHz; measured worst 6.72 at 2690 MHz', agrees: false }]);
  });

  it('says when an efficiency is on another basis and so not compared', () => {
    const [line] = claimLines(band({ claimedMaxVswr: null, claimedEfficiencyPct: 60, measuredEfficiencyPct: 40, measuredEfficiencyBasis: 'radiation' }));
    expect(line.text).toContain('60 %');
    expect(line.text).toContain('not compared');
    expect(line.agrees).toBeNull();
  });

  it('gives the implied directivity in dBi with its verdict (chip, 3 dBi at 20 %: 9.99 dBi)', () => {
    const d = directivityText(band({ directivity: { source: 'datasheet', maxDbi: 9.99, minDbi: 9.99, verdict: 'above-form-factor' } }), 5);
    expect(d?.text).toContain('10 dBi');
    expect(d?.text).toContain('5 dBi');
    expect(d?.intent).toBe('danger');
  });

  it('sums a part up: disagreements before missing data', () => {
    expect(summaryOf({ missing: ['datasheet'], plausibleMaxDirectivityDbi: 5, bands: [], disagreements: 2 }).intent).toBe('danger');
    expect(summaryOf({ missing: ['datasheet'], plausibleMaxDirectivityDbi: 5, bands: [], disagreements: 0 }).intent).toBe('warning');
    expect(summaryOf({ missing: [], plausibleMaxDirectivityDbi: 5, bands: [], disagreements: 0 }).intent).toBe('success');
  });
});
