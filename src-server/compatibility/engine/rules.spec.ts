import { mwToDbm } from '../../rf/units';
import { loadRuleFiles } from '../rule-files';
import { CompiledRuleSet } from './compiled-evaluator';
import { computeFacts, roundFactValue } from './compute-facts';
import { MHZ, constructedPart, constructedRequirement, flatCurve, flatReflection, rangeMhz, steppedReflection } from './fixtures';
import { ReferenceEvaluator } from './reference-evaluator';
import type { ParameterValue, RuleDefinition } from './rule-definition';
import type { CellVerdict, Facts, PartEvaluationData, RadioBandRequirement } from './types';

const FILE_RULES = loadRuleFiles();

function ruleWith(id: string, parameters: Record<string, ParameterValue> = {}): RuleDefinition {
  const rule = FILE_RULES.find((r) => r.id === id);
  if (!rule) throw new Error(`no rule file ${id}.json`);
  return { ...rule, parameters: { ...rule.parameters, ...parameters } };
}

/** One rule on one pair, through both evaluation paths; they must agree before anything else is asserted. */
async function check(id: string, requirement: RadioBandRequirement, part: PartEvaluationData, parameters: Record<string, ParameterValue> = {}) {
  const rule = ruleWith(id, parameters);
  const facts = computeFacts(requirement, part);
  const fast = new CompiledRuleSet([rule]).evaluate(facts);
  const reference = await new ReferenceEvaluator([rule]).evaluate(facts);
  expect(fast).toEqual(reference);
  return { facts, verdict: fast, finding: fast.findings.find((f) => f.ruleId === id) };
}

const lte = (overrides: Partial<RadioBandRequirement> = {}) => constructedRequirement(overrides);

describe('rule files', () => {
  it('loads all seventeen starting rules, each enabled at version 1 with a named source', () => {
    expect(FILE_RULES.map((r) => r.id)).toEqual([
      'band-coverage',
      'certified-gain-cap',
      'datasheet-only',
      'detuning-margin',
      'efficiency-floor',
      'efficiency-target',
      'eval-board-unknown',
      'gnss-polarization',
      'ground-plane-quarter-wave',
      'ground-plane-vs-eval-board',
      'part-end-of-life',
      'part-not-approved',
      'part-not-recommended',
      'part-retired',
      'polarization-opposite-sense',
      'regional-power-limit',
      'vswr-in-band',
    ]);
    for (const rule of FILE_RULES) {
      expect(rule.enabled).toBe(true);
      expect(rule.source.length).toBeGreaterThan(10);
    }
  });
});

