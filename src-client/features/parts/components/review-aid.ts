import { Intent } from '@blueprintjs/core';
import type { BandCheck, MissingItem, PartConsistency } from '../types';
import { fmt } from './part-labels';

/** What a part lacks, in the reviewer's words. */
export const MISSING_LABEL: Record<MissingItem, string> = {
  datasheet: 'no datasheet',
  'spec-bands': 'no datasheet bands',
  s11: 'no S11',
  efficiency: 'no efficiency data',
  'peak-gain': 'no gain data',
};

/** One claim set against its measurement; `agrees` null when there is nothing to compare. */
export interface ClaimLine {
  readonly quantity: 'vswr' | 'efficiency' | 'gain';
  readonly text: string;
  readonly agrees: boolean | null;
}

const mhzRange = (b: BandCheck) => `${fmt(b.fromMhz, 1)}–${fmt(b.toMhz, 1)} MHz`;

/** "claims VSWR ≤ 2 over 1710–2690 MHz; measured worst 6.72 at 2690 MHz", and the same for efficiency and peak gain. */
export function claimLines(b: BandCheck): ClaimLine[] {
  const lines: ClaimLine[] = [];
  if (b.claimedMaxVswr !== null) {
    const measured =
      b.measuredWorstVswr === null ? 'no S11 over the band' : `measured worst ${fmt(b.measuredWorstVswr)} at ${fmt(b.measuredWorstVswrAtMhz, 1)} MHz`;
    lines.push({ quantity: 'vswr', text: `claims VSWR ≤ ${fmt(b.claimedMaxVswr)} over ${mhzRange(b)}; ${measured}`, agrees: b.vswrAgrees });
  }
  if (b.claimedEfficiencyPct !== null) {
    const statistic = b.claimedEfficiencyStatistic === 'minimum' ? 'at least' : 'on average';
    let measured = 'no measured efficiency over the band';
    if (b.measuredEfficiencyPct !== null) {
      measured = `measured ${fmt(b.measuredEfficiencyPct, 1)} % ${b.measuredEfficiencyBasis}`;
      if (b.measuredEfficiencyBasis !== b.claimedEfficiencyBasis) measured += ' (other basis, not compared)';
    }
    lines.push({
      quantity: 'efficiency',
      text: `claims ${b.claimedEfficiencyBasis} efficiency ${statistic} ${fmt(b.claimedEfficiencyPct, 1)} % over ${mhzRange(b)}; ${measured}`,
      agrees: b.efficiencyAgrees,
    });
  }
  if (b.claimedPeakGainDbi !== null) {
    const basis = b.claimedGainBasis === 'realized' ? 'realized gain' : 'peak gain';
    let measured = 'no measured gain over the band';
    if (b.measuredPeakGainDbi !== null) {
      measured = `measured ${fmt(b.measuredPeakGainDbi, 1)} dBi`;
      if (b.measuredGainBasis !== b.claimedGainBasis) measured += ' (other basis, not compared)';
    }
    lines.push({ quantity: 'gain', text: `claims ${basis} ${fmt(b.claimedPeakGainDbi, 1)} dBi over ${mhzRange(b)}; ${measured}`, agrees: b.peakGainAgrees });
  }
  return lines;
}

/** The directivity a band's gain and efficiency imply, and whether it is believable. */
export function directivityText(b: BandCheck, plausibleMaxDbi: number): { text: string; intent: Intent } | null {
  const d = b.directivity;
  if (!d) return null;
  const value = Math.abs(d.maxDbi - d.minDbi) < 0.05 ? `${fmt(d.maxDbi, 1)} dBi` : `${fmt(d.minDbi, 1)} to ${fmt(d.maxDbi, 1)} dBi`;
  const from = { measured: 'measured gain and efficiency', datasheet: 'datasheet gain and efficiency', mixed: 'measured and datasheet figures' }[d.source];
  const verdict = {
    'below-dipole': 'below a short dipole (1.76 dBi): gain or efficiency is wrong',
    'above-form-factor': `above ${fmt(plausibleMaxDbi, 0)} dBi, the most believable for this form factor`,
    plausible: 'plausible',
  }[d.verdict];
  return { text: `implied directivity ${value} (${from}): ${verdict}`, intent: d.verdict === 'plausible' ? Intent.SUCCESS : Intent.DANGER };
}

/** A one-glance summary for the queue: disagreements first, then what is missing. */
export function summaryOf(check: PartConsistency): { text: string; intent: Intent } {
  if (check.disagreements > 0) return { text: `${check.disagreements} band${check.disagreements === 1 ? '' : 's'} disagree`, intent: Intent.DANGER };
  if (check.missing.length > 0) return { text: `incomplete: ${check.missing.map((m) => MISSING_LABEL[m]).join(', ')}`, intent: Intent.WARNING };
  return { text: 'figures agree', intent: Intent.SUCCESS };
}
