import { reflectionCurveFromGamma } from '../../rf/reflection';
import { gammaMagnitudeFromVswr } from '../../rf/mismatch';
import type { SampledCurve } from '../../rf/curves';
import type { BandRange, PartEvaluationData, RadioBandRequirement, SpecBand } from './types';

/** Constructed parts and bands for the engine tests: curves built to put a fact exactly where wanted. */

export const MHZ = 1e6;

export function flatCurve(fromHz: number, toHz: number, value: number, points = 11): SampledCurve {
  const frequenciesHz = Float64Array.from({ length: points }, (_, i) => fromHz + ((toHz - fromHz) * i) / (points - 1));
  return { frequenciesHz, values: new Float64Array(points).fill(value) };
}

/** |Γ| from VSWR at every sample, as a purely resistive reflection. */
export function reflectionFromVswr(frequenciesHz: ArrayLike<number>, vswr: ArrayLike<number>) {
  const f = Float64Array.from(frequenciesHz);
  const re = Float64Array.from(vswr, (v) => gammaMagnitudeFromVswr(v));
  return reflectionCurveFromGamma(f, re, new Float64Array(f.length));
}

export function flatReflection(fromHz: number, toHz: number, vswr: number, points = 11) {
  const curve = flatCurve(fromHz, toHz, vswr, points);
  return reflectionFromVswr(curve.frequenciesHz, curve.values);
}

/**
 * A match that is `goodVswr` up to `breakHz` and `badVswr` above, with |Γ| crossing the limit exactly at
 * breakHz: the two samples either side sit symmetrically around the limit's |Γ|.
 */
export function steppedReflection(fromHz: number, toHz: number, breakHz: number, limitVswr: number, spreadGamma = 0.1) {
  const limit = gammaMagnitudeFromVswr(limitVswr);
  const halfStep = 1000;
  const f = [fromHz, breakHz - halfStep, breakHz + halfStep, toHz];
  const g = [limit - spreadGamma, limit - spreadGamma, limit + spreadGamma, limit + spreadGamma];
  return reflectionCurveFromGamma(Float64Array.from(f), Float64Array.from(g), new Float64Array(4));
}

export interface PartShape {
  fromHz?: number;
  toHz?: number;
  vswr?: number;
  efficiencyPercent?: number;
  gainDbi?: number;
}

/** A part measured flat over [fromHz, toHz]: matched at `vswr`, `efficiencyPercent` radiation efficiency, `gainDbi` peak gain. */
export function constructedPart(shape: PartShape = {}, overrides: Partial<PartEvaluationData> = {}): PartEvaluationData {
  const fromHz = shape.fromHz ?? 600 * MHZ;
  const toHz = shape.toHz ?? 3000 * MHZ;
  return {
    partId: 1,
    mpn: 'TEST-1',
    title: 'constructed test part',
    reflection: flatReflection(fromHz, toHz, shape.vswr ?? 1.5),
    efficiencyPercent: flatCurve(fromHz, toHz, shape.efficiencyPercent ?? 70),
    efficiencyBasis: 'radiation',
    peakGainDbi: flatCurve(fromHz, toHz, shape.gainDbi ?? 1),
    gainBasis: 'peak',
    averageGainDbi: null,
    specBands: [],
    evaluationGroundPlane: { lengthMm: 80, widthMm: 40 },
    polarization: 'linear',
    reviewState: 'approved',
    lifecycle: 'active',
    ...overrides,
  };
}

export function rangeMhz(fromMhz: number, toMhz: number, role: BandRange['role'] = 'tdd'): BandRange {
  return { fromHz: fromMhz * MHZ, toHz: toMhz * MHZ, role };
}

// 3GPP TS 36.101 Table 5.5-1: E-UTRA band 12 UL 699–716, DL 729–746 MHz.
export const LTE_B12_RANGES: BandRange[] = [rangeMhz(699, 716, 'uplink'), rangeMhz(729, 746, 'downlink')];

export function constructedRequirement(overrides: Partial<RadioBandRequirement> = {}): RadioBandRequirement {
  return {
    radioId: 1,
    radioName: 'cellular',
    technology: 'lte',
    bandId: 12,
    designation: 'B12',
    ranges: LTE_B12_RANGES,
    txPowerDbm: 23,
    // A transmitting band needs a certified gain entered, else it is "not checked".
    certifiedMaxGainDbi: 9,
    feedLossDb: 0,
    requiredPolarization: null,
    productGroundPlane: { lengthMm: 120, widthMm: 60 },
    regulatoryLimits: [],
    ...overrides,
  } as RadioBandRequirement;
}

/** A datasheet line with the basis the demo seed states (radiation efficiency as a band minimum, peak gain) unless overridden. */
export function specBand(fromMhz: number, toMhz: number, figures: Partial<SpecBand> = {}): SpecBand {
  return {
    fromHz: fromMhz * MHZ,
    toHz: toMhz * MHZ,
    maxVswr: null,
    minReturnLossDb: null,
    efficiencyPercent: null,
    efficiencyBasis: 'radiation',
    efficiencyStatistic: 'minimum',
    peakGainDbi: null,
    averageGainDbi: null,
    gainBasis: 'peak',
    ...figures,
  };
}