describe('band-coverage', () => {
  // Common practice: VSWR 3:1 is the loosest match accepted in small devices.
  it('passes a band matched at VSWR 2.9 everywhere (coverage 100 %, at the threshold)', async () => {
    const { facts, finding } = await check('band-coverage', lte(), constructedPart({ vswr: 2.9 }));
    expect(facts.coverageAtVswr3Pct).toBe(100);
    expect(finding).toBeUndefined();
  });

  it('fails B12 when the match leaves 3:1 at 744 MHz, and names the uncovered 744–746 MHz', async () => {
    const part = constructedPart({}, { reflection: steppedReflection(600 * MHZ, 900 * MHZ, 744 * MHZ, 3) });
    const { facts, finding } = await check('band-coverage', lte(), part);
    // 3GPP TS 36.101 Table 5.5-1: B12 UL 699–716, DL 729–746 MHz, so 32 of 34 MHz are covered.
    expect(facts.coverageAtVswr3Pct as number).toBeCloseTo((32 / 34) * 100, 8);
    expect(finding).toMatchObject({ severity: 'fail', code: 'BAND_NOT_COVERED' });
    expect(finding!.message).toBe('VSWR ≤ 3:1 covers only 94.12 % of B12; not covered: 744–746 MHz');
  });

  it('turns on the threshold exactly: at, just inside and just outside a 94.1 % minimum', async () => {
    const part = constructedPart({}, { reflection: steppedReflection(600 * MHZ, 900 * MHZ, 744 * MHZ, 3) });
    const coverage = (32 / 34) * 100;
    expect((await check('band-coverage', lte(), part, { minCoveragePct: roundFactValue(coverage) })).finding).toBeUndefined();
    expect((await check('band-coverage', lte(), part, { minCoveragePct: coverage - 0.01 })).finding).toBeUndefined();
    expect((await check('band-coverage', lte(), part, { minCoveragePct: coverage + 0.01 })).finding?.severity).toBe('fail');
  });

  it('reports no data, not a pass, when the band lies outside the measured range', async () => {
    const part = constructedPart({ fromHz: 800 * MHZ, toHz: 1000 * MHZ });
    const { facts, verdict, finding } = await check('band-coverage', lte(), part);
    expect(facts.coverageAtVswr3Pct).toBeNull();
    expect(finding).toMatchObject({ severity: 'no-data', code: 'BAND_NOT_COVERED_NO_DATA' });
    expect(verdict.status).toBe('no-data');
  });

  it('judges a datasheet-only part from its spec bands: a spec band elsewhere covers nothing of B12', async () => {
    const spec = (fromMhz: number, toMhz: number, maxVswr: number) => ({
      fromHz: fromMhz * MHZ,
      toHz: toMhz * MHZ,
      maxVswr,
      minReturnLossDb: null,
      efficiencyPercent: 50,
      peakGainDbi: 1,
      averageGainDbi: null,
    });
    const base = { reflection: null, radiationEfficiencyPercent: null, peakGainDbi: null };
    const covered = await check('band-coverage', lte(), constructedPart({}, { ...base, specBands: [spec(690, 760, 2.5)] }));
    expect(covered.finding).toBeUndefined();
    const elsewhere = await check('band-coverage', lte(), constructedPart({}, { ...base, specBands: [spec(824, 960, 2)] }));
    expect(elsewhere.facts.coverageAtVswr3Pct).toBe(0);
    expect(elsewhere.finding?.severity).toBe('fail');
  });
});

describe('vswr-in-band', () => {
  // Common practice: VSWR ≤ 2:1 target; VSWR 2 = RL 9.54 dB (Pozar 4th ed. §2.3).
  it('passes VSWR 2.00 (at), 1.99 (inside), and marks 2.01 (outside) marginal', async () => {
    const at = await check('vswr-in-band', lte(), constructedPart({ vswr: 2 }));
    expect(at.facts.worstVswr).toBe(2);
    expect(at.facts.worstReturnLossDb as number).toBeCloseTo(9.54, 2);
    expect(at.finding).toBeUndefined();
    expect((await check('vswr-in-band', lte(), constructedPart({ vswr: 1.99 }))).finding).toBeUndefined();
    const outside = await check('vswr-in-band', lte(), constructedPart({ vswr: 2.01 }));
    expect(outside.finding).toMatchObject({ severity: 'marginal', code: 'VSWR_ABOVE_TARGET' });
    expect(outside.finding!.message).toBe('worst VSWR in B12 is 2.01:1 at 699 MHz (return loss 9.48 dB); the target is 2:1');
  });

  it('takes the −10 dB return-loss criterion as VSWR 1.925 when set so', async () => {
    const part = constructedPart({ vswr: 1.95 });
    expect((await check('vswr-in-band', lte(), part)).finding).toBeUndefined();
    expect((await check('vswr-in-band', lte(), part, { maxVswr: 1.925 })).finding?.severity).toBe('marginal');
  });
});

