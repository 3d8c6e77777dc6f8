import { Engine, type RuleProperties, type TopLevelCondition } from 'json-rules-engine';
import type { RuleDefinition } from './rule-definition';
import {
  type BoundRule,
  type EngineCondition,
  EVALUATION_FAILED,
  PREPARATION_FAILED,
  bindOrBreak,
  bindingKeyOrBroken,
  brokenFindingOf,
  completeFacts,
  findingOf,
  noDataFindingOf,
  ruleDefect,
  verdictOf,
} from './rule-binding';
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

type Slot = { readonly broken: null; readonly bound: BoundRule; readonly engine: Engine } | { readonly broken: Finding };

/**
 * Evaluation by json-rules-engine itself: the source of truth the compiled path is checked against.
 * One engine per rule of ours, so a rule that throws marks its own finding as broken and stops nothing else.
 */
export class ReferenceEvaluator {
  private readonly rules: readonly RuleDefinition[];
  private readonly defects: readonly (string | null)[];
  private readonly slots = new Map<string, Slot[]>();

  constructor(rules: readonly RuleDefinition[]) {
    this.rules = rules.filter((r) => r.enabled);
    this.defects = this.rules.map(ruleDefect);
  }

  private slotsFor(facts: Facts): Slot[] {
    const key = this.rules.map((r, i) => bindingKeyOrBroken(r, i, this.defects[i], facts)).join('\n');
    let slots = this.slots.get(key);
    if (!slots) {
      slots = this.rules.map((rule, index): Slot => {
        const bound = bindOrBreak(rule, index, this.defects[index], facts);
        if ('broken' in bound) return bound;
        try {
          const engine = new Engine([], { allowUndefinedFacts: false });
          for (const r of engineRulesOf(bound)) engine.addRule(r);
          return { broken: null, bound, engine };
        } catch {
          return { broken: brokenFindingOf(rule, PREPARATION_FAILED) };
        }
      });
      this.slots.set(key, slots);
    }
    return slots;
  }

  async evaluate(facts: Facts): Promise<CellVerdict> {
    const complete = completeFacts(facts);
    const findings: Finding[] = [];
    for (const slot of this.slotsFor(complete)) {
      if (slot.broken !== null) {
        findings.push(slot.broken);
        continue;
      }
      try {
        // "finding" and "no-data" exclude each other, so one rule gives at most one event.
        const { events } = await slot.engine.run(complete);
        for (const event of events) findings.push(event.type === 'finding' ? findingOf(slot.bound, complete) : noDataFindingOf(slot.bound, complete));
      } catch {
        findings.push(brokenFindingOf(slot.bound.rule, EVALUATION_FAILED));
      }
    }
    return verdictOf(findings);
  }
}
