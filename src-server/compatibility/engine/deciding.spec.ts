import { decidingCellOf, decidingFindingOf, findingTitle } from './deciding';
import type { Finding } from './types';

const finding = (code: string, severity: Finding['severity'], ruleId = code.toLowerCase()): Finding => ({ ruleId, severity, code, message: code });

describe(findingTitle.name, () => {
  it('gives listed codes their short title, "not checked" codes the same with a prefix, others their rule title', () => {
    expect(findingTitle('BAND_NOT_COVERED')).toBe('Band not covered');
    expect(findingTitle('EFFICIENCY_BELOW_FLOOR', 'Efficiency below the floor for the technology')).toBe('Efficiency below floor');
    expect(findingTitle('BAND_NOT_COVERED_NO_DATA')).toBe('Not checked: band not covered');
    expect(findingTitle('ADMIN_RULE', 'Too close to the battery')).toBe('Too close to the battery');
    expect(findingTitle('ADMIN_RULE_NO_DATA', 'Too close to the battery')).toBe('Not checked: too close to the battery');
    expect(findingTitle('SOME_NEW_CODE')).toBe('some new code');
  });
});

describe(decidingFindingOf.name, () => {
  it('gives a pass no deciding finding, even with notes and caveats beside it', () => {
    expect(decidingFindingOf('pass', [finding('DATASHEET_FIGURES', 'info')])).toBeNull();
  });

  it("takes a finding of the status' own severity, the band's match before what follows from it, in any order", () => {
    const floor = finding('EFFICIENCY_BELOW_FLOOR', 'fail');
    const coverage = finding('BAND_NOT_COVERED', 'fail');
    const vswr = finding('VSWR_ABOVE_TARGET', 'marginal');
    expect(decidingFindingOf('fail', [vswr, floor, coverage])).toBe(coverage);
    expect(decidingFindingOf('fail', [coverage, floor, vswr])).toBe(coverage);
    expect(decidingFindingOf('marginal', [finding('PART_NRND', 'marginal'), vswr])).toBe(vswr);
    const notChecked = finding('OVER_REGIONAL_LIMIT_NO_DATA', 'no-data');
    expect(decidingFindingOf('no-data', [vswr, notChecked])).toBe(notChecked);
  });

  it('keeps the rule order between codes it does not know', () => {
    const a = finding('ADMIN_A', 'marginal');
    const b = finding('ADMIN_B', 'marginal');
    expect(decidingFindingOf('marginal', [a, b])).toBe(a);
  });
});

describe(decidingCellOf.name, () => {
  const cell = (status: 'pass' | 'marginal' | 'fail' | 'no-data', deciding: Finding | null, overByDb: number | null, item: string) => ({
    status,
    deciding,
    overByDb,
    item,
  });

  it('takes the worst status (fail, no-data, marginal, pass), then precedence, then the one furthest over its limit', () => {
    const coverage = finding('BAND_NOT_COVERED', 'fail');
    const floor = finding('EFFICIENCY_BELOW_FLOOR', 'fail');
    expect(
      decidingCellOf([cell('marginal', finding('VSWR_ABOVE_TARGET', 'marginal'), -1, 'a'), cell('no-data', finding('X_NO_DATA', 'no-data'), null, 'b')])!.item,
    ).toBe('b');
    expect(decidingCellOf([cell('no-data', finding('X_NO_DATA', 'no-data'), null, 'a'), cell('fail', floor, -0.1, 'b')])!.item).toBe('b');
    expect(decidingCellOf([cell('fail', floor, -9, 'a'), cell('fail', coverage, -0.5, 'b')])!.item).toBe('b');
    expect(decidingCellOf([cell('fail', coverage, -0.5, 'a'), cell('fail', coverage, -Infinity, 'b'), cell('fail', coverage, -3, 'c')])!.item).toBe('b');
    expect(decidingCellOf([cell('pass', null, null, 'a'), cell('pass', null, null, 'b')])!.item).toBe('a');
    expect(decidingCellOf([])).toBeNull();
  });
});
