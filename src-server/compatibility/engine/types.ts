import type { SampledCurve } from '../../rf/curves';
import type { ReflectionCurve } from '../../rf/reflection';
import { POLARIZATIONS, type Polarization } from '../../rf/link-budget';
import type { EfficiencyBasis, FigureStatistic, GainBasis } from '../../rf/figure-basis';

export { POLARIZATIONS, type Polarization };
export type { EfficiencyBasis, FigureStatistic, GainBasis };

export const TECHNOLOGIES = ['lte', 'nr', 'gnss', 'wifi', 'ble', 'ism', 'uwb', 'other'] as const;
export type Technology = (typeof TECHNOLOGIES)[number];

export const REVIEW_STATES = ['draft', 'in-review', 'approved', 'restricted', 'retired'] as const;
export type ReviewState = (typeof REVIEW_STATES)[number];

export const LIFECYCLES = ['active', 'nrnd', 'eol'] as const;
export type Lifecycle = (typeof LIFECYCLES)[number];

/** As the band library names them (bands/band-domain.ts). */
export type RangeRole = 'uplink' | 'downlink' | 'tdd' | 'receive' | 'transmit-receive';

export interface BandRange {
  readonly fromHz: number;
  readonly toHz: number;
  readonly role: RangeRole;
}

export interface GroundPlane {
  readonly lengthMm: number;
  readonly widthMm: number;
}

/** A datasheet line for a frequency range, used where no measured curve covers the band. */
export interface SpecBand {
  readonly fromHz: number;
  readonly toHz: number;
  readonly maxVswr: number | null;
  readonly minReturnLossDb: number | null;
  readonly efficiencyPercent: number | null;
  /** What efficiencyPercent includes: radiation (mismatch left out) or total (mismatch included). */
  readonly efficiencyBasis: EfficiencyBasis;
  /** Whether efficiencyPercent is the band's minimum or its average (the minimum is then not known; the average stands for it). */
  readonly efficiencyStatistic: FigureStatistic;
  readonly peakGainDbi: number | null;
  readonly averageGainDbi: number | null;
  /** What the gains include: peak (the antenna's gain) or realized (mismatch included). */
  readonly gainBasis: GainBasis;
}

/** Everything the engine needs to know about one antenna part; any piece may be missing. */
export interface PartEvaluationData {
  readonly partId: number;
  readonly mpn: string;
  readonly title: string;
  readonly reflection: ReflectionCurve | null;
  /** Efficiency in %, of the basis below. */
  readonly efficiencyPercent: SampledCurve | null;
  readonly efficiencyBasis: EfficiencyBasis;
  /** Gain in the direction of its maximum, dBi, of the basis below. */
  readonly peakGainDbi: SampledCurve | null;
  readonly gainBasis: GainBasis;
  readonly averageGainDbi: SampledCurve | null;
  readonly specBands: readonly SpecBand[];
  readonly evaluationGroundPlane: GroundPlane | null;
  readonly polarization: Polarization | null;
  readonly reviewState: ReviewState;
  readonly lifecycle: Lifecycle;
}

/** As the band library stores them: radiated (EIRP, ERP), conducted power at the radio's port, or conducted power reduced for gain above a threshold. */
export type LimitKind = 'eirp' | 'erp' | 'conducted' | 'conducted-gain-rule';

/** A regional power limit that applies to part of a band. */
export interface RegulatoryLimit {
  readonly region: string;
  readonly fromHz: number;
  readonly toHz: number;
  readonly kind: LimitKind;
  readonly valueDbm: number;
  readonly source: string;
  /** conducted-gain-rule: gain above this (dBi) lowers the allowed conducted power … */
  readonly gainThresholdDbi?: number | null;
  /** … by this many dB per dB (1 for 47 CFR 15.247(b)(4), 1/3 for fixed point-to-point (c)(1)(i)). */
  readonly reductionDbPerDb?: number | null;
  /** The requirement's markets this limit governs; absent: every one of them. */
  readonly markets?: readonly string[];
}

/** A frequency range in Hz (a channel the radio uses). */
export interface ChannelRange {
  readonly fromHz: number;
  readonly toHz: number;
}

/** One band of one radio of a product, with everything of the radio the rules look at. */
export interface RadioBandRequirement {
  readonly radioId: number;
  readonly radioName: string;
  readonly technology: Technology;
  readonly bandId: number;
  readonly designation: string;
  readonly ranges: readonly BandRange[];
  /** Null for a receive-only radio (GNSS). */
  readonly txPowerDbm: number | null;
  /** The module's certified maximum antenna gain for this band; null when the grant states none. */
  readonly certifiedMaxGainDbi: number | null;
  readonly feedLossDb: number;
  readonly requiredPolarization: Polarization | null;
  readonly productGroundPlane: GroundPlane | null;
  readonly regulatoryLimits: readonly RegulatoryLimit[];
  /**
   * The product's markets this band is used in: when the radio transmits, each needs a limit on file for the
   * transmit ranges, else the band is "not checked". Absent: markets are not checked.
   */
  readonly markets?: readonly string[];
  /** Channels the radio uses in this band: limits are judged on them (inside the transmit ranges) instead of the whole ranges. */
  readonly channels?: readonly ChannelRange[] | null;
}

export type FactValue = number | string | boolean | null;

/** Flat facts of one (radio band × part) pair; null means "not known", never "zero". */
export type Facts = Readonly<Record<string, FactValue>>;

export const SEVERITIES = ['fail', 'marginal', 'info'] as const;
export type Severity = (typeof SEVERITIES)[number];

export type CellStatus = 'pass' | 'marginal' | 'fail' | 'no-data';

export interface Finding {
  readonly ruleId: string;
  readonly severity: Severity | 'no-data';
  readonly code: string;
  readonly message: string;
}

export interface CellVerdict {
  readonly status: CellStatus;
  readonly findings: readonly Finding[];
}
