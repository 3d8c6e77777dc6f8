import type { CompiledRuleSet } from './engine/compiled-evaluator';
import { findingTitle } from './engine/deciding';
import type { Finding } from './engine/types';
import type { FindingDto } from './dto/matrix.dto';

/** Rule id → rule title, for the titles of findings whose code has no short title of its own. */
export function ruleTitlesOf(rules: CompiledRuleSet): ReadonlyMap<string, string> {
  return new Map(rules.rules.map((r) => [r.id, r.title]));
}

/** A finding as the API shows it: its code (kept for export) with a short human title. */
export function findingView(finding: Finding, ruleTitles: ReadonlyMap<string, string>): FindingDto {
  return {
    ruleId: finding.ruleId,
    severity: finding.severity,
    code: finding.code,
    title: findingTitle(finding.code, ruleTitles.get(finding.ruleId)),
    message: finding.message,
  };
}
