import type { CompiledRuleSet } from './compiled-evaluator';
import { decidedCell, firedMargins, pairFacts, prepare, type EvaluationOptions } from './matrix';
import { decidingCellOf } from './deciding';
import { statusRank, worseStatus } from './rule-binding';
import type { CellStatus, Facts, Finding, PartEvaluationData, RadioBandRequirement } from './types';

/** Findings the evaluation itself writes (not a rule's): they carry this rule id. */
export const EVALUATION_RULE_ID = 'evaluation';

export interface RadioToEvaluate {
  readonly radioId: number;
  readonly radioName: string;
  /** The radio's bands, in the radio's order. */
  readonly requirements: readonly RadioBandRequirement[];
  /** The part(s) chosen for the radio; empty when none is. */
  readonly chosen: readonly PartEvaluationData[];
  /** Findings about the radio's antennas together in one band (e.g. their correlation), by band id; they count into the band's status. */
  readonly systemFindings?: ReadonlyMap<number, readonly Finding[]>;
}

export interface BandEvaluation {
  readonly requirement: RadioBandRequirement;
  readonly status: CellStatus;
  readonly decidingFinding: Finding | null;
  readonly findings: readonly Finding[];
  /** The facts of the chosen part that decides the band; null when no part is chosen. */
  readonly facts: Facts | null;
  readonly partId: number | null;
}

export interface RadioEvaluation {
  readonly radioId: number;
  readonly radioName: string;
  readonly status: CellStatus;
  readonly decidingFinding: Finding | null;
  /** The band that decides the radio's status; null when the radio passes or has no band. */
  readonly decidingBandId: number | null;
  readonly chosen: readonly PartEvaluationData[];
  readonly bands: readonly BandEvaluation[];
  /** Findings about the radio as a whole (no part chosen). */
  readonly findings: readonly Finding[];
}

export interface ProductEvaluation {
  /** The worst radio: fail, then no-data (a radio not checked cannot pass), then marginal, then pass. */
  readonly status: CellStatus;
  readonly radios: readonly RadioEvaluation[];
  /** Findings about the product and its radios as a whole; band findings stay on their bands. */
  readonly findings: readonly { readonly radioId: number | null; readonly finding: Finding }[];
}

function noPartChosen(radioName: string): Finding {
  return {
    ruleId: EVALUATION_RULE_ID,
    severity: 'no-data',
    code: 'NO_PART_CHOSEN',
    message: `no part is chosen for ${radioName}, so none of its bands is checked`,
  };
}

const NO_RADIOS: Finding = {
  ruleId: EVALUATION_RULE_ID,
  severity: 'no-data',
  code: 'PRODUCT_WITHOUT_RADIOS',
  message: 'the product has no radios, so nothing is checked',
};

function evaluateRadio(radio: RadioToEvaluate, rules: CompiledRuleSet, options: EvaluationOptions): RadioEvaluation {
  const partKey = options.partKey ?? (() => null);
  if (radio.chosen.length === 0) {
    const finding = noPartChosen(radio.radioName);
    return {
      radioId: radio.radioId,
      radioName: radio.radioName,
      status: 'no-data',
      decidingFinding: finding,
      decidingBandId: null,
      chosen: [],
      bands: radio.requirements.map((requirement) => ({
        requirement,
        status: 'no-data',
        decidingFinding: finding,
        findings: [finding],
        facts: null,
        partId: null,
      })),
      findings: [finding],
    };
  }
  const rows = prepare(radio.requirements, options.cache);
  const bands = rows.map((row) => {
    const compiled = rules.forRow(row.rowFacts);
    // Several chosen parts for one radio must each serve the band: the worst of them decides it.
    const cells = radio.chosen.map((part) => {
      const facts = pairFacts(row, part, options.cache, partKey);
      const verdict = compiled.evaluate(facts);
      const margins = verdict.status === 'pass' ? new Map<string, number>() : firedMargins(compiled, facts);
      return decidedCell(verdict.status, verdict.findings, margins, { part, facts, findings: verdict.findings });
    });
    const worst = decidingCellOf(cells)!;
    const system = radio.systemFindings?.get(row.requirement.bandId) ?? [];
    // A system finding worse than every cell's decides the band; otherwise the cells do.
    let status = worst.status;
    let worseSystem: Finding | null = null;
    for (const finding of system) {
      if (finding.severity !== 'info' && statusRank(finding.severity) > statusRank(status)) {
        status = finding.severity;
        worseSystem = finding;
      }
    }
    const deciding = worseSystem ?? worst.deciding;
    return {
      cell: worseSystem ? { ...worst, status, deciding, overByDb: null } : worst,
      band: {
        requirement: row.requirement,
        status,
        decidingFinding: deciding,
        findings: [...worst.item.findings, ...system],
        facts: worst.item.facts,
        partId: worst.item.part.partId,
      } satisfies BandEvaluation,
    };
  });
  const decided = decidingCellOf(bands.map((b) => ({ ...b.cell, item: b.band })));
  const status = bands.reduce<CellStatus>((s, b) => worseStatus(s, b.band.status), 'pass');
  return {
    radioId: radio.radioId,
    radioName: radio.radioName,
    status,
    decidingFinding: status === 'pass' ? null : (decided?.deciding ?? null),
    decidingBandId: status === 'pass' || !decided ? null : decided.item.requirement.bandId,
    chosen: radio.chosen,
    bands: bands.map((b) => b.band),
    findings: [],
  };
}

/**
 * One answer per radio and for the product: each radio's bands against the part(s) chosen for it only.
 * A radio with no chosen part is not checked (no-data), and says so.
 */
export function evaluateProduct(radios: readonly RadioToEvaluate[], rules: CompiledRuleSet, options: EvaluationOptions = {}): ProductEvaluation {
  if (radios.length === 0) return { status: 'no-data', radios: [], findings: [{ radioId: null, finding: NO_RADIOS }] };
  const evaluated = radios.map((radio) => evaluateRadio(radio, rules, options));
  return {
    status: evaluated.reduce<CellStatus>((s, r) => worseStatus(s, r.status), 'pass'),
    radios: evaluated,
    findings: evaluated.flatMap((r) => r.findings.map((finding) => ({ radioId: r.radioId, finding }))),
  };
}
