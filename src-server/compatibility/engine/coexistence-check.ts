import { type CoexistenceHit, type CoexistenceMechanism, type RadioRange, findCoexistenceHits, requiredIsolationDb } from '../../rf/coexistence';
import { powerRatioToDb } from '../../rf/units';
import type { RadioBandRequirement, Severity, Technology } from './types';

/** The coexistence rule (rules/coexistence/coexistence.json): thresholds and assumptions as parameters, never code. */
export interface CoexistenceRule {
  readonly id: string;
  readonly title: string;
  readonly description: string;
  readonly version: number;
  readonly source: string;
  readonly parameters: {
    readonly guardMhz: number;
    readonly maxHarmonicOrder: number;
    readonly intermodulationOrders: readonly number[];
    readonly thermalNoiseDbmPerHz: number;
    readonly interferenceToNoiseDb: number;
  };
  /** Emission level relative to the carrier, dBc, per mechanism and order. */
  readonly emissionDbc: Readonly<Record<CoexistenceMechanism, Readonly<Record<string, number>>>>;
  /** The victim receiver per technology: channel bandwidth and noise figure. */
  readonly victims: Readonly<Record<Technology, { readonly bandwidthMhz: number; readonly noiseFigureDb: number }>>;
  readonly severities: {
    readonly overlapIsolationUnknown: Severity;
    readonly nearIsolationUnknown: Severity;
    readonly isolationShort: Severity;
    readonly isolationMet: Severity;
  };
}

export interface CoexistenceEnd {
  readonly radioId: number;
  readonly bandId: number;
  readonly designation: string;
}

export interface CoexistenceFinding {
  readonly aggressor: CoexistenceEnd;
  /** The second transmitter of an intermodulation product; null for harmonics and adjacency. */
  readonly secondAggressor: CoexistenceEnd | null;
  readonly victim: CoexistenceEnd;
  readonly mechanism: CoexistenceMechanism;
  readonly order: number;
  readonly expression: string;
  readonly fromMhz: number;
  readonly toMhz: number;
  readonly victimFromMhz: number;
  readonly victimToMhz: number;
  readonly overlapMhz: number;
  readonly distanceMhz: number;
  readonly severity: Severity;
  readonly message: string;
  readonly aggressorPowerDbm: number;
  readonly emissionDbc: number;
  readonly victimTolerableDbm: number;
  readonly requiredIsolationDb: number;
  /** In-product antenna-to-antenna isolation between the two radios; null when unknown (never assumed). */
  readonly isolationDb: number | null;
  /** isolationDb − requiredIsolationDb; null when the isolation is unknown. */
  readonly isolationMarginDb: number | null;
}

/** In-product isolation between two radios' antennas at a frequency, dB; null when not measured. */
export type IsolationLookup = (aggressorRadioId: number, victimRadioId: number, atHz: number) => number | null;

export const NO_ISOLATION_DATA: IsolationLookup = () => null;

const MHZ = 1e6;

/** Roles the radio transmits on: uplink, TDD and shared ranges, and only when it has a transmit power. */
export function transmitRangesOf(requirement: RadioBandRequirement): RadioRange[] {
  if (requirement.txPowerDbm === null) return [];
  return requirement.ranges
    .filter((r) => r.role === 'uplink' || r.role === 'tdd' || r.role === 'transmit-receive')
    .map((r) => ({ radioId: requirement.radioId, bandId: requirement.bandId, designation: requirement.designation, fromHz: r.fromHz, toHz: r.toHz }));
}

/** Roles the radio listens on: downlink, TDD, receive-only (GNSS) and shared ranges. */
export function receiveRangesOf(requirement: RadioBandRequirement): RadioRange[] {
  return requirement.ranges
    .filter((r) => r.role === 'downlink' || r.role === 'tdd' || r.role === 'receive' || r.role === 'transmit-receive')
    .map((r) => ({ radioId: requirement.radioId, bandId: requirement.bandId, designation: requirement.designation, fromHz: r.fromHz, toHz: r.toHz }));
}

/** Tolerable interference at the victim: thermal noise over its bandwidth, plus its noise figure, plus the allowed I/N, dBm. */
export function victimTolerableDbm(rule: CoexistenceRule, technology: Technology): number {
  const victim = rule.victims[technology];
  return rule.parameters.thermalNoiseDbmPerHz + powerRatioToDb(victim.bandwidthMhz * MHZ) + victim.noiseFigureDb + rule.parameters.interferenceToNoiseDb;
}

/** A pair set (null: every radio with every other) as the check's predicate. */
export function simultaneousTransmitPredicate(pairs: readonly (readonly number[])[] | null): (a: number, b: number) => boolean {
  if (pairs === null) return () => true;
  const allowed = new Set(pairs.map(([a, b]) => `${Math.min(a, b)},${Math.max(a, b)}`));
  return (a, b) => allowed.has(`${Math.min(a, b)},${Math.max(a, b)}`);
}

const round = (value: number, digits = 3) => Math.round(value * 10 ** digits) / 10 ** digits;
const mhzText = (hz: number) => String(round(hz / MHZ));
const MECHANISM_WORDS: Record<CoexistenceMechanism, string> = { harmonic: 'harmonic', intermodulation: 'intermodulation product', adjacent: 'transmit band' };

