import type { EvaluationRadio, ProductEvaluation } from '../types';

/** What the chosen-part cell of a radio says: its parts, or that none is chosen. */
const ROLE_WORDS: Record<string, string> = { main: 'main', diversity: 'diversity', 'mimo-2': 'MIMO 2', 'mimo-3': 'MIMO 3', 'mimo-4': 'MIMO 4' };

export function chosenPartsText(radio: Pick<EvaluationRadio, 'chosen'>): string {
  if (radio.chosen.length === 0) return 'No part chosen for this radio';
  // A radio with one antenna reads as before; with several each part says which antenna it is and whose S11 counts.
  const several = radio.chosen.length > 1;
  return radio.chosen
    .map((p) => {
      const role = several && p.role ? `${ROLE_WORDS[p.role] ?? p.role}: ` : '';
      const measured = p.s11Source && p.s11Source !== 'evaluation board' ? `, S11 ${p.s11Source}` : '';
      return `${role}${p.mpn} (${p.manufacturer}${measured})`;
    })
    .join('; ');
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