describe('efficiency-floor', () => {
  // Common practice: sub-GHz cellular in small trackers often 15–40 %; floor 15 % for lte.
  const part = (efficiencyPercent: number) => constructedPart({ vswr: 1, efficiencyPercent });

  it('passes 15 % (at) and 15.1 % (inside) and fails 14.9 % (outside) on an LTE band', async () => {
    expect((await check('efficiency-floor', lte(), part(15))).finding).toBeUndefined();
    expect((await check('efficiency-floor', lte(), part(15.1))).finding).toBeUndefined();
    const outside = await check('efficiency-floor', lte(), part(14.9));
    expect(outside.finding).toMatchObject({ severity: 'fail', code: 'EFFICIENCY_BELOW_FLOOR' });
    expect(outside.finding!.message).toBe('total efficiency falls to 14.9 % at 699 MHz; the floor for lte is 15 %');
  });

  it('reads the floor from the per-technology table: 30 % for GNSS', async () => {
    const gnss = lte({ technology: 'gnss', designation: 'GPS L1', ranges: [rangeMhz(1574.397, 1576.443, 'receive')], txPowerDbm: null });
    expect((await check('efficiency-floor', gnss, part(30))).finding).toBeUndefined();
    expect((await check('efficiency-floor', gnss, part(29.9))).finding?.message).toContain('the floor for gnss is 30 %');
  });

  it('counts the mismatch: 60 % radiation at VSWR 2 is 53.3 % total', async () => {
    const { facts } = await check('efficiency-floor', lte(), constructedPart({ vswr: 2, efficiencyPercent: 60 }));
    expect(facts.minTotalEfficiencyPct as number).toBeCloseTo(53.33, 2);
    expect(facts.avgTotalEfficiencyDb as number).toBeCloseTo(-2.73, 2);
    expect(facts.minRadiationEfficiencyPct).toBe(60);
  });

  it('reports no data when the part has no efficiency curve or spec figure', async () => {
    const { finding } = await check('efficiency-floor', lte(), constructedPart({}, { radiationEfficiencyPercent: null }));
    expect(finding).toMatchObject({ severity: 'no-data', code: 'EFFICIENCY_BELOW_FLOOR_NO_DATA' });
    expect(finding!.message).toContain('efficiency');
  });
});

describe('efficiency-target', () => {
  // Common practice: 40 % for cellular, 50 % ("good") for the others.
  it('passes 40 % (at) and 40.1 % (inside), marks 39.9 % (outside) marginal', async () => {
    const part = (e: number) => constructedPart({ vswr: 1, efficiencyPercent: e });
    expect((await check('efficiency-target', lte(), part(40))).finding).toBeUndefined();
    expect((await check('efficiency-target', lte(), part(40.1))).finding).toBeUndefined();
    expect((await check('efficiency-target', lte(), part(39.9))).finding).toMatchObject({ severity: 'marginal', code: 'EFFICIENCY_BELOW_TARGET' });
  });
});

describe('certified-gain-cap', () => {
  // The module's grant lists its maximum antenna gain; here 2 dBi.
  const certified = lte({ certifiedMaxGainDbi: 2 });

  it('passes 2 dBi (at) and 1.99 dBi (inside), fails 2.01 dBi (outside)', async () => {
    expect((await check('certified-gain-cap', certified, constructedPart({ gainDbi: 2 }))).finding).toBeUndefined();
    expect((await check('certified-gain-cap', certified, constructedPart({ gainDbi: 1.99 }))).finding).toBeUndefined();
    const over = await check('certified-gain-cap', certified, constructedPart({ gainDbi: 2.01 }));
    expect(over.finding).toMatchObject({ severity: 'fail', code: 'GAIN_OVER_CERTIFIED' });
    expect(over.finding!.message).toBe("peak gain 2.01 dBi on the transmit ranges of B12 is 0.01 dB over the module's certified maximum of 2 dBi");
  });

  it('does not apply when the grant states no gain or the radio only receives', async () => {
    const none = await check('certified-gain-cap', lte(), constructedPart({ gainDbi: 9 }));
    expect(none.verdict.findings).toEqual([]);
    const rx = await check('certified-gain-cap', lte({ certifiedMaxGainDbi: 2, txPowerDbm: null }), constructedPart({ gainDbi: 9 }));
    expect(rx.verdict.findings).toEqual([]);
  });

  it('looks at the transmit ranges only: a gain peak in the downlink does not count', async () => {
    const part = constructedPart(
      {},
      { peakGainDbi: { frequenciesHz: Float64Array.from([600e6, 720e6, 725e6, 900e6]), values: Float64Array.from([1, 1, 5, 5]) } },
    );
    const { facts, finding } = await check('certified-gain-cap', certified, part);
    expect(facts.txPeakGainDbi).toBe(1);
    expect(facts.peakGainDbi).toBe(5);
    expect(finding).toBeUndefined();
  });
});

