import { type Complex, add, complex, inverse, magnitude } from './complex';
import { type BandResult, type FrequencyRange, bandOutsideData, evenlySpacedFrequencies, interpolateAt } from './curves';
import { gammaFromImpedance, returnLossDbFromGammaMagnitude, vswrFromGammaMagnitude } from './mismatch';
import { type PreferredSeries, snapToPreferredValue } from './preferred-values';

/**
 * Lossless L-section matching of a complex load to a real Z0 at one frequency
 * (Pozar, Microwave Engineering 4th ed., §5.1). Worked in admittance/impedance form so that
 * both topologies and their ± roots come from one square root each.
 */

export type Connection = 'series' | 'shunt';
/** Side of the L-section the element sits on: next to the load, or next to the source (the Z0 line). */
export type Position = 'load-side' | 'source-side';

export type Component =
  | { readonly kind: 'inductor'; readonly inductanceNh: number }
  | { readonly kind: 'capacitor'; readonly capacitancePf: number }
  /** A series element of zero reactance (a short) or a shunt element of zero susceptance (left open). */
  | { readonly kind: 'none' };

export interface MatchingElement {
  readonly connection: Connection;
  readonly position: Position;
  readonly component: Component;
}

/** `shunt-at-load`: Pozar Fig. 5.2a (needs Re Y_L ≤ 1/Z0); `series-at-load`: Fig. 5.2b (needs R_L ≤ Z0). */
export type LSectionTopology = 'shunt-at-load' | 'series-at-load';

export interface LSectionNetwork {
  readonly topology: LSectionTopology;
  /** Load-side element first. */
  readonly elements: readonly [MatchingElement, MatchingElement];
}

const NEGLIGIBLE = 1e-12;

function angular(frequencyHz: number): number {
  return 2 * Math.PI * frequencyHz;
}

function seriesComponent(reactanceOhms: number, frequencyHz: number, scaleOhms: number): Component {
  if (Math.abs(reactanceOhms) <= NEGLIGIBLE * scaleOhms) return { kind: 'none' };
  const omega = angular(frequencyHz);
  return reactanceOhms > 0
    ? { kind: 'inductor', inductanceNh: (reactanceOhms / omega) * 1e9 }
    : { kind: 'capacitor', capacitancePf: (-1 / (omega * reactanceOhms)) * 1e12 };
}

function shuntComponent(susceptanceSiemens: number, frequencyHz: number, scaleOhms: number): Component {
  if (Math.abs(susceptanceSiemens) * scaleOhms <= NEGLIGIBLE) return { kind: 'none' };
  const omega = angular(frequencyHz);
  return susceptanceSiemens > 0
    ? { kind: 'capacitor', capacitancePf: (susceptanceSiemens / omega) * 1e12 }
    : { kind: 'inductor', inductanceNh: (-1 / (omega * susceptanceSiemens)) * 1e9 };
}

/** Impedance of a series element (or admittance of a shunt one) at a frequency. */
function elementImmittance(element: MatchingElement, frequencyHz: number): Complex | null {
  const omega = angular(frequencyHz);
  const c = element.component;
  if (c.kind === 'none') return null;
  if (element.connection === 'series') {
    return c.kind === 'inductor' ? complex(0, omega * c.inductanceNh * 1e-9) : complex(0, -1 / (omega * c.capacitancePf * 1e-12));
  }
  return c.kind === 'capacitor' ? complex(0, omega * c.capacitancePf * 1e-12) : complex(0, -1 / (omega * c.inductanceNh * 1e-9));
}

/** Impedance seen from the source side of the network with the given load. */
export function inputImpedance(network: LSectionNetwork, loadOhms: Complex, frequencyHz: number): Complex {
  let z = loadOhms;
  for (const element of network.elements) {
    const immittance = elementImmittance(element, frequencyHz);
    if (!immittance) continue;
    z = element.connection === 'series' ? add(z, immittance) : inverse(add(inverse(z), immittance));
  }
  return z;
}

function sameNetwork(a: LSectionNetwork, b: LSectionNetwork): boolean {
  return JSON.stringify(a) === JSON.stringify(b);
}