function ordinal(n: number): string {
  return n === 2 ? '2nd' : n === 3 ? '3rd' : `${n}th`;
}

/**
 * Coexistence findings of one product: every harmonic, intermodulation product and transmit edge that lands on or
 * within the guard of another radio's receive range, each with the isolation it needs and, where known, the margin.
 */
export function checkCoexistence(
  requirements: readonly RadioBandRequirement[],
  rule: CoexistenceRule,
  options: { simultaneousTransmit: readonly (readonly number[])[] | null; isolation?: IsolationLookup },
): CoexistenceFinding[] {
  const isolationOf = options.isolation ?? NO_ISOLATION_DATA;
  const radios = new Map(requirements.map((r) => [r.radioId, r]));
  const hits = findCoexistenceHits({
    transmit: requirements.flatMap(transmitRangesOf),
    receive: requirements.flatMap(receiveRangesOf),
    guardHz: rule.parameters.guardMhz * MHZ,
    maxHarmonicOrder: rule.parameters.maxHarmonicOrder,
    intermodulationOrders: rule.parameters.intermodulationOrders,
    canTransmitTogether: simultaneousTransmitPredicate(options.simultaneousTransmit),
  });
  // Adjacency is about a neighbouring band: two radios sharing one band (BLE and Wi-Fi at 2.4 GHz) take turns on the air, which antenna isolation does not settle.
  const judged = hits.filter((hit) => hit.product.mechanism !== 'adjacent' || hit.overlapHz === 0);
  return judged.map((hit) => findingOf(hit, rule, radios, isolationOf));
}

function findingOf(
  hit: CoexistenceHit,
  rule: CoexistenceRule,
  radios: ReadonlyMap<number, RadioBandRequirement>,
  isolationOf: IsolationLookup,
): CoexistenceFinding {
  const { product, victim } = hit;
  const end = (r: RadioRange): CoexistenceEnd => ({ radioId: r.radioId, bandId: r.bandId, designation: r.designation });
  // Intermodulation is quoted against the stronger of the two carriers.
  const aggressor = product.aggressors.reduce((a, b) =>
    (radios.get(b.radioId)!.txPowerDbm ?? -Infinity) > (radios.get(a.radioId)!.txPowerDbm ?? -Infinity) ? b : a,
  );
  const second = product.aggressors.find((a) => a !== aggressor) ?? null;
  const aggressorPowerDbm = radios.get(aggressor.radioId)!.txPowerDbm!;
  const emissionDbc = rule.emissionDbc[product.mechanism][String(product.order)];
  const tolerable = victimTolerableDbm(rule, radios.get(victim.radioId)!.technology);
  const required = requiredIsolationDb({ aggressorPowerDbm, emissionDbc, victimTolerableDbm: tolerable });
  const centreHz = (Math.max(product.fromHz, victim.fromHz) + Math.min(product.toHz, victim.toHz)) / 2;
  const isolationDb = isolationOf(aggressor.radioId, victim.radioId, centreHz);
  const margin = isolationDb === null ? null : isolationDb - required;
  const overlaps = hit.overlapHz > 0 || hit.distanceHz === 0;
  const severity =
    margin !== null
      ? margin >= 0
        ? rule.severities.isolationMet
        : rule.severities.isolationShort
      : overlaps
        ? rule.severities.overlapIsolationUnknown
        : rule.severities.nearIsolationUnknown;
  const what =
    product.mechanism === 'adjacent' ? `${product.expression}` : `${ordinal(product.order)}-order ${MECHANISM_WORDS[product.mechanism]} ${product.expression}`;
  const where = overlaps
    ? `falls on ${victim.designation} (${mhzText(victim.fromHz)}–${mhzText(victim.toHz)} MHz) over ${mhzText(hit.overlapHz)} MHz`
    : `comes within ${mhzText(hit.distanceHz)} MHz of ${victim.designation} (${mhzText(victim.fromHz)}–${mhzText(victim.toHz)} MHz)`;
  const isolationText =
    isolationDb === null
      ? `needs ${round(required, 1)} dB antenna isolation; the in-product isolation is unknown`
      : `needs ${round(required, 1)} dB antenna isolation; the product has ${round(isolationDb, 1)} dB (margin ${round(margin!, 1)} dB)`;
  return {
    aggressor: end(aggressor),
    secondAggressor: second ? end(second) : null,
    victim: end(victim),
    mechanism: product.mechanism,
    order: product.order,
    expression: product.expression,
    fromMhz: round(product.fromHz / MHZ, 6),
    toMhz: round(product.toHz / MHZ, 6),
    victimFromMhz: round(victim.fromHz / MHZ, 6),
    victimToMhz: round(victim.toHz / MHZ, 6),
    overlapMhz: round(hit.overlapHz / MHZ, 6),
    distanceMhz: round(hit.distanceHz / MHZ, 6),
    severity,
    message: `${what} (${mhzText(product.fromHz)}–${mhzText(product.toHz)} MHz) ${where}; ${isolationText}`,
    aggressorPowerDbm,
    emissionDbc,
    victimTolerableDbm: round(tolerable, 6),
    requiredIsolationDb: round(required, 6),
    isolationDb,
    isolationMarginDb: margin === null ? null : round(margin, 6),
  };
}
