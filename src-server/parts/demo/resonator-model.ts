import { type Complex, add, complex, div, inverse } from '../../rf/complex';
import { gammaFromImpedance } from '../../rf/mismatch';
import { gainDbiFromEfficiencyPercentAndDirectivityDbi } from '../../rf/link-budget';
import { gammaMagnitudeFromVswr } from '../../rf/mismatch';
import { powerRatioToDb } from '../../rf/units';

/**
 * Synthetic but physically plausible antenna data for the demo catalogue. The input impedance is a
 * Foster network: series-RLC branches in parallel, one per resonance, so Z is passive and causal and
 * every band's bandwidth follows from its Q (Pozar 4th ed. §6.1, series resonant circuit).
 */
export interface Resonance {
  /** The range the branch is designed to cover at `edgeVswr`. */
  fromMhz: number;
  toMhz: number;
  /** VSWR at both edges for a lone branch with R = matchOhms; below it inside. */
  edgeVswr: number;
  /** Branch resistance; 50 is a perfect match at the centre. @default 50 */
  matchOhms?: number;
}

interface Branch {
  f0Hz: number;
  q: number;
  r: number;
}

/**
 * Q that puts |Γ| of a series RLC (R = Z0) at the VSWR limit at the edges: |Γ| = |x| / √(4 + x²)
 * with x = Q (f/f0 − f0/f), solved for x at the edge (from Γ = jX/(2R + jX)).
 */
export function branchFor(resonance: Resonance): Branch {
  const f0 = Math.sqrt(resonance.fromMhz * resonance.toMhz) * 1e6;
  const g = gammaMagnitudeFromVswr(resonance.edgeVswr);
  const x = (2 * g) / Math.sqrt(1 - g * g);
  const detune = (resonance.toMhz * 1e6) / f0 - f0 / (resonance.toMhz * 1e6);
  return { f0Hz: f0, q: x / detune, r: resonance.matchOhms ?? 50 };
}

export function impedanceAt(branches: readonly Branch[], frequencyHz: number): Complex {
  let admittance = complex(0);
  for (const b of branches) {
    const reactance = b.q * b.r * (frequencyHz / b.f0Hz - b.f0Hz / frequencyHz);
    admittance = add(admittance, inverse(complex(b.r, reactance)));
  }
  return div(complex(1), admittance);
}

/** Γ against 50 Ω at each frequency, through the RF module's Γ = (Z − Z0)/(Z + Z0). */
export function s11Curve(resonances: readonly Resonance[], frequenciesHz: readonly number[]): { re: number[]; im: number[] } {
  const branches = resonances.map(branchFor);
  const re: number[] = [];
  const im: number[] = [];
  for (const f of frequenciesHz) {
    const gamma = gammaFromImpedance(impedanceAt(branches, f), 50);
    re.push(gamma.re);
    im.push(gamma.im);
  }
  return { re, im };
}

export interface EfficiencyLobe {
  fromMhz: number;
  toMhz: number;
  /** Radiation efficiency on the flat top, %. */
  peakPct: number;
  /** How fast it falls outside the range; larger is sharper. @default 6 */
  sharpness?: number;
}

const EFFICIENCY_FLOOR_PCT = 3;

/** A flat-topped smooth bump per band (1 / (1 + u⁴) roll-off in log frequency); the best lobe wins. */
export function efficiencyAt(lobes: readonly EfficiencyLobe[], frequencyHz: number): number {
  const mhz = frequencyHz / 1e6;
  let best = EFFICIENCY_FLOOR_PCT;
  for (const lobe of lobes) {
    const centre = Math.sqrt(lobe.fromMhz * lobe.toMhz);
    const halfWidth = Math.log(lobe.toMhz / centre) * 1.4;
    const u = Math.log(mhz / centre) / halfWidth;
    const value = EFFICIENCY_FLOOR_PCT + (lobe.peakPct - EFFICIENCY_FLOOR_PCT) / (1 + Math.abs(u) ** (lobe.sharpness ?? 6));
    best = Math.max(best, value);
  }
  return best;
}

/** Peak gain = efficiency (dB) + directivity; average gain over the sphere = efficiency (dB). IEEE Std 145; Balanis §2.14. */
export function gainsAt(efficiencyPct: number, directivityDbi: number): { peakDbi: number; averageDbi: number } {
  return { peakDbi: gainDbiFromEfficiencyPercentAndDirectivityDbi(efficiencyPct, directivityDbi), averageDbi: powerRatioToDb(efficiencyPct / 100) };
}
