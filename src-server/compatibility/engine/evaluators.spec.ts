import fc from 'fast-check';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { loadRuleFiles } from '../rule-files';
import { CompiledRuleSet } from './compiled-evaluator';
import { FACT_CATALOG, FACT_NAMES, type FactName } from './fact-catalog';
import { ReferenceEvaluator } from './reference-evaluator';
import { completeFacts } from './rule-binding';
import { type ConditionNode, type RuleDefinition, SUPPORTED_OPERATORS, validateRuleDefinition } from './rule-definition';
import { TECHNOLOGIES, type FactValue, type Facts } from './types';

const FILE_RULES = loadRuleFiles();
const WORDS = [
  'lte',
  'gnss',
  'wifi',
  'ism',
  'approved',
  'draft',
  'retired',
  'eol',
  'nrnd',
  'active',
  'linear',
  'RHCP',
  'LHCP',
  'spec',
  'measured',
  'mixed',
  'none',
  '',
];
const NUMBERS = [0, 1, 2, 3, 15, 30, 40, 50, 100, -3, 2.5, 99.9, 36, 13.979];

const numberFact = fc.oneof(
  fc.constant(null),
  fc.constantFrom(...NUMBERS),
  fc.double({ min: -200, max: 200, noNaN: true }),
  fc.constantFrom(Infinity, -Infinity),
);
const factValue = (name: FactName): fc.Arbitrary<FactValue> => {
  const type = FACT_CATALOG[name].type;
  if (type === 'number') return numberFact;
  if (type === 'boolean') return fc.constantFrom(true, false, null);
  if (name === 'technology') return fc.constantFrom(...TECHNOLOGIES);
  return fc.oneof(fc.constant(null), fc.constantFrom(...WORDS));
};
const factsArbitrary: fc.Arbitrary<Facts> = fc.record(Object.fromEntries(FACT_NAMES.map((n) => [n, factValue(n)])) as Record<string, fc.Arbitrary<FactValue>>);

const NUMBER_FACTS = FACT_NAMES.filter((n) => FACT_CATALOG[n].type === 'number');
const scalar = fc.oneof(fc.constantFrom(...NUMBERS), fc.constantFrom(...WORDS), fc.boolean());
const leaf: fc.Arbitrary<ConditionNode> = fc
  .record({
    fact: fc.constantFrom(...FACT_NAMES),
    operator: fc.constantFrom(...SUPPORTED_OPERATORS),
    pick: fc.nat(4),
    other: fc.constantFrom(...FACT_NAMES),
    otherNumber: fc.constantFrom(...NUMBER_FACTS),
    n: fc.constantFrom(...NUMBERS),
    s: scalar,
    list: fc.array(scalar, { maxLength: 4 }),
  })
  .map(({ fact, operator, pick, other, otherNumber, n, s, list }) => {
    if (operator === 'in' || operator === 'notIn') return { fact, operator, value: list };
    if (operator.startsWith('less') || operator.startsWith('greater')) {
      const numeric = FACT_CATALOG[fact].type === 'number' ? fact : 'worstVswr';
      return { fact: numeric, operator, value: pick === 0 ? { fact: otherNumber } : pick === 1 ? { param: 'threshold' } : n };
    }
    return { fact, operator, value: pick === 0 ? { fact: other } : pick === 1 ? null : s };
  });
const countConditions = (node: ConditionNode): number =>
  1 +
  ('all' in node
    ? node.all.reduce((n, c) => n + countConditions(c), 0)
    : 'any' in node
      ? node.any.reduce((n, c) => n + countConditions(c), 0)
      : 'not' in node
        ? countConditions(node.not)
        : 0);
