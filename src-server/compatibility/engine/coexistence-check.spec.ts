import { coexistenceRuleProblems, loadCoexistenceRule } from '../coexistence-rule-file';
import { checkCoexistence, receiveRangesOf, transmitRangesOf, victimTolerableDbm } from './coexistence-check';
import type { RadioBandRequirement } from './types';

const MHZ = 1e6;

function requirement(overrides: Partial<RadioBandRequirement>): RadioBandRequirement {
  return {
    radioId: 1,
    radioName: 'radio',
    technology: 'lte',
    bandId: 1,
    designation: 'band',
    ranges: [],
    txPowerDbm: 23,
    certifiedMaxGainDbi: null,
    feedLossDb: 0,
    requiredPolarization: null,
    productGroundPlane: null,
    regulatoryLimits: [],
    ...overrides,
  };
}

// 3GPP TS 36.101 Table 5.5-1: B13 uplink 777–787, downlink 746–756 MHz; GPS L1 1575.42 ± 10.23 MHz (IS-GPS-200).
const b13 = requirement({
  radioId: 11,
  designation: 'B13',
  ranges: [
    { role: 'uplink', fromHz: 777 * MHZ, toHz: 787 * MHZ },
    { role: 'downlink', fromHz: 746 * MHZ, toHz: 756 * MHZ },
  ],
});
const gps = requirement({
  radioId: 12,
  technology: 'gnss',
  designation: 'GPS L1',
  txPowerDbm: null,
  ranges: [{ role: 'receive', fromHz: 1565.19 * MHZ, toHz: 1585.65 * MHZ }],
});

describe(checkCoexistence.name, () => {
  const rule = loadCoexistenceRule();

  it('the rule file loads with the documented defaults', () => {
    expect(rule.parameters).toMatchObject({
      guardMhz: 10,
      maxHarmonicOrder: 5,
      intermodulationOrders: [3, 5],
      thermalNoiseDbmPerHz: -174,
      interferenceToNoiseDb: -6,
    });
  });

  it('refuses a bad rule naming the place', () => {
    const bad = JSON.parse(JSON.stringify(rule));
    bad.parameters.guardMhz = -1;
    bad.emissionDbc.harmonic['3'] = 5;
    delete bad.victims.gnss;
    bad.severities.isolationShort = 'terrible';
    expect(coexistenceRuleProblems(bad).map((p) => p.path)).toEqual([
      'parameters.guardMhz',
      'emissionDbc.harmonic.3',
      'victims.gnss.bandwidthMhz',
      'victims.gnss.noiseFigureDb',
      'severities.isolationShort',
    ]);
  });

  it('splits ranges by role; a receive-only radio transmits nothing', () => {
    expect(transmitRangesOf(b13).map((r) => r.fromHz)).toEqual([777 * MHZ]);
    expect(receiveRangesOf(b13).map((r) => r.fromHz)).toEqual([746 * MHZ]);
    expect(transmitRangesOf(gps)).toEqual([]);
  });

  it('B13 2nd harmonic on GPS L1 with the isolation it needs; with in-product isolation known, the margin decides', () => {
    // Tolerable: −174 dBm/Hz + 10·log10(2 MHz) + 2 dB NF − 6 dB I/N (common practice, from memory) = −114.99 dBm.
    expect(victimTolerableDbm(rule, 'gnss')).toBeCloseTo(-174 + 10 * Math.log10(2e6) + 2 - 6, 9);
    const unknown = checkCoexistence([b13, gps], rule, { simultaneousTransmit: null });
    const hit = unknown.find((f) => f.mechanism === 'harmonic' && f.order === 2)!;
    expect(hit).toMatchObject({ fromMhz: 1554, toMhz: 1574, isolationDb: null, severity: 'marginal' });
    expect(unknown.every((f) => f.aggressor.radioId === 11)).toBe(true);
    const required = hit.requiredIsolationDb;
    const enough = checkCoexistence([b13, gps], rule, { simultaneousTransmit: null, isolation: () => required + 1 }).find((f) => f.order === 2)!;
    expect(enough).toMatchObject({ isolationMarginDb: 1, severity: 'info' });
    const short = checkCoexistence([b13, gps], rule, { simultaneousTransmit: null, isolation: () => required - 3 }).find((f) => f.order === 2)!;
    expect(short).toMatchObject({ isolationMarginDb: -3, severity: 'fail' });
  });
});
