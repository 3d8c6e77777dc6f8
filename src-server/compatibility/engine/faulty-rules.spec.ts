import { loadRuleFiles } from '../rule-files';
import { CompiledRuleSet } from './compiled-evaluator';
import { computeFacts } from './compute-facts';
import { constructedPart, constructedRequirement } from './fixtures';
import { evaluateMatrix, rankCandidates } from './matrix';
import { OPERATORS } from './operators';
import { ReferenceEvaluator } from './reference-evaluator';
import { RULE_BROKEN_CODE, completeFacts } from './rule-binding';
import { RULE_LIMITS, type RuleDefinition, validateRuleDefinition } from './rule-definition';
import type { CellVerdict } from './types';

const FILE_RULES = loadRuleFiles();
const base = FILE_RULES.find((r) => r.id === 'part-retired')!;

/** A rule as it could sit in the database, written around the API (no validation), that throws when evaluated. */
function faulty(id: string, value: unknown, operator = 'in'): RuleDefinition {
  return {
    ...base,
    id,
    title: `faulty ${id}`,
    conditions: { all: [{ fact: 'reviewState', operator, value }] } as never,
    event: { type: 'finding', params: { code: 'FAULTY', message: 'faulty' } },
  };
}

const withoutBroken = (verdict: CellVerdict) => verdict.findings.filter((f) => f.code !== RULE_BROKEN_CODE);

describe('a faulty rule during evaluation', () => {
  const requirement = constructedRequirement();
  const good = constructedPart({ vswr: 1.2, efficiencyPercent: 70 }, { partId: 1, mpn: 'GOOD' });
  const poor = constructedPart({ vswr: 4, efficiencyPercent: 10 }, { partId: 2, mpn: 'POOR' });

  it.each([
    ['a parameter named like an inherited property', { param: 'constructor' }],
    ['__proto__ as the parameter', { param: '__proto__' }],
    ['a fact reference where a list belongs', { fact: 'worstVswr' }],
    ['a single value where a list belongs', 'approved'],
  ])('%s: marks every cell RULE_BROKEN, evaluates every other rule, in both paths alike', async (_, value) => {
    const bad = faulty('bad-rule', value);
    expect(validateRuleDefinition(bad).length).toBeGreaterThan(0);
    const rules = [...FILE_RULES, bad];
    for (const part of [good, poor]) {
      const facts = computeFacts(requirement, part);
      const fast = new CompiledRuleSet(rules).evaluate(facts);
      const reference = await new ReferenceEvaluator(rules).evaluate(facts);
      expect(fast).toEqual(reference);
      expect(fast.findings).toContainEqual(expect.objectContaining({ ruleId: 'bad-rule', code: RULE_BROKEN_CODE, severity: 'no-data' }));
      expect(JSON.stringify(fast)).toContain('faulty bad-rule');
      // Everything else is as it is without the faulty rule; the cell is never a pass.
      const alone = new CompiledRuleSet(FILE_RULES).evaluate(facts);
      expect(withoutBroken(fast)).toEqual(alone.findings);
      expect(fast.status).not.toBe('pass');
      expect(new CompiledRuleSet(rules).forRow(facts).status(completeFacts(facts))).toBe(fast.status);
    }
  });

  it('contains a rule that passes validation but throws while a pair is checked, and only on that pair', async () => {
    const original = OPERATORS.lessThan.cb;
    // Injected fault: this comparison throws for one part's facts only.
    const spy = jest.spyOn(OPERATORS.lessThan, 'cb').mockImplementation((a, b) => {
      if (b === 12345 && a === 10) throw new TypeError('injected');
      return original(a, b);
    });
    try {
      const throwing: RuleDefinition = {
        ...base,
        id: 'throws-sometimes',
        title: 'throws sometimes',
        conditions: { all: [{ fact: 'minRadiationEfficiencyPct', operator: 'lessThan', value: 12345 }] },
        event: { type: 'finding', params: { code: 'THROWS', message: 'x' } },
      };
      expect(validateRuleDefinition(throwing)).toEqual([]);
      const set = new CompiledRuleSet([...FILE_RULES, throwing]);
      const matrix = evaluateMatrix([requirement], [good, poor], set);
      const [goodCell, poorCell] = matrix.cells;
      expect(goodCell.findings).toContainEqual(expect.objectContaining({ ruleId: 'throws-sometimes', code: 'THROWS' }));
      expect(poorCell.findings).toContainEqual(expect.objectContaining({ ruleId: 'throws-sometimes', code: RULE_BROKEN_CODE, severity: 'no-data' }));
      expect(poorCell.status).toBe('fail');
      const facts = completeFacts(computeFacts(requirement, poor));
      expect(set.forRow(facts).status(facts)).toBe('fail');
      expect(() => set.forRow(facts).visitMargins(facts, () => undefined)).not.toThrow();
      const ranked = rankCandidates([requirement], [poor, good], set);
      expect(ranked.map((c) => c.mpn)).toEqual(['GOOD', 'POOR']);
      expect(ranked[1].bands[0].findings).toContainEqual(expect.objectContaining({ code: RULE_BROKEN_CODE }));
    } finally {
      spy.mockRestore();
    }
  });

  it('keeps the matrix and the candidates whole with a faulty rule in the set', () => {
    const set = new CompiledRuleSet([...FILE_RULES, faulty('bad-rule', { param: 'constructor' })]);
    const matrix = evaluateMatrix([requirement, constructedRequirement({ bandId: 13 })], [good, poor], set);
    expect(matrix.cells).toHaveLength(4);
    for (const cell of matrix.cells) expect(cell.findings.filter((f) => f.code === RULE_BROKEN_CODE)).toHaveLength(1);
    const ranked = rankCandidates([requirement], [poor, good], set);
    expect(ranked).toHaveLength(2);
    expect(ranked[0].status).toBe('no-data');
    expect(ranked[0].deciding).not.toBeNull();
  });

  it('ignores a faulty rule that is switched off', () => {
    const facts = computeFacts(requirement, good);
    const verdict = new CompiledRuleSet([...FILE_RULES, { ...faulty('bad-rule', { param: 'constructor' }), enabled: false }]).evaluate(facts);
    expect(verdict).toEqual(new CompiledRuleSet(FILE_RULES).evaluate(facts));
  });

  it('contains rules nested past the limits and rules that are not rules at all', async () => {
    let deep: unknown = { fact: 'worstVswr', operator: 'greaterThan', value: 2 };
    for (let i = 0; i < 5000; i++) deep = { all: [deep] };
    const rules = [
      ...FILE_RULES,
      { ...base, id: 'too-deep', conditions: deep } as RuleDefinition,
      { id: 'garbage', enabled: true } as unknown as RuleDefinition,
    ];
    const facts = computeFacts(requirement, good);
    const fast = new CompiledRuleSet(rules).evaluate(facts);
    expect(fast).toEqual(await new ReferenceEvaluator(rules).evaluate(facts));
    expect(fast.findings.filter((f) => f.code === RULE_BROKEN_CODE).map((f) => f.ruleId)).toEqual(['too-deep', 'garbage']);
  });
});