/**
 * Every lossless L-section that matches the load to Z0 at the frequency: two per feasible topology,
 * the topology Pozar recommends first (shunt-at-load when R_L > Z0, else series-at-load). When a
 * square root is zero the two solutions coincide and only one is returned.
 */
export function lSectionSolutions(loadOhms: Complex, z0Ohms: number, frequencyHz: number): LSectionNetwork[] {
  if (!(loadOhms.re > 0)) throw new RangeError(`a lossless L-section needs a load with positive resistance, got ${loadOhms.re} Ω`);
  if (!(z0Ohms > 0) || !(frequencyHz > 0)) throw new RangeError('Z0 and the frequency must be positive');
  const shuntAtLoad: LSectionNetwork[] = [];
  const seriesAtLoad: LSectionNetwork[] = [];
  const loadAdmittance = inverse(loadOhms);
  const g = loadAdmittance.re;
  // Shunt B next to the load: Re 1/(G + j(B_L + B)) = Z0  ⇒  (B_L + B)² = G/Z0 − G².
  const shuntDiscriminant = g / z0Ohms - g * g;
  if (shuntDiscriminant >= -NEGLIGIBLE * g * g) {
    const root = Math.sqrt(Math.max(0, shuntDiscriminant));
    for (const sign of [1, -1]) {
      const susceptance = -loadAdmittance.im + sign * root;
      const afterShunt = inverse(complex(g, loadAdmittance.im + susceptance));
      shuntAtLoad.push({
        topology: 'shunt-at-load',
        elements: [
          { connection: 'shunt', position: 'load-side', component: shuntComponent(susceptance, frequencyHz, z0Ohms) },
          { connection: 'series', position: 'source-side', component: seriesComponent(-afterShunt.im, frequencyHz, z0Ohms) },
        ],
      });
    }
  }
  // Series X next to the load: Re 1/(R_L + j(X_L + X)) = 1/Z0  ⇒  (X_L + X)² = R_L Z0 − R_L².
  const seriesDiscriminant = loadOhms.re * z0Ohms - loadOhms.re * loadOhms.re;
  if (seriesDiscriminant >= -NEGLIGIBLE * z0Ohms * z0Ohms) {
    const root = Math.sqrt(Math.max(0, seriesDiscriminant));
    for (const sign of [1, -1]) {
      const reactance = -loadOhms.im + sign * root;
      const afterSeries = inverse(complex(loadOhms.re, loadOhms.im + reactance));
      seriesAtLoad.push({
        topology: 'series-at-load',
        elements: [
          { connection: 'series', position: 'load-side', component: seriesComponent(reactance, frequencyHz, z0Ohms) },
          { connection: 'shunt', position: 'source-side', component: shuntComponent(-afterSeries.im, frequencyHz, z0Ohms) },
        ],
      });
    }
  }
  const ordered = loadOhms.re > z0Ohms ? [...shuntAtLoad, ...seriesAtLoad] : [...seriesAtLoad, ...shuntAtLoad];
  return ordered.filter((network, k) => ordered.findIndex((other) => sameNetwork(other, network)) === k);
}

function snapComponent(component: Component, series: PreferredSeries): Component {
  if (component.kind === 'inductor') return { kind: 'inductor', inductanceNh: snapToPreferredValue(component.inductanceNh, series) };
  if (component.kind === 'capacitor') return { kind: 'capacitor', capacitancePf: snapToPreferredValue(component.capacitancePf, series) };
  return component;
}

/** The same network with every L and C replaced by its nearest E12/E24 value (IEC 60063). */
export function snapNetwork(network: LSectionNetwork, series: PreferredSeries): LSectionNetwork {
  const [loadSide, sourceSide] = network.elements;
  return {
    topology: network.topology,
    elements: [
      { ...loadSide, component: snapComponent(loadSide.component, series) },
      { ...sourceSide, component: snapComponent(sourceSide.component, series) },
    ],
  };
}

