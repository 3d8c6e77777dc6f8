/**
 * The review aid: a part's datasheet claims against its measurements, what is missing, and whether its gain and
 * efficiency agree with each other (implied directivity). Pure: no Nest, no database; every figure comes from rf/.
 */
import { type FrequencyRange, type SampledCurve, efficiencyInBand, gainInBand } from '../../rf/curves';
import type { EfficiencyBasis, GainBasis } from '../../rf/figure-basis';
import { type DirectivityVerdict, impliedDirectivityDbi, impliedDirectivityInBand, judgeDirectivity } from '../../rf/implied-directivity';
import { gammaMagnitudeFromVswr } from '../../rf/mismatch';
import { type ReflectionCurve, worstMatchInBand } from '../../rf/reflection';
import type { FormFactor } from '../part.types';
import { type SpecBandClaim, claimedMaxVswr } from '../spec-coverage';

/**
 * The highest directivity (dBi) believable for each form factor [common practice, no single source]: electrically small
 * chip, trace and flex antennas on a device ground radiate close to a dipole (about 2–5 dBi); stamped metal a little more;
 * a patch over its ground plane 5–9 dBi; a collinear external whip up to about 9 dBi; a directional panel up to about 20 dBi.
 */
export const PLAUSIBLE_MAX_DIRECTIVITY_DBI: Readonly<Record<FormFactor, number>> = {
  chip: 5,
  'pcb-trace': 5,
  flex: 5,
  'stamped-metal': 6,
  patch: 9,
  'external-whip': 9,
  panel: 20,
};

export const MISSING_ITEMS = ['datasheet', 'spec-bands', 's11', 'efficiency', 'peak-gain'] as const;
export type MissingItem = (typeof MISSING_ITEMS)[number];

export interface ConsistencyInput {
  readonly formFactor: FormFactor;
  readonly datasheetCount: number;
  readonly specBands: readonly SpecBandClaim[];
  readonly s11: ReflectionCurve | null;
  readonly efficiency: { readonly curve: SampledCurve; readonly basis: EfficiencyBasis } | null;
  readonly peakGain: { readonly curve: SampledCurve; readonly basis: GainBasis } | null;
}

export interface DirectivityCheck {
  /** Where the gain and efficiency came from: both measured curves, both datasheet figures, or one of each. */
  readonly source: 'measured' | 'datasheet' | 'mixed';
  /** The highest implied directivity over the band (dBi), and the lowest (equal for datasheet figures). */
  readonly maxDbi: number;
  readonly minDbi: number;
  readonly verdict: DirectivityVerdict;
}

export interface BandCheck {
  readonly fromMhz: number;
  readonly toMhz: number;
  readonly claimedMaxVswr: number | null;
  readonly measuredWorstVswr: number | null;
  readonly measuredWorstVswrAtMhz: number | null;
  /** Null when nothing to compare (no claim or no measurement over the band). */
  readonly vswrAgrees: boolean | null;
  readonly claimedEfficiencyPct: number | null;
  readonly claimedEfficiencyBasis: EfficiencyBasis;
  readonly claimedEfficiencyStatistic: 'minimum' | 'average';
  /** Measured efficiency over the band by the claim's statistic (lowest or average), in the measurement's basis. */
  readonly measuredEfficiencyPct: number | null;
  readonly measuredEfficiencyBasis: EfficiencyBasis | null;
  /** Compared only on the same basis; null otherwise. */
  readonly efficiencyAgrees: boolean | null;
  readonly claimedPeakGainDbi: number | null;
  readonly claimedGainBasis: GainBasis;
  readonly measuredPeakGainDbi: number | null;
  readonly measuredGainBasis: GainBasis | null;
  readonly peakGainAgrees: boolean | null;
  /** Null when no gain or no efficiency covers the band, or their bases differ without an S11 to convert. */
  readonly directivity: DirectivityCheck | null;
}

export interface PartConsistency {
  readonly missing: MissingItem[];
  readonly plausibleMaxDirectivityDbi: number;
  readonly bands: BandCheck[];
  /** Bands where a figure disagrees with a measurement or the implied directivity is not credible. */
  readonly disagreements: number;
}

const mhz = (hz: number) => hz / 1e6;
const gammaCurveOf = (s11: ReflectionCurve): SampledCurve => ({ frequenciesHz: s11.frequenciesHz, values: s11.gammaMagnitude });