describe(`${validateRuleDefinition.name}: operator and value types`, () => {
  const rule = (conditions: unknown, parameters: Record<string, unknown> = base.parameters) => ({ ...base, parameters, conditions });
  const leaf = (fact: string, operator: string, value: unknown) => rule({ all: [{ fact, operator, value }] });
  const pathsOf = (input: unknown) => validateRuleDefinition(input).map((p) => p.path);

  it.each([
    ['in with a parameter named constructor', leaf('reviewState', 'in', { param: 'constructor' }), 'conditions.all[0].value.param'],
    ['in with a parameter named __proto__', leaf('reviewState', 'in', { param: '__proto__' }), 'conditions.all[0].value.param'],
    ['in with a parameter named toString', leaf('reviewState', 'in', { param: 'toString' }), 'conditions.all[0].value.param'],
    ['in with a fact reference', leaf('reviewState', 'in', { fact: 'lifecycle' }), 'conditions.all[0].value'],
    ['notIn with a text value', leaf('reviewState', 'notIn', 'approved'), 'conditions.all[0].value'],
    [
      'in with a parameter holding a number',
      rule({ all: [{ fact: 'reviewState', operator: 'in', value: { param: 'limit' } }] }, { limit: 3 }),
      'conditions.all[0].value.param',
    ],
    [
      'in with a table of text',
      rule({ all: [{ fact: 'reviewState', operator: 'in', value: { param: 'states', key: 'technology' } }] }, { states: { default: 'x' } }),
      'conditions.all[0].value.param',
    ],
    ['lessThan with a text value', leaf('worstVswr', 'lessThan', '2'), 'conditions.all[0].value'],
    [
      'lessThan with a list parameter',
      rule({ all: [{ fact: 'worstVswr', operator: 'lessThan', value: { param: 'limits' } }] }, { limits: [1, 2] }),
      'conditions.all[0].value.param',
    ],
    [
      'greaterThan with a table holding text',
      rule({ all: [{ fact: 'worstVswr', operator: 'greaterThan', value: { param: 'byTech', key: 'technology' } }] }, { byTech: { default: 2, lte: 'three' } }),
      'conditions.all[0].value.param',
    ],
    ['greaterThan with a text fact reference', leaf('worstVswr', 'greaterThan', { fact: 'technology' }), 'conditions.all[0].value.fact'],
    ['equal with a list', leaf('reviewState', 'equal', ['approved']), 'conditions.all[0].value'],
    ['equal with a list parameter', leaf('reviewState', 'equal', { param: 'blockedStates' }), 'conditions.all[0].value.param'],
    [
      'a parameter named constructor',
      rule({ all: [{ fact: 'reviewState', operator: 'in', value: { param: 'constructor' } }] }, { constructor: ['retired'] }),
      'parameters.constructor',
    ],
    [
      'a table key named __proto__',
      rule(
        { all: [{ fact: 'worstVswr', operator: 'greaterThan', value: { param: 'byTech', key: 'technology' } }] },
        JSON.parse('{"byTech":{"default":2,"__proto__":3}}'),
      ),
      'parameters.byTech.__proto__',
    ],
    ['a fact named constructor', leaf('constructor', 'equal', 1), 'conditions.all[0].fact'],
    [
      'a table keyed by hasOwnProperty',
      rule({ all: [{ fact: 'worstVswr', operator: 'greaterThan', value: { param: 'byTech', key: 'hasOwnProperty' } }] }, { byTech: { default: 2 } }),
      'conditions.all[0].value.key',
    ],
  ])('refuses %s, naming the place', (_, input, path) => {
    expect(pathsOf(input)).toContain(path);
  });

  it('refuses a placeholder naming an inherited property', () => {
    expect(pathsOf({ ...base, event: { type: 'finding', params: { code: 'X_Y', message: 'see {constructor}' } } })).toEqual(['event.params.message']);
  });

  it('accepts every starting rule and the valid forms of each operator', () => {
    for (const r of FILE_RULES) expect(validateRuleDefinition(r)).toEqual([]);
    expect(validateRuleDefinition(leaf('reviewState', 'in', ['retired', 'restricted']))).toEqual([]);
    expect(validateRuleDefinition(leaf('reviewState', 'in', { param: 'blockedStates' }))).toEqual([]);
    expect(validateRuleDefinition(leaf('worstVswr', 'greaterThan', { fact: 'worstReturnLossDb' }))).toEqual([]);
    expect(validateRuleDefinition(leaf('reviewState', 'equal', null))).toEqual([]);
  });
});

