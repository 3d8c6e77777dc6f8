import { ANTENNA_ROLE_LABELS } from '../../../lib/antenna-role-labels';
import type { EvaluationRadio, ProductEvaluation } from '../types';

/** One chosen part of a radio as the verdict lists it: its antenna (when the radio has several), the part, and whose S11 judged it. */
export interface ChosenPartLine {
  key: string;
  /** "diversity", "MIMO 2"; null for the one antenna of a radio with a single one. */
  role: string | null;
  part: string;
  /** "S11 measured in product, file housing.s4p, port 2" or "S11 of the evaluation board" */
  s11: string;
}

export function chosenPartLines(radio: Pick<EvaluationRadio, 'chosen'>): ChosenPartLine[] {
  const several = radio.chosen.length > 1 || radio.chosen.some((p) => p.role !== 'main');
  return radio.chosen.map((p) => ({
    key: `${p.partId}-${p.role}`,
    role: several ? ANTENNA_ROLE_LABELS[p.role] : null,
    part: `${p.mpn} (${p.manufacturer})`,
    s11: p.s11Source && p.s11Source !== 'evaluation board' ? `S11 ${p.s11Source}` : 'S11 of the evaluation board',
  }));
}

/** A radio's reason with its first letter raised, so it reads as a sentence beside the verdict. */
export function sentence(text: string): string {
  return text ? text.charAt(0).toUpperCase() + text.slice(1) : text;
}

/** How many radios have each verdict, worst first, in words: "1 fails, 2 pass". */
export function verdictCounts(evaluation: Pick<ProductEvaluation, 'radios'>): string {
  const count = (verdict: EvaluationRadio['verdict']) => evaluation.radios.filter((r) => r.verdict === verdict).length;
  const parts: string[] = [];
  const fail = count('fail');
  const noData = count('no-data');
  const marginal = count('marginal');
  const pass = count('pass');
  if (fail) parts.push(`${fail} ${fail === 1 ? 'radio fails' : 'radios fail'}`);
  if (noData) parts.push(`${noData} not checked`);
  if (marginal) parts.push(`${marginal} marginal`);
  if (pass) parts.push(`${pass} ${pass === 1 ? 'passes' : 'pass'}`);
  return parts.join(', ');
}

/** Keeps a number and its unit on one line ("30 %", "699 MHz"), with a no-break space. */
export function keepUnitsTogether(text: string): string {
  return text.replace(/(\d) (%|dBi|dBm|dB|MHz|GHz|mm|days)/g, '$1\u00a0$2');
}