describe('regional-power-limit', () => {
  // ETSI EN 300 220-2 / ERC/REC 70-03 Annex 1: 868.0–868.6 MHz, 25 mW e.r.p. = 13.979 dBm.
  const erp25mW = { region: 'EU', fromHz: 868.0 * MHZ, toHz: 868.6 * MHZ, kind: 'erp' as const, valueDbm: mwToDbm(25), source: 'ETSI EN 300 220-2' };
  const lora = (txPowerDbm: number) =>
    lte({ technology: 'ism', designation: 'EU868', ranges: [rangeMhz(863, 870, 'tdd')], txPowerDbm, regulatoryLimits: [erp25mW] });
  const dipole = constructedPart({ gainDbi: 2.15 });

  it('passes ERP exactly 25 mW (at) and 13.9 dBm (inside); fails 14 dBm ERP (outside, 0.02 dB over)', async () => {
    const at = await check('regional-power-limit', lora(mwToDbm(25)), dipole);
    // ERP 25 mW = 16.13 dBm e.i.r.p.
    expect(at.facts.eirpDbm as number).toBeCloseTo(16.13, 2);
    expect(at.finding).toBeUndefined();
    expect((await check('regional-power-limit', lora(13.9), dipole)).finding).toBeUndefined();
    const over = await check('regional-power-limit', lora(14), dipole);
    expect(over.finding).toMatchObject({ severity: 'fail', code: 'OVER_REGIONAL_LIMIT' });
    expect(over.finding!.message).toBe('ERP 14 dBm exceeds the EU limit of 13.98 dBm by -0.02 dB (ETSI EN 300 220-2)');
  });

  // 47 CFR 15.247(b)(3)+(b)(4): 30 dBm conducted, minus (G − 6) above 6 dBi, so 36 dBm EIRP point-to-multipoint.
  const fcc = { region: 'US', fromHz: 2400 * MHZ, toHz: 2483.5 * MHZ, kind: 'eirp' as const, valueDbm: 36, source: '47 CFR 15.247(b)(4)' };
  const wifi = (feedLossDb = 0) =>
    lte({ technology: 'wifi', designation: '2.4 GHz', ranges: [rangeMhz(2400, 2483.5, 'tdd')], txPowerDbm: 30, feedLossDb, regulatoryLimits: [fcc] });

  it('passes 30 dBm into 6 dBi (36 dBm EIRP, at), fails 6.1 dBi, and counts the feed loss', async () => {
    expect((await check('regional-power-limit', wifi(), constructedPart({ gainDbi: 6 }))).finding).toBeUndefined();
    expect((await check('regional-power-limit', wifi(), constructedPart({ gainDbi: 5.9 }))).finding).toBeUndefined();
    expect((await check('regional-power-limit', wifi(), constructedPart({ gainDbi: 6.1 }))).finding?.severity).toBe('fail');
    expect((await check('regional-power-limit', wifi(0.5), constructedPart({ gainDbi: 6.4 }))).finding).toBeUndefined();
  });

  // 47 CFR 15.247(b)(4) as a conducted rule: 30 dBm minus (G − 6) above 6 dBi; at 9 dBi 27 dBm.
  const conducted = {
    region: 'US',
    fromHz: 2400 * MHZ,
    toHz: 2483.5 * MHZ,
    kind: 'conducted-gain-rule' as const,
    valueDbm: 30,
    gainThresholdDbi: 6,
    reductionDbPerDb: 1,
    source: '47 CFR 15.247(b)(4)',
  };
  const wifiConducted = (txPowerDbm: number) =>
    lte({ technology: 'wifi', designation: '2.4 GHz', ranges: [rangeMhz(2400, 2483.5, 'tdd')], txPowerDbm, regulatoryLimits: [conducted] });

  it('applies the conducted gain rule: 27 dBm into 9 dBi passes (at), 26.9 passes, 27.1 fails', async () => {
    const at = await check('regional-power-limit', wifiConducted(27), constructedPart({ gainDbi: 9 }));
    expect(at.facts.regionalLimitDbm).toBe(27);
    expect(at.finding).toBeUndefined();
    expect((await check('regional-power-limit', wifiConducted(26.9), constructedPart({ gainDbi: 9 }))).finding).toBeUndefined();
    expect((await check('regional-power-limit', wifiConducted(27.1), constructedPart({ gainDbi: 9 }))).finding?.severity).toBe('fail');
    // Below the 6 dBi threshold the full 30 dBm is allowed.
    expect((await check('regional-power-limit', wifiConducted(30), constructedPart({ gainDbi: 5 }))).finding).toBeUndefined();
  });

  it('reports no data when the gain under the limit is unknown', async () => {
    const { finding } = await check('regional-power-limit', wifi(), constructedPart({}, { peakGainDbi: null }));
    expect(finding).toMatchObject({ severity: 'no-data', code: 'OVER_REGIONAL_LIMIT_NO_DATA' });
  });
});