function bandCheck(input: ConsistencyInput, claim: SpecBandClaim, plausibleMaxDbi: number): BandCheck {
  const range: FrequencyRange = { fromHz: claim.fromHz, toHz: claim.toHz };
  const claimedVswr = claimedMaxVswr(claim);
  const worst = input.s11 ? worstMatchInBand(input.s11, range) : null;
  const worstOk = worst?.status === 'ok' ? worst.worst : null;

  const efficiency = input.efficiency ? efficiencyInBand(input.efficiency.curve, range) : null;
  const efficiencyOk = efficiency?.status === 'ok' ? efficiency : null;
  const measuredEfficiencyPct = efficiencyOk ? (claim.efficiencyStatistic === 'minimum' ? efficiencyOk.minPercent : efficiencyOk.averagePercent) : null;
  const measuredEfficiencyBasis = efficiencyOk ? input.efficiency!.basis : null;

  const gain = input.peakGain ? gainInBand(input.peakGain.curve, range) : null;
  const gainOk = gain?.status === 'ok' ? gain : null;
  const measuredGainBasis = gainOk ? input.peakGain!.basis : null;

  let directivity: DirectivityCheck | null = null;
  if (gainOk && efficiencyOk) {
    const d = impliedDirectivityInBand(
      input.peakGain!.curve,
      input.peakGain!.basis,
      input.efficiency!.curve,
      input.efficiency!.basis,
      range,
      input.s11 ? gammaCurveOf(input.s11) : null,
    );
    // The band's highest D is judged: a dip between samples of two curves on different grids is no evidence against the figures.
    if (d.status === 'ok') directivity = { source: 'measured', maxDbi: d.maxDbi, minDbi: d.minDbi, verdict: judgeDirectivity(d.maxDbi, plausibleMaxDbi) };
  }
  if (!directivity) {
    // Datasheet figures (or one measured figure with one claimed): one value for the band.
    const gainFigure = gainOk
      ? { dbi: gainOk.peakDbi, basis: measuredGainBasis! }
      : claim.peakGainDbi !== null
        ? { dbi: claim.peakGainDbi, basis: claim.gainBasis }
        : null;
    const efficiencyFigure =
      claim.efficiencyPct !== null
        ? { pct: claim.efficiencyPct, basis: claim.efficiencyBasis }
        : efficiencyOk
          ? { pct: efficiencyOk.averagePercent, basis: measuredEfficiencyBasis! }
          : null;
    // |Γ| for a basis conversion: the measured worst in the band, else the claimed VSWR limit.
    const gamma = worstOk ? worstOk.gammaMagnitude : claimedVswr !== null ? gammaMagnitudeFromVswr(claimedVswr) : null;
    const d =
      gainFigure && efficiencyFigure ? impliedDirectivityDbi(gainFigure.dbi, gainFigure.basis, efficiencyFigure.pct, efficiencyFigure.basis, gamma) : null;
    if (d !== null) {
      const both = (gainOk ? 1 : 0) + (claim.efficiencyPct === null && efficiencyOk ? 1 : 0);
      directivity = {
        source: both === 2 ? 'measured' : both === 1 ? 'mixed' : 'datasheet',
        maxDbi: d,
        minDbi: d,
        verdict: judgeDirectivity(d, plausibleMaxDbi),
      };
    }
  }

  return {
    fromMhz: mhz(claim.fromHz),
    toMhz: mhz(claim.toHz),
    claimedMaxVswr: claimedVswr,
    measuredWorstVswr: worstOk?.vswr ?? null,
    measuredWorstVswrAtMhz: worstOk ? mhz(worstOk.frequencyHz) : null,
    vswrAgrees: claimedVswr !== null && worstOk ? worstOk.vswr <= claimedVswr : null,
    claimedEfficiencyPct: claim.efficiencyPct,
    claimedEfficiencyBasis: claim.efficiencyBasis,
    claimedEfficiencyStatistic: claim.efficiencyStatistic,
    measuredEfficiencyPct,
    measuredEfficiencyBasis,
    efficiencyAgrees:
      claim.efficiencyPct !== null && measuredEfficiencyPct !== null && measuredEfficiencyBasis === claim.efficiencyBasis
        ? measuredEfficiencyPct >= claim.efficiencyPct
        : null,
    claimedPeakGainDbi: claim.peakGainDbi,
    claimedGainBasis: claim.gainBasis,
    measuredPeakGainDbi: gainOk?.peakDbi ?? null,
    measuredGainBasis,
    peakGainAgrees: claim.peakGainDbi !== null && gainOk && measuredGainBasis === claim.gainBasis ? gainOk.peakDbi >= claim.peakGainDbi : null,
    directivity,
  };
}

/** Claims against measurements per datasheet band, what is missing, and how many bands disagree. */
export function checkPartConsistency(input: ConsistencyInput): PartConsistency {
  const plausibleMaxDirectivityDbi = PLAUSIBLE_MAX_DIRECTIVITY_DBI[input.formFactor];
  const hasEfficiency = input.efficiency !== null || input.specBands.some((b) => b.efficiencyPct !== null);
  const hasGain = input.peakGain !== null || input.specBands.some((b) => b.peakGainDbi !== null);
  const missing: MissingItem[] = [];
  if (input.datasheetCount === 0) missing.push('datasheet');
  if (input.specBands.length === 0) missing.push('spec-bands');
  if (!input.s11) missing.push('s11');
  if (!hasEfficiency) missing.push('efficiency');
  if (!hasGain) missing.push('peak-gain');
  const bands = input.specBands.map((claim) => bandCheck(input, claim, plausibleMaxDirectivityDbi));
  const disagreements = bands.filter(
    (b) => b.vswrAgrees === false || b.efficiencyAgrees === false || b.peakGainAgrees === false || (b.directivity && b.directivity.verdict !== 'plausible'),
  ).length;
  return { missing, plausibleMaxDirectivityDbi, bands, disagreements };
}
