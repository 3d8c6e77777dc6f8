import { mwToDbm } from '../../rf/units';
import { loadRuleFiles } from '../rule-files';
import { CompiledRuleSet } from './compiled-evaluator';
import { computeFacts, roundFactValue } from './compute-facts';
import { MHZ, constructedPart, constructedRequirement, flatCurve, flatReflection, rangeMhz, specBand, steppedReflection } from './fixtures';
import { ReferenceEvaluator } from './reference-evaluator';
import { type ParameterValue, type RuleDefinition, validateRuleDefinition } from './rule-definition';
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
      efficiencyBasis: 'radiation' as const,
      efficiencyStatistic: 'minimum' as const,
      peakGainDbi: 1,
      averageGainDbi: null,
      gainBasis: 'peak' as const,
    });
    const base = { reflection: null, efficiencyPercent: null, peakGainDbi: null };
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
    expect(outside.finding!.message).toBe(
      'efficiency at the radio port falls to 14.9 % at 699 MHz (antenna total efficiency 14.9 %, feed loss 0 dB); the floor for lte is 15 %',
    );
  });

  // Pozar, Microwave Engineering 4th ed. §2.3: |Γ| = (VSWR − 1)/(VSWR + 1) = 0.5 at VSWR 3, so 1 − |Γ|² = 0.75.
  // IEEE Std 145-2013 (from memory): total efficiency = radiation efficiency × (1 − |Γ|²); a total figure already holds it.
  it('counts the mismatch once: 40 % radiation at VSWR 3 is 30 % total, 40 % declared total stays 40 %', async () => {
    const radiation = await check('efficiency-floor', lte(), constructedPart({ vswr: 3, efficiencyPercent: 40 }));
    expect(radiation.facts.minTotalEfficiencyPct).toBe(30);
    expect(radiation.facts.minRadiationEfficiencyPct).toBe(40);
    const total = await check('efficiency-floor', lte(), constructedPart({ vswr: 3, efficiencyPercent: 40 }, { efficiencyBasis: 'total' }));
    expect(total.facts.minTotalEfficiencyPct).toBe(40);
    expect(total.facts.avgTotalEfficiencyPct).toBe(40);
    // Radiation efficiency is not stated by total data, and not made up.
    expect(total.facts.minRadiationEfficiencyPct).toBeNull();
  });

  it('judges the floor on total efficiency from the basis: 20 % radiation at VSWR 3 (15 % total) is at the LTE floor, 19.9 % under it; 14.9 % total fails', async () => {
    expect((await check('efficiency-floor', lte(), constructedPart({ vswr: 3, efficiencyPercent: 20 }))).finding).toBeUndefined();
    const under = await check('efficiency-floor', lte(), constructedPart({ vswr: 3, efficiencyPercent: 19.9 }));
    expect(under.facts.minTotalEfficiencyPct).toBeCloseTo(14.925, 9);
    expect(under.finding?.severity).toBe('fail');
    expect((await check('efficiency-floor', lte(), constructedPart({ vswr: 3, efficiencyPercent: 15 }, { efficiencyBasis: 'total' }))).finding).toBeUndefined();
    expect(
      (await check('efficiency-floor', lte(), constructedPart({ vswr: 3, efficiencyPercent: 14.9 }, { efficiencyBasis: 'total' }))).finding?.severity,
    ).toBe('fail');
  });

  it('needs S11 to turn radiation data into total efficiency, and not for total data', async () => {
    const radiation = await check('efficiency-floor', lte(), constructedPart({ efficiencyPercent: 60 }, { reflection: null }));
    expect(radiation.facts.minTotalEfficiencyPct).toBeNull();
    expect(radiation.finding?.severity).toBe('no-data');
    const total = await check('efficiency-floor', lte(), constructedPart({ efficiencyPercent: 60 }, { reflection: null, efficiencyBasis: 'total' }));
    expect(total.facts.minTotalEfficiencyPct).toBe(60);
    expect(total.finding).toBeUndefined();
  });

  it('says when the efficiency is a datasheet band average rather than a minimum', () => {
    const line = (efficiencyStatistic: 'minimum' | 'average') =>
      constructedPart(
        {},
        { reflection: null, efficiencyPercent: null, specBands: [specBand(690, 760, { maxVswr: 2, efficiencyPercent: 40, efficiencyStatistic })] },
      );
    expect(computeFacts(lte(), line('average')).efficiencyFromBandAverage).toBe(true);
    expect(computeFacts(lte(), line('minimum')).efficiencyFromBandAverage).toBe(false);
    expect(computeFacts(lte(), constructedPart()).efficiencyFromBandAverage).toBe(false);
  });

  it('reads each datasheet line by its own basis', async () => {
    const line = (efficiencyBasis: 'radiation' | 'total') =>
      constructedPart(
        {},
        { reflection: null, efficiencyPercent: null, specBands: [specBand(690, 760, { maxVswr: 3, efficiencyPercent: 40, efficiencyBasis })] },
      );
    expect((await check('efficiency-floor', lte(), line('radiation'))).facts.minTotalEfficiencyPct).toBe(30);
    expect((await check('efficiency-floor', lte(), line('total'))).facts.minTotalEfficiencyPct).toBe(40);
  });

  // System efficiency at the radio port = total efficiency × 10^(−L/10) (definition; rf-reference §6).
  it('judges the floor at the radio port: 1.5 dB of feed loss takes 50 % total to 35.4 %, and 21.2 % total under the 15 % LTE floor', async () => {
    const fed = await check('efficiency-floor', lte({ feedLossDb: 1.5 }), constructedPart({ vswr: 1, efficiencyPercent: 50 }));
    expect(fed.facts.minTotalEfficiencyPct).toBe(50);
    // 10^(−0.15) = 0.70795: 50 % → 35.397 %.
    expect(fed.facts.minSystemEfficiencyPct as number).toBeCloseTo(35.397, 3);
    expect(fed.facts.avgSystemEfficiencyPct as number).toBeCloseTo(35.397, 3);
    expect(fed.finding).toBeUndefined();
    // 15 % / 0.70795 = 21.188 % total is exactly at the floor after the feed; a little less falls under it; without the feed it passes.
    const atFloor = 15 / 10 ** -0.15;
    expect((await check('efficiency-floor', lte({ feedLossDb: 1.5 }), constructedPart({ vswr: 1, efficiencyPercent: atFloor }))).finding).toBeUndefined();
    const under = await check('efficiency-floor', lte({ feedLossDb: 1.5 }), constructedPart({ vswr: 1, efficiencyPercent: 21 }));
    expect(under.facts.minTotalEfficiencyPct).toBe(21);
    expect(under.facts.minSystemEfficiencyPct as number).toBeCloseTo(14.867, 3);
    expect(under.finding).toMatchObject({ severity: 'fail', code: 'EFFICIENCY_BELOW_FLOOR' });
    expect(under.finding!.message).toBe(
      'efficiency at the radio port falls to 14.87 % at 699 MHz (antenna total efficiency 21 %, feed loss 1.5 dB); the floor for lte is 15 %',
    );
    expect((await check('efficiency-floor', lte(), constructedPart({ vswr: 1, efficiencyPercent: 21 }))).finding).toBeUndefined();
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
    const { finding } = await check('efficiency-floor', lte(), constructedPart({}, { efficiencyPercent: null }));
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

  it('does not apply when the radio only receives', async () => {
    const rx = await check('certified-gain-cap', lte({ certifiedMaxGainDbi: 2, txPowerDbm: null }), constructedPart({ gainDbi: 9 }));
    expect(rx.verdict.findings).toEqual([]);
  });

  it('leaves a transmitting band with no certified gain entered "not checked", with a code that says so (issue 12)', async () => {
    const none = await check('certified-gain-cap', lte({ certifiedMaxGainDbi: null }), constructedPart({ gainDbi: 1 }));
    expect(none.verdict.status).toBe('no-data');
    expect(none.finding).toMatchObject({ severity: 'no-data', code: 'CERTIFIED_GAIN_NOT_ENTERED' });
    // Gain entered but the part's gain unknown: the rule's general "no data", not the missing-entry code.
    const noGain = await check('certified-gain-cap', lte({ certifiedMaxGainDbi: 2 }), constructedPart({ gainDbi: 1 }, { peakGainDbi: null }));
    expect(noGain.finding).toMatchObject({ severity: 'no-data', code: 'GAIN_OVER_CERTIFIED_NO_DATA' });
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

  describe('issue 12: not checked is not a pass', () => {
    const inEu = { ...erp25mW, markets: ['EU'] };

    it('leaves a transmitting band "not checked" when a market using it has no limit on file, naming the market', async () => {
      const bothMarkets = lte({ ...lora(13), markets: ['EU', 'US'], regulatoryLimits: [inEu] });
      const { facts, verdict, finding } = await check('regional-power-limit', bothMarkets, dipole);
      expect(facts.marketsWithoutLimit).toBe('US');
      expect(verdict.status).toBe('no-data');
      expect(finding).toMatchObject({ severity: 'no-data', code: 'REGULATORY_LIMIT_NOT_ON_FILE' });
      expect(finding!.message).toContain('US');
      // No limit at all for the band's only market: not checked either.
      const none = await check('regional-power-limit', lte({ ...lora(13), markets: ['US'], regulatoryLimits: [] }), dipole);
      expect(none.finding).toMatchObject({ severity: 'no-data', code: 'REGULATORY_LIMIT_NOT_ON_FILE' });
    });

    it('judges the band when every market has a limit, and says nothing for a radio that only receives', async () => {
      const checked = await check('regional-power-limit', lte({ ...lora(13), markets: ['EU'], regulatoryLimits: [inEu] }), dipole);
      expect(checked.facts.marketsWithoutLimit).toBe('none');
      expect(checked.finding).toBeUndefined();
      const rx = await check('regional-power-limit', lte({ ...lora(13), txPowerDbm: null, markets: ['US'], regulatoryLimits: [] }), dipole);
      expect(rx.verdict.findings).toEqual([]);
    });
  });

  describe('issue 12: the channels a radio lists decide the sub-band', () => {
    // ERC/REC 70-03 Annex 1 / EU 2017/1483: 868.0–868.6 MHz 25 mW e.r.p.; 869.4–869.65 MHz 500 mW e.r.p. (26.99 dBm).
    const erp500mW = { region: 'EU', fromHz: 869.4 * MHZ, toHz: 869.65 * MHZ, kind: 'erp' as const, valueDbm: mwToDbm(500), source: 'EU 2017/1483' };
    const gateway = (channels: { fromHz: number; toHz: number }[] | null) =>
      lte({
        technology: 'ism',
        designation: 'EU868',
        ranges: [rangeMhz(863, 870, 'tdd')],
        txPowerDbm: 20,
        regulatoryLimits: [erp25mW, erp500mW],
        markets: ['EU'],
        channels,
      });

    it('judges the whole band by its tightest sub-band when no channel is listed: 20 dBm into a dipole is 20 dBm e.r.p., over 25 mW', async () => {
      // ERP = 20 dBm + 2.15 dBi − 2.15 dB (ITU RR Art. 1: EIRP = ERP + 2.15 dB) = 20 dBm > 13.98 dBm.
      const { facts, finding } = await check('regional-power-limit', gateway(null), dipole);
      expect(facts.regionalLimitDbm as number).toBeCloseTo(13.979, 3);
      expect(finding).toMatchObject({ severity: 'fail', code: 'OVER_REGIONAL_LIMIT' });
    });

    it('judges a radio that lists 869.4–869.65 MHz on that sub-band: 20 dBm e.r.p. is inside 500 mW', async () => {
      const { facts, finding } = await check('regional-power-limit', gateway([{ fromHz: 869.4 * MHZ, toHz: 869.65 * MHZ }]), dipole);
      expect(facts.regionalLimitDbm as number).toBeCloseTo(26.99, 2);
      expect(facts.regionalLimitMarginDb as number).toBeCloseTo(6.99, 2);
      expect(finding).toBeUndefined();
    });

    it('judges a channel in the 25 mW sub-band on that limit, and one in no sub-band as not checked', async () => {
      const low = await check('regional-power-limit', gateway([{ fromHz: 868.1 * MHZ - 62.5e3, toHz: 868.1 * MHZ + 62.5e3 }]), dipole);
      expect(low.finding).toMatchObject({ code: 'OVER_REGIONAL_LIMIT' });
      const gap = await check('regional-power-limit', gateway([{ fromHz: 869.25 * MHZ, toHz: 869.3 * MHZ }]), dipole);
      expect(gap.finding).toMatchObject({ severity: 'no-data', code: 'REGULATORY_LIMIT_NOT_ON_FILE' });
    });
  });

  describe('conducted limits (a UE power class)', () => {
    // 3GPP TS 36.101 §6.2.2 Table 6.2.2-1: power class 3 = 23 dBm at the antenna port (from memory); the antenna plays no part.
    const powerClass3 = { region: 'EU', fromHz: 880 * MHZ, toHz: 915 * MHZ, kind: 'conducted' as const, valueDbm: 23, source: 'TS 36.101' };
    const b8 = (txPowerDbm: number) =>
      lte({ designation: 'B8', ranges: [rangeMhz(880, 915, 'uplink'), rangeMhz(925, 960, 'downlink')], txPowerDbm, regulatoryLimits: [powerClass3] });

    it('passes 23 dBm (at) whatever the gain, fails 23.1 dBm', async () => {
      const at = await check('regional-power-limit', b8(23), constructedPart({ gainDbi: 8 }));
      expect(at.facts.regionalRadiatedDbm).toBe(23);
      expect(at.finding).toBeUndefined();
      expect((await check('regional-power-limit', b8(23.1), constructedPart({ gainDbi: -3 }))).finding).toMatchObject({ code: 'OVER_REGIONAL_LIMIT' });
      // The part's gain is not needed for a conducted limit.
      expect((await check('regional-power-limit', b8(23), constructedPart({}, { peakGainDbi: null }))).finding).toBeUndefined();
    });
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
        efficiencyPercent: null,
        peakGainDbi: null,
        specBands: [
          {
            fromHz: 690 * MHZ,
            toHz: 760 * MHZ,
            maxVswr: 2,
            minReturnLossDb: null,
            efficiencyPercent: 50,
            peakGainDbi: 1,
            averageGainDbi: null,
            efficiencyBasis: 'radiation' as const,
            efficiencyStatistic: 'minimum' as const,
            gainBasis: 'peak' as const,
          },
        ],
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
    const noData = await both(lte(), constructedPart({ vswr: 2.2 }, { efficiencyPercent: null }));
    expect(noData.verdict.status).toBe('no-data');
    const fail = await both(lte(), constructedPart({ vswr: 3.5 }, { efficiencyPercent: null }));
    expect(fail.verdict.status).toBe('fail');
    expect(fail.verdict.findings.map((f) => f.code)).toEqual(
      expect.arrayContaining(['BAND_NOT_COVERED', 'VSWR_ABOVE_TARGET', 'EFFICIENCY_BELOW_FLOOR_NO_DATA']),
    );
  });

  it('uses a measured curve across both ranges of an FDD band and skips the duplex gap', async () => {
    // Efficiency dips to 10 % between UL and DL (720 MHz) only: the band itself stays at 70 %.
    const dip = { frequenciesHz: Float64Array.from([600e6, 716e6, 720e6, 729e6, 900e6]), values: Float64Array.from([70, 70, 10, 70, 70]) };
    const { facts } = await both(lte(), constructedPart({ vswr: 1 }, { efficiencyPercent: dip, reflection: flatReflection(600e6, 900e6, 1) }));
    expect(facts.minRadiationEfficiencyPct).toBe(70);
    expect(flatCurve(0, 1, 1).values.length).toBe(11);
  });
});

describe('gain basis', () => {
  // Realized gain G_r = G + 10 log10(1 − |Γ|²) (IEEE Std 145-2013, from memory); at VSWR 3 the mismatch loss is 1.249 dB
  // (Pozar, Microwave Engineering 4th ed. §2.3, table of rf-reference §3.2).
  it('turns peak gain into realized gain with the mismatch, and uses realized data as it is', () => {
    const peak = computeFacts(lte(), constructedPart({ vswr: 3, gainDbi: 2 }));
    expect(peak.peakGainDbi).toBe(2);
    expect(peak.realizedPeakGainDbi as number).toBeCloseTo(0.7506, 4);
    const realized = computeFacts(lte(), constructedPart({ vswr: 3, gainDbi: 2 }, { gainBasis: 'realized' }));
    expect(realized.realizedPeakGainDbi).toBe(2);
    // The antenna's own gain (for EIRP and the certified cap) is the realized figure plus the mismatch loss.
    expect(realized.peakGainDbi as number).toBeCloseTo(3.2494, 4);
    expect(realized.eirpDbm as number).toBeCloseTo(23 + 3.2494, 4);
  });

  it('shows realized gain at the radio port less the feed loss', () => {
    const facts = computeFacts(lte({ feedLossDb: 1.5 }), constructedPart({ vswr: 3, gainDbi: 2 }));
    expect(facts.realizedGainAtRadioPortDbi as number).toBeCloseTo(0.7506 - 1.5, 4);
    // EIRP = P + G − L counts the feed loss once.
    expect(facts.eirpDbm).toBe(23 + 2 - 1.5);
  });

  it('leaves realized data without S11 as realized only: the antenna gain is then not known', () => {
    const facts = computeFacts(lte(), constructedPart({ gainDbi: 2 }, { gainBasis: 'realized', reflection: null }));
    expect(facts.realizedPeakGainDbi).toBe(2);
    expect(facts.peakGainDbi).toBeNull();
  });
});

describe('a rule naming its own "no data" findings (event.params.noData)', () => {
  it('is refused when it names a fact its conditions do not, or a bad code, with the place', () => {
    const rule = ruleWith('certified-gain-cap');
    const withNoData = (noData: unknown) => ({ ...rule, event: { ...rule.event, params: { ...rule.event.params, noData } } });
    expect(validateRuleDefinition(withNoData({ eirpDbm: { code: 'NO_EIRP', message: 'x' } }))).toEqual([
      { path: 'event.params.noData.eirpDbm', message: expect.stringContaining('not a fact the conditions name') },
    ]);
    expect(validateRuleDefinition(withNoData({ certifiedMaxGainDbi: { code: 'lower', message: 'x {nothing}' } })).map((p) => p.path)).toEqual([
      'event.params.noData.certifiedMaxGainDbi.code',
      'event.params.noData.certifiedMaxGainDbi.message',
    ]);
    expect(validateRuleDefinition({ ...rule, event: { ...rule.event, params: { ...rule.event.params, extra: 1 } } }).map((p) => p.path)).toEqual([
      'event.params.extra',
    ]);
    expect(validateRuleDefinition(rule)).toEqual([]);
  });
});