/** Trees within the rule limits (RULE_LIMITS): at most 6 levels, and both trees of a rule together at most 200 conditions. */
const tree: fc.Arbitrary<ConditionNode> = fc
  .letrec<{ node: ConditionNode }>((self) => ({
    node: fc.oneof(
      { depthSize: 'small', withCrossShrink: true, maxDepth: 5 },
      leaf,
      fc.array(self('node'), { maxLength: 3 }).map((all) => ({ all })),
      fc.array(self('node'), { maxLength: 3 }).map((any) => ({ any })),
      self('node').map((not) => ({ not })),
    ),
  }))
  .node.filter((node) => countConditions(node) <= 99);

const randomRule = fc
  .record({
    n: fc.nat(9999),
    severity: fc.constantFrom('fail', 'marginal', 'info' as const),
    conditions: tree,
    appliesWhen: fc.option(tree, { nil: undefined }),
    threshold: fc.constantFrom(...NUMBERS),
    enabled: fc.boolean(),
  })
  .map(({ n, severity, conditions, appliesWhen, threshold, enabled }): RuleDefinition => ({
    id: `random-${n}`,
    title: `random rule ${n}`,
    description: 'generated',
    severity,
    enabled,
    version: 1,
    source: 'generated for the property test',
    parameters: { threshold },
    appliesWhen: appliesWhen ?? null,
    conditions: 'all' in conditions || 'any' in conditions || 'not' in conditions ? conditions : { all: [conditions] },
    event: { type: 'finding', params: { code: `RANDOM_${n}`, message: 'random {threshold} {technology}' } },
  }));

/** The starting rules with their numeric thresholds moved at random, so edges are hit from both sides. */
const perturbedFileRules = fc.array(fc.constantFrom(...NUMBERS), { minLength: FILE_RULES.length, maxLength: FILE_RULES.length }).map((values) =>
  FILE_RULES.map((rule, i) => ({
    ...rule,
    parameters: Object.fromEntries(Object.entries(rule.parameters).map(([k, v]) => [k, typeof v === 'number' ? values[i] : v])),
  })),
);

describe(CompiledRuleSet.name, () => {
  it('gives the same verdict as json-rules-engine for the starting rules on random facts', async () => {
    await fc.assert(
      fc.asyncProperty(perturbedFileRules, factsArbitrary, async (rules, facts) => {
        const set = new CompiledRuleSet(rules);
        const fast = set.evaluate(facts);
        const reference = await new ReferenceEvaluator(rules).evaluate(facts);
        expect(fast).toEqual(reference);
        expect(set.forRow(facts).status(completeFacts(facts))).toBe(reference.status);
      }),
      { numRuns: 400 },
    );
  });

  it('gives the same verdict as json-rules-engine for random valid rules (all/any/not, fact references, nulls)', async () => {
    await fc.assert(
      fc.asyncProperty(fc.array(randomRule, { minLength: 1, maxLength: 5 }), factsArbitrary, async (rules, facts) => {
        const unique = rules.filter((r, i) => rules.findIndex((o) => o.id === r.id) === i);
        for (const r of unique) expect(validateRuleDefinition(r)).toEqual([]);
        const set = new CompiledRuleSet(unique);
        const fast = set.evaluate(facts);
        const reference = await new ReferenceEvaluator(unique).evaluate(facts);
        expect(fast).toEqual(reference);
        expect(set.forRow(facts).status(completeFacts(facts))).toBe(reference.status);
      }),
      { numRuns: 400 },
    );
  });

  it('reuses one compiled row for every pair of a row, and keeps rows with different tables apart', () => {
    const set = new CompiledRuleSet(FILE_RULES);
    const facts = { technology: 'lte', minTotalEfficiencyPct: 20 } as Facts;
    expect(set.forRow(facts)).toBe(set.forRow({ ...facts, minTotalEfficiencyPct: 5 }));
    expect(set.forRow(facts)).not.toBe(set.forRow({ ...facts, technology: 'gnss' }));
  });
});