describe(`${validateRuleDefinition.name}: size limits`, () => {
  const nested = (levels: number) => {
    let node: unknown = { fact: 'worstVswr', operator: 'greaterThan', value: 2 };
    for (let i = 1; i < levels; i++) node = { all: [node] };
    return { ...base, conditions: node };
  };

  it(`accepts conditions ${RULE_LIMITS.maxDepth} levels deep and refuses ${RULE_LIMITS.maxDepth + 1}, naming the level`, () => {
    expect(validateRuleDefinition(nested(RULE_LIMITS.maxDepth))).toEqual([]);
    const problems = validateRuleDefinition(nested(RULE_LIMITS.maxDepth + 1));
    expect(problems).toHaveLength(1);
    expect(problems[0].path).toBe(`conditions${'.all[0]'.repeat(RULE_LIMITS.maxDepth)}`);
  });

  it(`accepts ${RULE_LIMITS.maxConditions} conditions and refuses one more, once`, () => {
    const leaves = (n: number) => Array.from({ length: n }, (_, i) => ({ fact: 'worstVswr', operator: 'greaterThan', value: i }));
    expect(validateRuleDefinition({ ...base, conditions: { any: leaves(RULE_LIMITS.maxConditions - 1) } })).toEqual([]);
    const problems = validateRuleDefinition({ ...base, conditions: { any: leaves(RULE_LIMITS.maxConditions + 50) } });
    expect(problems).toEqual([{ path: `conditions.any[${RULE_LIMITS.maxConditions - 1}]`, message: expect.any(String) }]);
  });

  it('refuses a rule of more than 64 KiB of JSON, and one nested too deeply to serialise, without walking it', () => {
    expect(validateRuleDefinition({ ...base, description: 'x'.repeat(70 * 1024) })).toEqual([{ path: '', message: expect.stringContaining('64 KiB') }]);
    let deep: unknown = 1;
    for (let i = 0; i < 200_000; i++) deep = { all: [deep] };
    expect(validateRuleDefinition({ ...base, conditions: deep })[0].path).toBe('');
  });
});