describe('ground-plane-vs-eval-board', () => {
  // Common practice: datasheet figures hold only on the evaluation board's size.
  const withBoard = (lengthMm: number, widthMm: number) => lte({ productGroundPlane: { lengthMm, widthMm } });
  const part = constructedPart({}, { evaluationGroundPlane: { lengthMm: 80, widthMm: 40 } });

  it('passes a board equal to the evaluation board (at) or larger (inside), in either orientation', async () => {
    expect((await check('ground-plane-vs-eval-board', withBoard(80, 40), part)).finding).toBeUndefined();
    expect((await check('ground-plane-vs-eval-board', withBoard(40, 80), part)).finding).toBeUndefined();
    expect((await check('ground-plane-vs-eval-board', withBoard(100, 50), part)).finding).toBeUndefined();
  });

  it('marks a board 0.1 mm shorter than the evaluation board marginal', async () => {
    const { finding } = await check('ground-plane-vs-eval-board', withBoard(79.9, 40), part);
    expect(finding).toMatchObject({ severity: 'marginal', code: 'GROUND_PLANE_BELOW_EVAL_BOARD' });
    expect(finding!.message).toContain('is 99.88 % of the evaluation board (80 × 40 mm)');
  });

  it('does not apply when the part states no evaluation board; eval-board-unknown notes it instead', async () => {
    const noBoard = constructedPart({}, { evaluationGroundPlane: null });
    expect((await check('ground-plane-vs-eval-board', withBoard(80, 40), noBoard)).verdict.findings).toEqual([]);
    const note = await check('eval-board-unknown', withBoard(80, 40), noBoard);
    expect(note.finding).toMatchObject({ severity: 'info', code: 'EVAL_BOARD_UNKNOWN' });
    expect(note.verdict.status).toBe('pass');
    expect((await check('eval-board-unknown', withBoard(80, 40), part)).finding).toBeUndefined();
  });
});

describe('ground-plane-quarter-wave', () => {
  // λ/4 at 699 MHz = 107.2 mm (c = 299 792 458 m/s); the ≥ λ/4 rule is common practice.
  const quarterWaveMm = (299_792_458 / 699e6 / 4) * 1000;
  const withLength = (lengthMm: number) => lte({ productGroundPlane: { lengthMm, widthMm: 50 } });

  it('computes λ/4 at the lowest frequency of B12 as 107.2 mm', async () => {
    const { facts } = await check('ground-plane-quarter-wave', withLength(120), constructedPart());
    expect(facts.quarterWaveMm as number).toBeCloseTo(107.2, 1);
    expect(facts.bandLowestMhz).toBe(699);
  });

  it('passes λ/4 (at) and λ/4 + 0.1 mm (inside), marks λ/4 − 0.1 mm (outside) marginal', async () => {
    expect((await check('ground-plane-quarter-wave', withLength(quarterWaveMm), constructedPart())).finding).toBeUndefined();
    expect((await check('ground-plane-quarter-wave', withLength(quarterWaveMm + 0.1), constructedPart())).finding).toBeUndefined();
    const short = await check('ground-plane-quarter-wave', withLength(quarterWaveMm - 0.1), constructedPart());
    expect(short.finding).toMatchObject({ severity: 'marginal', code: 'GROUND_PLANE_BELOW_QUARTER_WAVE' });
  });

  it('uses λ/4 = 48.1 mm for GNSS upper L-band from 1559 MHz', async () => {
    const gnss = lte({ technology: 'gnss', ranges: [rangeMhz(1559, 1610, 'receive')], txPowerDbm: null, productGroundPlane: { lengthMm: 48, widthMm: 30 } });
    const { facts, finding } = await check('ground-plane-quarter-wave', gnss, constructedPart());
    expect(facts.quarterWaveMm as number).toBeCloseTo(48.1, 1);
    expect(finding?.severity).toBe('marginal');
  });
});