/** A measured load impedance over frequency; R and X are interpolated linearly. */
export interface ImpedanceCurve {
  readonly frequenciesHz: ArrayLike<number>;
  readonly resistanceOhms: ArrayLike<number>;
  readonly reactanceOhms: ArrayLike<number>;
}

export interface SweepPoint {
  readonly frequencyHz: number;
  readonly returnLossDb: number;
  readonly vswr: number;
}

function isImpedanceCurve(load: Complex | ImpedanceCurve): load is ImpedanceCurve {
  return 'frequenciesHz' in load;
}

/**
 * Return loss of the matched load over the frequencies. A single impedance is taken as constant
 * over the sweep (a first estimate only); a measured curve is interpolated, and a sweep leaving
 * its range is "no data".
 */
export function returnLossSweep(
  network: LSectionNetwork,
  load: Complex | ImpedanceCurve,
  z0Ohms: number,
  frequenciesHz: ArrayLike<number>,
): BandResult<{ readonly points: readonly SweepPoint[] }> {
  if (isImpedanceCurve(load) && frequenciesHz.length > 0) {
    const outside = bandOutsideData(load.frequenciesHz, { fromHz: frequenciesHz[0], toHz: frequenciesHz[frequenciesHz.length - 1] });
    if (outside) return outside;
  }
  const points: SweepPoint[] = [];
  for (let k = 0; k < frequenciesHz.length; k++) {
    const frequencyHz = frequenciesHz[k];
    const loadAtFrequency = isImpedanceCurve(load)
      ? complex(
          interpolateAt({ frequenciesHz: load.frequenciesHz, values: load.resistanceOhms }, frequencyHz)!,
          interpolateAt({ frequenciesHz: load.frequenciesHz, values: load.reactanceOhms }, frequencyHz)!,
        )
      : load;
    const gammaMagnitude = magnitude(gammaFromImpedance(inputImpedance(network, loadAtFrequency, frequencyHz), z0Ohms));
    points.push({ frequencyHz, returnLossDb: returnLossDbFromGammaMagnitude(gammaMagnitude), vswr: vswrFromGammaMagnitude(gammaMagnitude) });
  }
  return { status: 'ok', points };
}

export interface MatchingRequest {
  readonly frequencyHz: number;
  /** The load at the design frequency. */
  readonly loadOhms: Complex;
  readonly z0Ohms: number;
  readonly series: PreferredSeries;
  readonly sweep?: FrequencyRange & { readonly points?: number };
  /** Measured load over frequency for the sweep; without it the load is assumed constant. */
  readonly loadCurve?: ImpedanceCurve;
}

export interface MatchingSolution {
  readonly exact: LSectionNetwork;
  readonly snapped: LSectionNetwork;
  /** Return loss of the snapped network at the design frequency. */
  readonly snappedReturnLossDb: number;
  readonly exactSweep?: BandResult<{ readonly points: readonly SweepPoint[] }>;
  readonly snappedSweep?: BandResult<{ readonly points: readonly SweepPoint[] }>;
}

/** The matching starting point: all L-section solutions, exact and snapped, with their sweeps. */
export function designLSectionMatch(request: MatchingRequest): readonly MatchingSolution[] {
  const frequencies = request.sweep ? evenlySpacedFrequencies(request.sweep.fromHz, request.sweep.toHz, request.sweep.points ?? 201) : undefined;
  const sweepLoad = request.loadCurve ?? request.loadOhms;
  return lSectionSolutions(request.loadOhms, request.z0Ohms, request.frequencyHz).map((exact) => {
    const snapped = snapNetwork(exact, request.series);
    const snappedGamma = magnitude(gammaFromImpedance(inputImpedance(snapped, request.loadOhms, request.frequencyHz), request.z0Ohms));
    return {
      exact,
      snapped,
      snappedReturnLossDb: returnLossDbFromGammaMagnitude(snappedGamma),
      ...(frequencies
        ? {
            exactSweep: returnLossSweep(exact, sweepLoad, request.z0Ohms, frequencies),
            snappedSweep: returnLossSweep(snapped, sweepLoad, request.z0Ohms, frequencies),
          }
        : {}),
    };
  });
}
