/**
 * Every fact a rule may name. The unit decides how a margin to a threshold is read in dB
 * (see margin.ts); `scope` says whether the fact belongs to the radio band (the row) or the pair.
 */
export type FactType = 'number' | 'string' | 'boolean';
export type FactUnit = 'percent' | 'db' | 'dbm' | 'dbi' | 'vswr' | 'mhz' | 'mm' | 'count' | 'none';

export interface FactDescription {
  readonly type: FactType;
  readonly unit: FactUnit;
  readonly scope: 'row' | 'pair';
  readonly description: string;
  /** The best value the fact can take (coverage 100 %, no polarization loss): a part there has no margin to rank by. */
  readonly ideal?: number;
}

const row = (type: FactType, unit: FactUnit, description: string): FactDescription => ({ type, unit, scope: 'row', description });
const pair = (type: FactType, unit: FactUnit, description: string): FactDescription => ({ type, unit, scope: 'pair', description });

export const FACT_CATALOG = {
  technology: row('string', 'none', 'radio technology: lte, nr, gnss, wifi, ble, ism, uwb, other'),
  designation: row('string', 'none', 'band designation, e.g. B12, n78, GPS L1'),
  bandLowestMhz: row('number', 'mhz', 'lowest frequency of the band ranges'),
  bandHighestMhz: row('number', 'mhz', 'highest frequency of the band ranges'),
  radioTransmits: row('boolean', 'none', 'whether the radio transmits in this band (has a transmit power)'),
  txPowerDbm: row('number', 'dbm', 'transmit power of the radio at its antenna port'),
  feedLossDb: row('number', 'db', 'cable or feed loss between radio and antenna'),
  certifiedMaxGainDbi: row('number', 'dbi', "maximum antenna gain of the module's certification for this band"),
  requiredPolarization: row('string', 'none', 'polarization the radio needs: linear, RHCP (GNSS) or LHCP'),
  productGroundPlaneLengthMm: row('number', 'mm', "longer side of the product's ground plane"),
  productGroundPlaneWidthMm: row('number', 'mm', "shorter side of the product's ground plane"),
  quarterWaveMm: row('number', 'mm', 'λ/4 at the lowest frequency of the band'),
  regionalLimitCount: row(
    'number',
    'count',
    "number of regional power limits that govern the radio's technology in the product's markets and apply to the transmit ranges (or the channels the radio lists)",
  ),
  marketsWithoutLimitCount: row('number', 'count', "number of the product's markets using this band that have no power limit on file for it"),
  marketsWithoutLimit: row('string', 'none', "the product's markets using this band that have no power limit on file for it ('none' when every one has)"),

  reviewState: pair('string', 'none', 'review state of the part: draft, in-review, approved, restricted, retired'),
  lifecycle: pair('string', 'none', 'lifecycle of the part: active, nrnd, eol'),
  partPolarization: pair('string', 'none', 'polarization of the part: linear, RHCP, LHCP'),
  dataSource: pair('string', 'none', 'where the band facts come from: measured, spec, mixed, none'),
  dataCompletenessPct: pair('number', 'percent', 'share of match, efficiency and gain that are known over the whole band'),
  missingData: pair('string', 'none', 'what is missing for this band, in words'),

  coverageAtVswr2Pct: { ...pair('number', 'percent', 'share of the band width where VSWR ≤ 2:1'), ideal: 100 },
  uncoveredAtVswr2: pair('string', 'none', 'sub-ranges of the band where VSWR exceeds 2:1'),
  coverageAtVswr3Pct: { ...pair('number', 'percent', 'share of the band width where VSWR ≤ 3:1'), ideal: 100 },
  uncoveredAtVswr3: pair('string', 'none', 'sub-ranges of the band where VSWR exceeds 3:1'),
  worstVswr: pair('number', 'vswr', 'highest VSWR in the band'),
  worstVswrAtMhz: pair('number', 'mhz', 'frequency of the highest VSWR'),
  worstReturnLossDb: pair('number', 'db', 'lowest return loss in the band (positive dB)'),

  minRadiationEfficiencyPct: pair('number', 'percent', 'lowest radiation efficiency in the band (known only where the data states radiation efficiency)'),
  minRadiationEfficiencyAtMhz: pair('number', 'mhz', 'frequency of the lowest radiation efficiency'),
  avgRadiationEfficiencyPct: pair('number', 'percent', 'radiation efficiency averaged over the band (linear power)'),
  minTotalEfficiencyPct: pair('number', 'percent', 'lowest total efficiency of the antenna in the band: radiation data × (1 − |Γ|²), total data as stated'),
  minTotalEfficiencyAtMhz: pair('number', 'mhz', 'frequency of the lowest total efficiency'),
  avgTotalEfficiencyPct: pair('number', 'percent', 'total efficiency averaged over the band (linear power)'),
  avgTotalEfficiencyDb: pair('number', 'db', 'average total efficiency in dB'),
  efficiencyFromBandAverage: pair(
    'boolean',
    'none',
    "whether some range's efficiency comes from a datasheet figure stated as the band's average: its minimum is then not known, and the average stands for it",
  ),
  minSystemEfficiencyPct: pair('number', 'percent', 'lowest efficiency at the radio port: total efficiency × 10^(−feed loss/10)'),
  minSystemEfficiencyAtMhz: pair('number', 'mhz', 'frequency of the lowest efficiency at the radio port'),
  avgSystemEfficiencyPct: pair('number', 'percent', 'efficiency at the radio port averaged over the band (linear power)'),

  peakGainDbi: pair('number', 'dbi', "highest peak gain (the antenna's gain, mismatch not included) in the band"),
  peakGainAtMhz: pair('number', 'mhz', 'frequency of the highest peak gain'),
  realizedPeakGainDbi: pair('number', 'dbi', 'highest realized gain of the antenna in the band: peak data + 10 log10(1 − |Γ|²), realized data as stated'),
  realizedGainAtRadioPortDbi: pair('number', 'dbi', 'highest realized gain seen at the radio port: realized gain − feed loss'),
  txPeakGainDbi: pair('number', 'dbi', 'highest peak gain over the transmit ranges'),
  gainOverCertifiedDb: pair('number', 'db', 'transmit peak gain minus the certified maximum gain (positive = over)'),
  eirpDbm: pair('number', 'dbm', 'EIRP = transmit power + transmit peak gain − feed loss'),
  erpDbm: pair('number', 'dbm', 'ERP = EIRP − 2.15 dB'),
  regionalLimitDbm: pair('number', 'dbm', 'the tightest regional limit that applies (in its own kind, EIRP or ERP)'),
  regionalLimitKind: pair('string', 'none', 'kind of the tightest limit: eirp, erp, conducted or conducted-gain-rule'),
  regionalLimitRegion: pair('string', 'none', 'region of the tightest limit'),
  regionalLimitSource: pair('string', 'none', 'published source of the tightest limit'),
  regionalRadiatedDbm: pair('number', 'dbm', 'EIRP, ERP or conducted power, as the tightest limit counts it'),
  regionalLimitMarginDb: pair('number', 'db', 'limit minus radiated power (negative = over the limit)'),

  evalGroundPlaneKnown: pair('boolean', 'none', "whether the datasheet states the part's evaluation board size"),
  evalGroundPlaneLengthMm: pair('number', 'mm', "longer side of the part's evaluation board"),
  evalGroundPlaneWidthMm: pair('number', 'mm', "shorter side of the part's evaluation board"),
  groundPlaneVsEvalPct: pair('number', 'percent', 'product ground plane as a share of the evaluation board (worse side)'),
  groundPlaneVsQuarterWavePct: row('number', 'percent', "product ground-plane length as a share of λ/4 at the band's lowest frequency"),
  detuningMarginKnown: pair('boolean', 'none', 'whether a measured S11 covers the band and VSWR ≤ 3:1 holds over all of it, so the detuning margin is known'),
  detuningMarginDownPct: pair(
    'number',
    'percent',
    'largest downward shift of the measured S11 curve (resonance lower) that keeps the whole band at VSWR ≤ 3:1',
  ),
  detuningMarginUpPct: pair('number', 'percent', 'largest upward shift of the measured S11 curve that keeps the whole band at VSWR ≤ 3:1'),
  polarizationLossDb: { ...pair('number', 'db', 'polarization loss between part and required polarization (Balanis §2.12)'), ideal: 0 },
} as const satisfies Record<string, FactDescription>;

export type FactName = keyof typeof FACT_CATALOG;
export const FACT_NAMES = Object.keys(FACT_CATALOG) as FactName[];

export function isFactName(name: string): name is FactName {
  return Object.prototype.hasOwnProperty.call(FACT_CATALOG, name);
}