describe('gnss-polarization and polarization-opposite-sense', () => {
  // Balanis, Antenna Theory 4th ed. §2.12: linear antenna for a circular signal loses 3.01 dB; opposite senses reject.
  const gnss = lte({
    technology: 'gnss',
    designation: 'GPS L1',
    ranges: [rangeMhz(1574.397, 1576.443, 'receive')],
    txPowerDbm: null,
    requiredPolarization: 'RHCP',
  });
  const withPolarization = (polarization: PartEvaluationData['polarization']) => constructedPart({}, { polarization });

  it('marks a linear part on an RHCP signal marginal with about 3 dB', async () => {
    const { facts, finding } = await check('gnss-polarization', gnss, withPolarization('linear'));
    expect(facts.polarizationLossDb as number).toBeCloseTo(3.01, 2);
    expect(finding).toMatchObject({ severity: 'marginal', code: 'POLARIZATION_LOSS' });
    expect(finding!.message).toBe('a linear antenna receiving a RHCP signal loses about 3.01 dB; allowed 1 dB');
  });

  it('turns at the threshold: allowed 3.0103 dB (at) and 3.02 dB (inside) pass, 3.0 dB (outside) does not', async () => {
    const loss = roundFactValue(10 * Math.log10(2));
    expect((await check('gnss-polarization', gnss, withPolarization('linear'), { maxLossDb: loss })).finding).toBeUndefined();
    expect((await check('gnss-polarization', gnss, withPolarization('linear'), { maxLossDb: 3.02 })).finding).toBeUndefined();
    expect((await check('gnss-polarization', gnss, withPolarization('linear'), { maxLossDb: 3.0 })).finding?.severity).toBe('marginal');
  });

  it('passes an RHCP part, fails an LHCP part, and reports no data for an unknown polarization', async () => {
    expect((await check('gnss-polarization', gnss, withPolarization('RHCP'))).finding).toBeUndefined();
    expect((await check('polarization-opposite-sense', gnss, withPolarization('RHCP'))).finding).toBeUndefined();
    expect((await check('polarization-opposite-sense', gnss, withPolarization('LHCP'))).finding).toMatchObject({
      severity: 'fail',
      code: 'POLARIZATION_OPPOSITE',
    });
    expect((await check('gnss-polarization', gnss, withPolarization(null))).finding?.severity).toBe('no-data');
  });

  it('does not apply to a radio that states no polarization or a linear one', async () => {
    expect((await check('gnss-polarization', lte(), withPolarization('linear'))).verdict.findings).toEqual([]);
    expect((await check('gnss-polarization', lte({ requiredPolarization: 'linear' }), withPolarization(null))).verdict.findings).toEqual([]);
  });
});

