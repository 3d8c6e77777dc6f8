import { loadRuleFiles } from '../rule-files';
import { CompiledRuleSet } from './compiled-evaluator';
import { constructedPart, constructedRequirement, rangeMhz } from './fixtures';
import { evaluateProduct, type RadioToEvaluate } from './product-evaluation';

const RULES = new CompiledRuleSet(loadRuleFiles());

// Constructed data: a flat match at VSWR 1.5 and 70 % radiation efficiency passes B12; 10 % is under the 15 % LTE floor.
const good = constructedPart({ vswr: 1.5, efficiencyPercent: 70 }, { partId: 1, mpn: 'GOOD' });
const poor = constructedPart({ vswr: 1.5, efficiencyPercent: 10 }, { partId: 2, mpn: 'POOR' });
// A 2.4 GHz-only part: its match starts above every LTE band here.
const ble = constructedPart({ fromHz: 2300e6, toHz: 2600e6, vswr: 1.5 }, { partId: 3, mpn: 'BLE' });

const radio = (radioId: number, chosen: RadioToEvaluate['chosen']): RadioToEvaluate => ({
  radioId,
  radioName: `radio ${radioId}`,
  requirements: [
    constructedRequirement({ radioId }),
    constructedRequirement({ radioId, bandId: 20, designation: 'B20', ranges: [rangeMhz(832, 862, 'uplink'), rangeMhz(791, 821, 'downlink')] }),
  ],
  chosen,
});

describe(evaluateProduct.name, () => {
  it('judges each radio against its own chosen part: verdict, deciding finding and facts per band', () => {
    const result = evaluateProduct([radio(1, [good]), radio(2, [poor])], RULES);
    const [first, second] = result.radios;
    expect(first.status).toBe('pass');
    expect(first.decidingFinding).toBeNull();
    expect(first.bands.map((b) => [b.requirement.designation, b.status, b.partId])).toEqual([
      ['B12', 'pass', 1],
      ['B20', 'pass', 1],
    ]);
    // Total efficiency = 70 % × (1 − 0.2²) = 67.2 % at VSWR 1.5 (Pozar §2.3; rf-reference §3.4).
    expect(first.bands[0].facts!.minTotalEfficiencyPct).toBeCloseTo(67.2, 9);
    expect(second.status).toBe('fail');
    expect(second.decidingFinding!.code).toBe('EFFICIENCY_BELOW_FLOOR');
    expect(second.decidingBandId).toBe(12);
    expect(result.status).toBe('fail');
  });

  it('gives a radio with no chosen part no-data on every band, with the reason, and the product cannot pass', () => {
    const result = evaluateProduct([radio(1, [good]), radio(2, [])], RULES);
    const unchecked = result.radios[1];
    expect(unchecked.status).toBe('no-data');
    expect(unchecked.decidingFinding).toMatchObject({ code: 'NO_PART_CHOSEN', severity: 'no-data' });
    for (const band of unchecked.bands)
      expect(band).toMatchObject({ status: 'no-data', facts: null, partId: null, decidingFinding: { code: 'NO_PART_CHOSEN' } });
    expect(result.status).toBe('no-data');
    expect(result.findings.map((f) => [f.radioId, f.finding.code])).toEqual([[2, 'NO_PART_CHOSEN']]);
  });

  it('orders the product verdict fail, no-data, marginal, pass', () => {
    expect(evaluateProduct([radio(1, [poor]), radio(2, [])], RULES).status).toBe('fail');
    expect(evaluateProduct([radio(1, [good]), radio(2, [good])], RULES).status).toBe('pass');
    expect(evaluateProduct([], RULES)).toMatchObject({ status: 'no-data', findings: [{ radioId: null, finding: { code: 'PRODUCT_WITHOUT_RADIOS' } }] });
  });

  it('lets the worst of several chosen parts decide a band, and names it', () => {
    expect(evaluateProduct([radio(1, [good, poor])], RULES).radios[0].bands[0]).toMatchObject({
      status: 'fail',
      partId: 2,
      decidingFinding: { code: 'EFFICIENCY_BELOW_FLOOR' },
    });
    // A part measured only at 2.4 GHz leaves the LTE band unchecked: not a pass, whatever the other part does.
    expect(evaluateProduct([radio(1, [good, ble])], RULES).radios[0].bands[0]).toMatchObject({
      status: 'no-data',
      partId: 3,
      decidingFinding: { code: 'BAND_NOT_COVERED_NO_DATA' },
    });
  });

  it("counts a band's system finding (two antennas too correlated) into its status only when it is worse; a note never does", () => {
    const correlated = { ruleId: 'envelope-correlation', severity: 'marginal' as const, code: 'ENVELOPE_CORRELATION_HIGH', message: 'ρe 0.8 in B12' };
    const note = { ruleId: 'evaluation', severity: 'info' as const, code: 'S11_MEASURED_IN_PRODUCT', message: 'measured in product' };
    const withSystem = (chosen: RadioToEvaluate['chosen'], findings: RadioToEvaluate['systemFindings']) =>
      evaluateProduct([{ ...radio(1, chosen), systemFindings: findings }], RULES);
    const marginal = withSystem([good], new Map([[12, [correlated]]]));
    expect(marginal.radios[0].bands[0]).toMatchObject({ status: 'marginal', decidingFinding: { code: 'ENVELOPE_CORRELATION_HIGH' } });
    expect(marginal.radios[0].bands[0].findings.map((f) => f.code)).toContain('ENVELOPE_CORRELATION_HIGH');
    expect(marginal.radios[0].bands[1].status).toBe('pass');
    expect(marginal.radios[0]).toMatchObject({ status: 'marginal', decidingBandId: 12, decidingFinding: { code: 'ENVELOPE_CORRELATION_HIGH' } });
    expect(marginal.status).toBe('marginal');
    // A fail of the part itself stays the reason.
    expect(withSystem([poor], new Map([[12, [correlated]]])).radios[0].bands[0]).toMatchObject({
      status: 'fail',
      decidingFinding: { code: 'EFFICIENCY_BELOW_FLOOR' },
    });
    expect(withSystem([good], new Map([[12, [note]]])).radios[0].bands[0].status).toBe('pass');
  });
});
