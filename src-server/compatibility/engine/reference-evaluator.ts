import { Engine, type RuleProperties, type TopLevelCondition } from 'json-rules-engine';
import type { RuleDefinition } from './rule-definition';
import { type BoundRule, type EngineCondition, bindRule, bindingKey, completeFacts, findingOf, noDataFindingOf, verdictOf } from './rule-binding';
import type { CellVerdict, Facts, Finding } from './types';

/** "All required facts are known", in json-rules-engine's own terms. */
function presenceCondition(requiredFacts: readonly string[]): EngineCondition {
  return { all: requiredFacts.map((fact) => ({ fact, operator: 'notEqual', value: null })) };
}

/**
 * The two json-rules-engine rules behind one of ours: "finding" fires when the rule applies, every
 * fact it needs is known and its conditions hold; "no-data" fires when it applies and a needed fact is null.
 */
export function engineRulesOf(bound: BoundRule): RuleProperties[] {
  const applies = bound.appliesWhen ? [bound.appliesWhen] : [];
  const rules: RuleProperties[] = [
    {
      name: `${bound.rule.id}:finding`,
      conditions: { all: [...applies, presenceCondition(bound.requiredFacts), bound.conditions] } as unknown as TopLevelCondition,
      event: { type: 'finding', params: { index: bound.index } },
    },
  ];
  if (bound.requiredFacts.length > 0) {
    rules.push({
      name: `${bound.rule.id}:no-data`,
      conditions: { all: [...applies, { any: bound.requiredFacts.map((fact) => ({ fact, operator: 'equal', value: null })) }] } as unknown as TopLevelCondition,
      event: { type: 'no-data', params: { index: bound.index } },
    });
  }
  return rules;
}

/** Evaluation by json-rules-engine itself: the source of truth the compiled path is checked against. */
export class ReferenceEvaluator {
  private readonly rules: readonly RuleDefinition[];
  private readonly engines = new Map<string, { engine: Engine; bound: BoundRule[] }>();

  constructor(rules: readonly RuleDefinition[]) {
    this.rules = rules.filter((r) => r.enabled);
  }

  private engineFor(facts: Facts): { engine: Engine; bound: BoundRule[] } {
    const key = this.rules.map((r) => bindingKey(r, facts)).join('\n');
    let entry = this.engines.get(key);
    if (!entry) {
      const bound = this.rules.map((rule, index) => bindRule(rule, index, facts));
      const engine = new Engine([], { allowUndefinedFacts: false });
      for (const b of bound) for (const r of engineRulesOf(b)) engine.addRule(r);
      entry = { engine, bound };
      this.engines.set(key, entry);
    }
    return entry;
  }

  async evaluate(facts: Facts): Promise<CellVerdict> {
    const complete = completeFacts(facts);
    const { engine, bound } = this.engineFor(complete);
    const { events } = await engine.run(complete);
    const findings: [number, Finding][] = events.map((event) => {
      const b = bound[event.params!.index as number];
      return [b.index, event.type === 'finding' ? findingOf(b, complete) : noDataFindingOf(b, complete)];
    });
    findings.sort((a, b) => a[0] - b[0]);
    return verdictOf(findings.map(([, f]) => f));
  }
}
