/**
 * Coexistence between the radios of one product: where a transmitter's harmonics, the intermodulation products
 * of two transmitters, or a transmit band's own edge land on or near another radio's receive range.
 * Frequency arithmetic only; what a hit means (severity, isolation needed) is the rules' business.
 */

export interface RadioRange {
  readonly radioId: number;
  readonly bandId: number;
  /** How the band is called on screen (e.g. "B13 uplink"), for the message. */
  readonly designation: string;
  readonly fromHz: number;
  readonly toHz: number;
}

export type CoexistenceMechanism = 'harmonic' | 'intermodulation' | 'adjacent';

/** A range of frequencies an aggressor (or a pair) emits into, and how. */
export interface EmissionProduct {
  readonly mechanism: CoexistenceMechanism;
  /** Harmonic number n (2–5), intermodulation order (3 or 5), or 1 for a transmit band's own edge. */
  readonly order: number;
  readonly fromHz: number;
  readonly toHz: number;
  readonly aggressors: readonly RadioRange[];
  /** The expression, in the aggressors' designations, e.g. "2 × B13 uplink" or "2 × A − B". */
  readonly expression: string;
}

export interface CoexistenceHit {
  readonly product: EmissionProduct;
  readonly victim: RadioRange;
  /** Width of the product inside the victim's range (0 when it only comes within the guard). */
  readonly overlapHz: number;
  /** Gap between the product and the victim's range (0 when they overlap). */
  readonly distanceHz: number;
}

export interface CoexistenceInput {
  readonly transmit: readonly RadioRange[];
  readonly receive: readonly RadioRange[];
  /** A product within this distance of a receive range counts: it stands for a receiver's front-end filter. */
  readonly guardHz: number;
  /** Highest harmonic number checked (2 upwards). */
  readonly maxHarmonicOrder: number;
  /** Intermodulation orders checked: 3 and/or 5. */
  readonly intermodulationOrders: readonly number[];
  /** Whether two radios may transmit at the same time (intermodulation needs both on the air). */
  readonly canTransmitTogether: (radioA: number, radioB: number) => boolean;
}

/** The n-th harmonic of a transmit range [f1, f2] occupies [n·f1, n·f2]: it widens with n. */
export function harmonicProduct(range: RadioRange, n: number): EmissionProduct {
  return { mechanism: 'harmonic', order: n, fromHz: n * range.fromHz, toHz: n * range.toHz, aggressors: [range], expression: `${n} × ${range.designation}` };
}

/**
 * Intermodulation products of order 3 (2fa − fb, 2fb − fa, 2fa + fb, 2fb + fa) or 5 (3fa − 2fb, 3fb − 2fa,
 * 3fa + 2fb, 3fb + 2fa) of two transmit ranges (Pozar, Microwave Engineering 4th ed. §10.1, from memory). Over
 * ranges each expression spans its extremes: p·fa − q·fb runs from p·a1 − q·b2 to p·a2 − q·b1. Products wholly
 * at or below 0 Hz are dropped; one that straddles 0 starts at 0.
 */
export function intermodulationProducts(a: RadioRange, b: RadioRange, order: number): EmissionProduct[] {
  if (order !== 3 && order !== 5) throw new RangeError(`intermodulation order ${order} is not 3 or 5`);
  const p = order === 3 ? 2 : 3;
  const q = order === 3 ? 1 : 2;
  const products: EmissionProduct[] = [];
  const add = (fromHz: number, toHz: number, expression: string) => {
    if (toHz <= 0) return;
    products.push({ mechanism: 'intermodulation', order, fromHz: Math.max(fromHz, 0), toHz, aggressors: [a, b], expression });
  };
  const A = a.designation;
  const B = b.designation;
  add(p * a.fromHz - q * b.toHz, p * a.toHz - q * b.fromHz, `${p} × ${A} − ${q === 1 ? '' : `${q} × `}${B}`);
  add(p * b.fromHz - q * a.toHz, p * b.toHz - q * a.fromHz, `${p} × ${B} − ${q === 1 ? '' : `${q} × `}${A}`);
  add(p * a.fromHz + q * b.fromHz, p * a.toHz + q * b.toHz, `${p} × ${A} + ${q === 1 ? '' : `${q} × `}${B}`);
  add(p * b.fromHz + q * a.fromHz, p * b.toHz + q * a.toHz, `${p} × ${B} + ${q === 1 ? '' : `${q} × `}${A}`);
  return products;
}

/** A transmit band's own extent, judged against receive ranges near its edges. */
export function adjacentProduct(range: RadioRange): EmissionProduct {
  return { mechanism: 'adjacent', order: 1, fromHz: range.fromHz, toHz: range.toHz, aggressors: [range], expression: range.designation };
}

function hit(product: EmissionProduct, victim: RadioRange, guardHz: number): CoexistenceHit | null {
  const overlapHz = Math.min(product.toHz, victim.toHz) - Math.max(product.fromHz, victim.fromHz);
  const distanceHz = Math.max(0, victim.fromHz - product.toHz, product.fromHz - victim.toHz);
  if (distanceHz > guardHz) return null;
  return { product, victim, overlapHz: Math.max(0, overlapHz), distanceHz };
}

/**
 * Every product that lands on, or within the guard of, another radio's receive range: harmonics of each
 * transmit range, intermodulation of each pair of ranges of two radios that transmit together, and each
 * transmit range's edges. A radio is never its own victim, and for intermodulation neither aggressor is.
 */
export function findCoexistenceHits(input: CoexistenceInput): CoexistenceHit[] {
  const hits: CoexistenceHit[] = [];
  const victimsOf = (product: EmissionProduct) => {
    for (const victim of input.receive) {
      if (product.aggressors.some((aggressor) => aggressor.radioId === victim.radioId)) continue;
      const found = hit(product, victim, input.guardHz);
      if (found) hits.push(found);
    }
  };
  for (const range of input.transmit) {
    for (let n = 2; n <= input.maxHarmonicOrder; n++) victimsOf(harmonicProduct(range, n));
    victimsOf(adjacentProduct(range));
  }
  for (let i = 0; i < input.transmit.length; i++) {
    for (let j = i + 1; j < input.transmit.length; j++) {
      const a = input.transmit[i];
      const b = input.transmit[j];
      if (a.radioId === b.radioId || !input.canTransmitTogether(a.radioId, b.radioId)) continue;
      for (const order of input.intermodulationOrders) for (const product of intermodulationProducts(a, b, order)) victimsOf(product);
    }
  }
  return hits;
}

export interface IsolationBudget {
  /** The aggressor's transmit power at its antenna port, dBm. */
  readonly aggressorPowerDbm: number;
  /** Typical level of the mechanism's emission relative to the carrier, dBc (negative). */
  readonly emissionDbc: number;
  /** The interference level the victim tolerates in its band, dBm. */
  readonly victimTolerableDbm: number;
}

/**
 * Antenna-to-antenna isolation needed so the emission reaches the victim below what it tolerates:
 * (P_tx + emission level) − tolerable level, in dB. A plain power budget with the assumptions as parameters.
 */
export function requiredIsolationDb(budget: IsolationBudget): number {
  return budget.aggressorPowerDbm + budget.emissionDbc - budget.victimTolerableDbm;
}
