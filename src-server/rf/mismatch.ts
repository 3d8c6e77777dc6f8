import { type Complex, add, angleDeg, complex, div, magnitude, mul, sub } from './complex';

// Pozar, Microwave Engineering 4th ed., §2.3: every quantity here is a function of |Γ| alone.

export function vswrFromGammaMagnitude(gammaMagnitude: number): number {
  if (gammaMagnitude >= 1) return Infinity;
  return (1 + gammaMagnitude) / (1 - gammaMagnitude);
}

export function gammaMagnitudeFromVswr(vswr: number): number {
  if (!(vswr >= 1)) throw new RangeError(`VSWR must be at least 1, got ${vswr}`);
  if (vswr === Infinity) return 1;
  return (vswr - 1) / (vswr + 1);
}

/** Return loss as a positive number of dB (S11 in dB is its negative). */
export function returnLossDbFromGammaMagnitude(gammaMagnitude: number): number {
  return -20 * Math.log10(gammaMagnitude);
}

export function gammaMagnitudeFromReturnLossDb(returnLossDb: number): number {
  return 10 ** (-returnLossDb / 20);
}

export function vswrFromReturnLossDb(returnLossDb: number): number {
  return vswrFromGammaMagnitude(gammaMagnitudeFromReturnLossDb(returnLossDb));
}

export function returnLossDbFromVswr(vswr: number): number {
  return returnLossDbFromGammaMagnitude(gammaMagnitudeFromVswr(vswr));
}

/** Fraction of incident power delivered to the load: 1 − |Γ|². */
export function transmittedFractionFromGammaMagnitude(gammaMagnitude: number): number {
  return 1 - gammaMagnitude * gammaMagnitude;
}

export function reflectedFractionFromGammaMagnitude(gammaMagnitude: number): number {
  return gammaMagnitude * gammaMagnitude;
}

/** Mismatch loss −10 log10(1 − |Γ|²), positive dB. */
export function mismatchLossDbFromGammaMagnitude(gammaMagnitude: number): number {
  return -10 * Math.log10(transmittedFractionFromGammaMagnitude(gammaMagnitude));
}

function toComplex(z: Complex | number): Complex {
  return typeof z === 'number' ? complex(z) : z;
}

/** Γ = (Z − Z0)/(Z + Z0); a complex Z0 is accepted (pseudo-wave definition). */
export function gammaFromImpedance(impedanceOhms: Complex, referenceOhms: Complex | number = 50): Complex {
  const z0 = toComplex(referenceOhms);
  return div(sub(impedanceOhms, z0), add(impedanceOhms, z0));
}

/** Z = Z0 (1 + Γ)/(1 − Γ); Γ = 1 gives an infinite impedance. */
export function impedanceFromGamma(gamma: Complex, referenceOhms: Complex | number = 50): Complex {
  const z0 = toComplex(referenceOhms);
  const one = complex(1);
  return mul(z0, div(add(one, gamma), sub(one, gamma)));
}

export interface ReflectionSummary {
  readonly gammaMagnitude: number;
  readonly gammaAngleDeg: number;
  readonly vswr: number;
  readonly returnLossDb: number;
  readonly mismatchLossDb: number;
  readonly transmittedFraction: number;
}

export function summarizeReflection(gamma: Complex): ReflectionSummary {
  const gammaMagnitude = magnitude(gamma);
  return {
    gammaMagnitude,
    gammaAngleDeg: angleDeg(gamma),
    vswr: vswrFromGammaMagnitude(gammaMagnitude),
    returnLossDb: returnLossDbFromGammaMagnitude(gammaMagnitude),
    mismatchLossDb: mismatchLossDbFromGammaMagnitude(gammaMagnitude),
    transmittedFraction: transmittedFractionFromGammaMagnitude(gammaMagnitude),
  };
}