describe('review state and lifecycle rules', () => {
  const part = (overrides: Partial<PartEvaluationData>) => constructedPart({}, overrides);

  it('marks draft, in-review and restricted parts marginal, and leaves approved ones alone', async () => {
    for (const reviewState of ['draft', 'in-review', 'restricted'] as const) {
      expect((await check('part-not-approved', lte(), part({ reviewState }))).finding).toMatchObject({ severity: 'marginal', code: 'PART_NOT_APPROVED' });
    }
    expect((await check('part-not-approved', lte(), part({ reviewState: 'approved' }))).finding).toBeUndefined();
  });

  it('fails retired parts (and does not also call them merely unapproved)', async () => {
    for (const reviewState of ['retired'] as const) {
      expect((await check('part-retired', lte(), part({ reviewState }))).finding?.severity).toBe('fail');
      expect((await check('part-not-approved', lte(), part({ reviewState }))).finding).toBeUndefined();
    }
  });

  it('fails end-of-life parts and marks NRND parts marginal', async () => {
    expect((await check('part-end-of-life', lte(), part({ lifecycle: 'eol' }))).finding?.severity).toBe('fail');
    expect((await check('part-end-of-life', lte(), part({ lifecycle: 'nrnd' }))).finding).toBeUndefined();
    expect((await check('part-not-recommended', lte(), part({ lifecycle: 'nrnd' }))).finding?.severity).toBe('marginal');
    expect((await check('part-not-recommended', lte(), part({ lifecycle: 'active' }))).finding).toBeUndefined();
  });
});

describe('datasheet-only', () => {
  it('notes spec-band data as info, which leaves the cell a pass', async () => {
    const specPart = constructedPart(
      {},
      {
        reflection: null,
        radiationEfficiencyPercent: null,
        peakGainDbi: null,
        specBands: [{ fromHz: 690 * MHZ, toHz: 760 * MHZ, maxVswr: 2, minReturnLossDb: null, efficiencyPercent: 50, peakGainDbi: 1, averageGainDbi: null }],
      },
    );
    const { facts, verdict, finding } = await check('datasheet-only', lte(), specPart);
    expect(facts.dataSource).toBe('spec');
    expect(finding?.severity).toBe('info');
    expect(verdict.status).toBe('pass');
  });
});

describe('the whole starting set on one pair', () => {
  async function both(requirement: RadioBandRequirement, part: PartEvaluationData): Promise<{ facts: Facts; verdict: CellVerdict }> {
    const facts = computeFacts(requirement, part);
    const verdict = new CompiledRuleSet(FILE_RULES).evaluate(facts);
    expect(verdict).toEqual(await new ReferenceEvaluator(FILE_RULES).evaluate(facts));
    return { facts, verdict };
  }

  it('passes a good part on a large board', async () => {
    expect((await both(lte(), constructedPart())).verdict).toEqual({ status: 'pass', findings: [] });
  });

  it('ranks fail above no-data above marginal', async () => {
    const marginal = await both(lte(), constructedPart({ vswr: 2.2 }));
    expect(marginal.verdict.status).toBe('marginal');
    const noData = await both(lte(), constructedPart({ vswr: 2.2 }, { radiationEfficiencyPercent: null }));
    expect(noData.verdict.status).toBe('no-data');
    const fail = await both(lte(), constructedPart({ vswr: 3.5 }, { radiationEfficiencyPercent: null }));
    expect(fail.verdict.status).toBe('fail');
    expect(fail.verdict.findings.map((f) => f.code)).toEqual(
      expect.arrayContaining(['BAND_NOT_COVERED', 'VSWR_ABOVE_TARGET', 'EFFICIENCY_BELOW_FLOOR_NO_DATA']),
    );
  });

  it('uses a measured curve across both ranges of an FDD band and skips the duplex gap', async () => {
    // Efficiency dips to 10 % between UL and DL (720 MHz) only: the band itself stays at 70 %.
    const dip = { frequenciesHz: Float64Array.from([600e6, 716e6, 720e6, 729e6, 900e6]), values: Float64Array.from([70, 70, 10, 70, 70]) };
    const { facts } = await both(lte(), constructedPart({ vswr: 1 }, { radiationEfficiencyPercent: dip, reflection: flatReflection(600e6, 900e6, 1) }));
    expect(facts.minRadiationEfficiencyPct).toBe(70);
    expect(flatCurve(0, 1, 1).values.length).toBe(11);
  });
});