describe(validateRuleDefinition.name, () => {
  const base = FILE_RULES.find((r) => r.id === 'efficiency-floor')!;
  const withChange = (change: Record<string, unknown>) => ({ ...base, ...change });

  it('accepts every rule file', () => {
    for (const rule of FILE_RULES) expect(validateRuleDefinition(rule)).toEqual([]);
  });

  it('names an unknown fact and where it is', () => {
    const problems = validateRuleDefinition(withChange({ conditions: { all: [{ fact: 'efficiencyPercentage', operator: 'lessThan', value: 3 }] } }));
    expect(problems).toEqual([{ path: 'conditions.all[0].fact', message: 'unknown fact "efficiencyPercentage"' }]);
  });

  it('names an unknown operator, parameter, placeholder and a table without default', () => {
    const problems = validateRuleDefinition(
      withChange({
        parameters: { floorPctByTechnology: { lte: 15 } },
        conditions: {
          any: [
            { fact: 'worstVswr', operator: 'biggerThan', value: 2 },
            { fact: 'worstVswr', operator: 'greaterThan', value: { param: 'maxVswr' } },
          ],
        },
        event: { type: 'finding', params: { code: 'X_Y', message: 'VSWR {worstVswrr}' } },
      }),
    );
    expect(problems.map((p) => p.path)).toEqual([
      'parameters.floorPctByTechnology',
      'conditions.any[0].operator',
      'conditions.any[1].value.param',
      'event.params.message',
    ]);
    expect(problems[3].message).toContain('{worstVswrr}');
  });

  it('refuses a shape json-rules-engine would refuse, and fields it does not know', () => {
    expect(validateRuleDefinition(withChange({ conditions: { all: { fact: 'worstVswr' } } }))).toContainEqual({
      path: 'conditions.all',
      message: '"all" takes a list of conditions',
    });
    expect(validateRuleDefinition(withChange({ conditions: { fact: 'worstVswr', operator: 'equal', value: 1 } }))[0].path).toBe('conditions');
    expect(validateRuleDefinition(withChange({ colour: 'red' }))).toContainEqual({ path: 'colour', message: 'unexpected field "colour"' });
    expect(validateRuleDefinition(withChange({ severity: 'warning' }))[0].path).toBe('severity');
    expect(validateRuleDefinition('not a rule')).toEqual([{ path: '', message: 'a rule must be a JSON object' }]);
  });

  it('refuses a numeric comparison on a text fact and a table keyed by a pair fact', () => {
    const text = validateRuleDefinition(withChange({ conditions: { all: [{ fact: 'lifecycle', operator: 'lessThan', value: 3 }] } }));
    expect(text[0]).toEqual({ path: 'conditions.all[0].value', message: 'operator "lessThan" compares numbers, and this fact is string' });
    const key = validateRuleDefinition(
      withChange({
        conditions: { all: [{ fact: 'minTotalEfficiencyPct', operator: 'lessThan', value: { param: 'floorPctByTechnology', key: 'reviewState' } }] },
      }),
    );
    expect(key[0].path).toBe('conditions.all[0].value.key');
  });
});

describe(loadRuleFiles.name, () => {
  it('refuses a bad rule file, naming the file and the place in it', () => {
    const dir = mkdtempSync(join(tmpdir(), 'rules-'));
    try {
      const rule = { ...FILE_RULES[0], conditions: { all: [{ fact: 'coverage', operator: 'lessThan', value: 100 }] } };
      writeFileSync(`${dir}/${rule.id}.json`, JSON.stringify(rule));
      expect(() => loadRuleFiles(dir)).toThrow(`${rule.id}.json: conditions.all[0].fact: unknown fact "coverage"`);
      writeFileSync(`${dir}/${rule.id}.json`, '{ not json');
      expect(() => loadRuleFiles(dir)).toThrow(/not valid JSON/);
      writeFileSync(`${dir}/${rule.id}.json`, JSON.stringify(FILE_RULES[0]));
      writeFileSync(`${dir}/wrong-name.json`, JSON.stringify(FILE_RULES[1]));
      expect(() => loadRuleFiles(dir)).toThrow(`wrong-name.json: id: the file of rule "${FILE_RULES[1].id}" must be named ${FILE_RULES[1].id}.json`);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
