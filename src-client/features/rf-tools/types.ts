/** Shapes of the /api/rf answers (src-server/rf-tools/dto). */

export interface FrequencyRange {
  fromHz: number;
  toHz: number;
}

export interface CurvePoint {
  frequencyHz: number;
  gammaMagnitude: number;
  /** null where infinite. */
  vswr: number | null;
  /** Positive dB; null where infinite. */
  returnLossDb: number | null;
}

export type MatchCriterionName = 'vswr' | 'return-loss-10db';

export interface TouchstoneAnalysis {
  version: string;
  ports: number;
  parameter: string;
  format: string;
  referenceOhms: number[];
  points: number;
  minFrequencyHz: number;
  maxFrequencyHz: number;
  port: number;
  criterion: MatchCriterionName;
  thresholdVswr: number;
  thresholdReturnLossDb: number;
  matchedRanges: FrequencyRange[];
  /** All ranges meeting the criterion; matchedRanges holds the first 100. */
  matchedRangeCount: number;
  bestMatch: { frequencyHz: number; gammaMagnitude: number; vswr: number; returnLossDb: number };
  resampled: boolean;
  curve: CurvePoint[];
}

export interface MatchingElement {
  connection: 'series' | 'shunt';
  position: 'load-side' | 'source-side';
  kind: 'inductor' | 'capacitor' | 'none';
  inductanceNh: number | null;
  capacitancePf: number | null;
}

export interface SweepPoint {
  frequencyHz: number;
  returnLossDb: number | null;
  vswr: number | null;
}

export interface MatchingNetwork {
  elements: [MatchingElement, MatchingElement];
  sweep: SweepPoint[];
}

export interface MatchingSolution {
  topology: 'shunt-at-load' | 'series-at-load';
  exact: MatchingNetwork;
  snapped: MatchingNetwork;
  snappedReturnLossDb: number | null;
}

export interface MatchingRequest {
  frequencyHz: number;
  loadOhms: { re: number; im: number };
  z0Ohms: number;
  series: 'E12' | 'E24';
  sweep?: { fromHz: number; toHz: number; points?: number };
}

export interface MatchingResponse {
  frequencyHz: number;
  z0Ohms: number;
  series: string;
  solutions: MatchingSolution[];
}

export interface LinkBudgetRequest {
  frequencyHz: number;
  distanceM: number;
  txPowerDbm: number;
  txGainDbi: number;
  rxGainDbi: number;
  lossesDb: number;
  rxSensitivityDbm: number;
}

export interface LinkBudgetResponse {
  eirpDbm: number;
  erpDbm: number;
  pathLossDb: number;
  receivedDbm: number;
  marginDb: number;
  maxRangeM: number;
  rangeRatioFor6DbLess: number;
}

/** Exactly one known quantity. */
export type ConversionRequest =
  | { vswr: number }
  | { returnLossDb: number }
  | { gammaMagnitude: number }
  | { impedanceOhms: { re: number; im: number }; z0Ohms?: number }
  | { frequencyHz: number }
  | { dbm: number }
  | { mw: number }
  | { efficiencyPct: number }
  | { efficiencyDb: number };

export interface Reflection {
  gammaMagnitude: number;
  vswr: number | null;
  returnLossDb: number | null;
  mismatchLossDb: number | null;
  transmittedPercent: number;
  reflectedPercent: number;
}

export interface ConversionResponse {
  input: string;
  reflection?: Reflection;
  gamma?: { re: number; im: number; magnitude: number; angleDeg: number };
  wavelength?: { frequencyHz: number; wavelengthMm: number; halfWaveMm: number; quarterWaveMm: number };
  power?: { dbm: number; mw: number; watts: number };
  efficiency?: { percent: number; db: number };
}

/** A band to overlay on a plot. */
export interface OverlayBand {
  key: string;
  label: string;
  fromHz: number;
  toHz: number;
}
