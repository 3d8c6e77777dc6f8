import { type Resonance, s11Curve } from '../../parts/demo/resonator-model';
import { evenlySpacedFrequencies } from '../../rf/curves';
import { writeTouchstone } from '../../rf/touchstone-writer';
import type { AntennaRole } from './antenna-roles';

/**
 * An invented 4-port measurement of the demo cold-chain gateway's antennas in their plastic housing
 * (not a measurement). Each port's S11 comes from the resonator models the demo parts use; the coupling
 * between two ports follows where both radiate: |Sij| = k·√((1−|Sii|²)(1−|Sjj|²)) with a free-space path
 * delay e^(−j2πf·d/c). S is symmetric (reciprocal) and scaled so every column's magnitude sum stays
 * below 1, which bounds its largest singular value below 1 (passive; ‖S‖₂ ≤ √(‖S‖₁‖S‖∞)).
 */
export interface DemoAntenna {
  readonly radioId: number;
  readonly role: AntennaRole;
  readonly label: string;
  readonly resonances: readonly Resonance[];
}

export const DEMO_ASSEMBLY_PRODUCT_ID = 2;
export const DEMO_ASSEMBLY_FILE_NAME = 'cold-chain-gateway-housing.s4p';

export const DEMO_ANTENNAS: readonly DemoAntenna[] = [
  {
    radioId: 21,
    role: 'main',
    label: 'LTE main',
    resonances: [
      { fromMhz: 698, toMhz: 960, edgeVswr: 3.2 },
      { fromMhz: 1710, toMhz: 2690, edgeVswr: 3 },
    ],
  },
  {
    radioId: 21,
    role: 'diversity',
    label: 'LTE diversity',
    resonances: [
      { fromMhz: 740, toMhz: 960, edgeVswr: 3.5 },
      { fromMhz: 1710, toMhz: 2200, edgeVswr: 3 },
    ],
  },
  {
    radioId: 22,
    role: 'main',
    label: 'Wi-Fi',
    resonances: [
      { fromMhz: 2400, toMhz: 2500, edgeVswr: 2.5 },
      { fromMhz: 5150, toMhz: 5850, edgeVswr: 2.5 },
    ],
  },
  { radioId: 23, role: 'main', label: 'LoRa', resonances: [{ fromMhz: 855, toMhz: 935, edgeVswr: 2.5 }] },
];

/** Coupling factor k and spacing d (mm) of each pair (row < column), invented for a 200 × 120 mm housing. */
const COUPLING: Readonly<Record<string, { k: number; spacingMm: number }>> = {
  '1-2': { k: 0.3, spacingMm: 110 },
  '1-3': { k: 0.12, spacingMm: 150 },
  '1-4': { k: 0.25, spacingMm: 90 },
  '2-3': { k: 0.1, spacingMm: 60 },
  '2-4': { k: 0.2, spacingMm: 130 },
  '3-4': { k: 0.08, spacingMm: 100 },
};

const SPEED_OF_LIGHT_MM_PER_S = 299_792_458_000;
/** Largest column sum of |Sij| allowed; under 1 keeps the network strictly passive. */
const PASSIVITY_MARGIN = 0.98;

export const DEMO_SWEEP = { fromHz: 600e6, toHz: 6000e6, points: 541 };

export interface DemoNetwork {
  readonly frequenciesHz: number[];
  /** Row-major S-matrix: element (row − 1)·4 + (column − 1). */
  readonly data: { re: number[]; im: number[] }[];
}

export function demoAssemblyNetwork(): DemoNetwork {
  const frequenciesHz = [...evenlySpacedFrequencies(DEMO_SWEEP.fromHz, DEMO_SWEEP.toHz, DEMO_SWEEP.points)];
  const n = DEMO_ANTENNAS.length;
  const reflections = DEMO_ANTENNAS.map((a) => s11Curve(a.resonances, frequenciesHz));
  const data = Array.from({ length: n * n }, () => ({
    re: new Array<number>(frequenciesHz.length).fill(0),
    im: new Array<number>(frequenciesHz.length).fill(0),
  }));
  frequenciesHz.forEach((f, p) => {
    const matrix = Array.from({ length: n }, () => Array.from({ length: n }, () => ({ re: 0, im: 0 })));
    for (let i = 0; i < n; i++) matrix[i][i] = { re: reflections[i].re[p], im: reflections[i].im[p] };
    for (let i = 0; i < n; i++) {
      for (let j = i + 1; j < n; j++) {
        const { k, spacingMm } = COUPLING[`${i + 1}-${j + 1}`];
        const radiatedI = 1 - matrix[i][i].re ** 2 - matrix[i][i].im ** 2;
        const radiatedJ = 1 - matrix[j][j].re ** 2 - matrix[j][j].im ** 2;
        const magnitude = k * Math.sqrt(Math.max(0, radiatedI * radiatedJ));
        const phase = (-2 * Math.PI * f * spacingMm) / SPEED_OF_LIGHT_MM_PER_S;
        matrix[i][j] = matrix[j][i] = { re: magnitude * Math.cos(phase), im: magnitude * Math.sin(phase) };
      }
    }
    const largestColumnSum = Math.max(...matrix.map((_, j) => matrix.reduce((sum, row) => sum + Math.hypot(row[j].re, row[j].im), 0)));
    const scale = largestColumnSum > PASSIVITY_MARGIN ? PASSIVITY_MARGIN / largestColumnSum : 1;
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        data[i * n + j].re[p] = matrix[i][j].re * scale;
        data[i * n + j].im[p] = matrix[i][j].im * scale;
      }
    }
  });
  return { frequenciesHz, data };
}

const number = (value: number) => String(Number(value.toPrecision(9)));

/** The demo file as an instrument would write it: Touchstone 1.0, RI, MHz. */
export function demoAssemblyFile(): string {
  const network = demoAssemblyNetwork();
  return writeTouchstone({
    version: 1,
    ports: DEMO_ANTENNAS.length,
    frequencyUnit: 'MHz',
    format: 'RI',
    frequenciesHz: network.frequenciesHz,
    data: network.data,
    formatNumber: number,
    comments: [
      'Cold-chain gateway, antennas in the plastic housing - invented demo data (resonator and coupling model), not a measurement',
      ...DEMO_ANTENNAS.map((a, i) => `port ${i + 1}: ${a.label}`),
    ],
  });
}
