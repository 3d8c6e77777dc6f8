import { type Complex, add, complex, div, mul, sub } from '../complex';
import { TouchstoneError } from './errors';
import type { ComplexSeries, DataFormat, FrequencyUnit, MatrixFormat, NetworkParameter, TouchstoneNetwork, TwoPortDataOrder } from './types';
import { FREQUENCY_UNIT_HZ } from './types';

/** Network assembly: data points into per-element series, converted to S against the reference resistances. */

const DEG_TO_RAD = Math.PI / 180;

/**
 * Where each complex pair of a data point goes in the row-major matrix; mirrored pairs fill symmetric cells.
 * Full data are row-major except version-1 style 2-port data (21_12); Lower holds columns 1..i of row i and
 * Upper columns i..N (Touchstone 2.0, [Matrix Format]).
 */
export function pairLayout(ports: number, order: TwoPortDataOrder, matrixFormat: MatrixFormat): { targets: number[]; mirrors: [number, number][] } {
  if (ports === 2 && matrixFormat === 'Full' && order === '21_12') return { targets: [0, 2, 1, 3], mirrors: [] };
  const targets: number[] = [];
  const mirrors: [number, number][] = [];
  for (let row = 0; row < ports; row++) {
    const first = matrixFormat === 'Upper' ? row : 0;
    const last = matrixFormat === 'Lower' ? row : ports - 1;
    for (let column = first; column <= last; column++) {
      targets.push(row * ports + column);
      if (column !== row && matrixFormat !== 'Full') mirrors.push([row * ports + column, column * ports + row]);
    }
  }
  return { targets, mirrors };
}

class PointStore {
  capacity: number;
  length = 0;
  frequenciesHz: Float64Array;
  lines: Int32Array;
  re: Float64Array[];
  im: Float64Array[];

  constructor(
    readonly elements: number,
    initialCapacity: number,
  ) {
    this.capacity = Math.max(16, initialCapacity);
    this.frequenciesHz = new Float64Array(this.capacity);
    this.lines = new Int32Array(this.capacity);
    this.re = Array.from({ length: elements }, () => new Float64Array(this.capacity));
    this.im = Array.from({ length: elements }, () => new Float64Array(this.capacity));
  }

  grow(): void {
    const capacity = this.capacity * 2;
    const copy = (a: Float64Array): Float64Array => {
      const b = new Float64Array(capacity);
      b.set(a);
      return b;
    };
    this.frequenciesHz = copy(this.frequenciesHz);
    const lines = new Int32Array(capacity);
    lines.set(this.lines);
    this.lines = lines;
    this.re = this.re.map(copy);
    this.im = this.im.map(copy);
    this.capacity = capacity;
  }

  series(): ComplexSeries[] {
    return this.re.map((re, k) => ({ re: re.slice(0, this.length), im: this.im[k].slice(0, this.length) }));
  }
}

const ONE = complex(1);

/** 2×2 complex matrix, row-major [a11, a12, a21, a22]. */
type Matrix2 = [Complex, Complex, Complex, Complex];

function inverse2(m: Matrix2): Matrix2 {
  const det = sub(mul(m[0], m[3]), mul(m[1], m[2]));
  return [div(m[3], det), div(scaleNeg(m[1]), det), div(scaleNeg(m[2]), det), div(m[0], det)];
}

function scaleNeg(a: Complex): Complex {
  return { re: -a.re, im: -a.im };
}

function multiply2(a: Matrix2, b: Matrix2): Matrix2 {
  return [
    add(mul(a[0], b[0]), mul(a[1], b[2])),
    add(mul(a[0], b[1]), mul(a[1], b[3])),
    add(mul(a[2], b[0]), mul(a[3], b[2])),
    add(mul(a[2], b[1]), mul(a[3], b[3])),
  ];
}

/**
 * Converts one point of normalised Z, Y, H or G data to S (Pozar, Microwave Engineering 4th ed.,
 * §4.3 and Table 4.2): S = (z − I)(z + I)⁻¹, S = (I − y)(I + y)⁻¹; H and G through the hybrid formulas.
 */
function normalisedToS(parameter: NetworkParameter, ports: number, n: Complex[]): Complex[] {
  if (ports === 1) {
    if (parameter === 'Z') return [div(sub(n[0], ONE), add(n[0], ONE))];
    return [div(sub(ONE, n[0]), add(ONE, n[0]))];
  }
  const m: Matrix2 = [n[0], n[1], n[2], n[3]];
  const identity: Matrix2 = [ONE, complex(0), complex(0), ONE];
  if (parameter === 'Z') {
    return multiply2(m.map((v, k) => sub(v, identity[k])) as Matrix2, inverse2(m.map((v, k) => add(v, identity[k])) as Matrix2));
  }
  if (parameter === 'Y') {
    return multiply2(m.map((v, k) => sub(identity[k], v)) as Matrix2, inverse2(m.map((v, k) => add(identity[k], v)) as Matrix2));
  }
  const h = parameter === 'H' ? m : inverse2(m);
  const [h11, h12, h21, h22] = h;
  const h12h21 = mul(h12, h21);
  const delta = sub(mul(add(h11, ONE), add(h22, ONE)), h12h21);
  return [
    div(sub(mul(sub(h11, ONE), add(h22, ONE)), h12h21), delta),
    div(scaleBy(h12, 2), delta),
    div(scaleBy(h21, -2), delta),
    div(add(mul(add(ONE, h11), sub(ONE, h22)), h12h21), delta),
  ];
}

function scaleBy(a: Complex, factor: number): Complex {
  return { re: a.re * factor, im: a.im * factor };
}

/**
 * Factors that normalise each row-major element. v1 data are already normalised to R; v2 Z and Y are in
 * ohms and siemens (Touchstone 2.0, Option Line), H and G mix both (h11 Ω, h22 S, h12/h21 unitless).
 */
function normalisationFactors(parameter: NetworkParameter, ports: number, referenceOhms: readonly number[], version1: boolean): number[] {
  const count = ports * ports;
  if (version1 || parameter === 'S') return new Array<number>(count).fill(1);
  const r = (port: number) => referenceOhms[port];
  if (ports === 1) return [parameter === 'Z' ? 1 / r(0) : r(0)];
  if (parameter === 'Z') return [1 / r(0), 1 / Math.sqrt(r(0) * r(1)), 1 / Math.sqrt(r(0) * r(1)), 1 / r(1)];
  if (parameter === 'Y') return [r(0), Math.sqrt(r(0) * r(1)), Math.sqrt(r(0) * r(1)), r(1)];
  if (parameter === 'H') return [1 / r(0), Math.sqrt(r(1) / r(0)), Math.sqrt(r(1) / r(0)), r(1)];
  return [r(0), Math.sqrt(r(0) / r(1)), Math.sqrt(r(0) / r(1)), 1 / r(1)];
}

export interface NetworkShape {
  /** Z and Y above 2 ports, and H and G other than 2 ports, are refused before a network is built. */
  readonly ports: number;
  readonly parameter: NetworkParameter;
  readonly format: DataFormat;
  readonly frequencyUnit: FrequencyUnit;
  readonly referenceOhms: readonly number[];
  readonly twoPortDataOrder: TwoPortDataOrder;
  readonly matrixFormat: MatrixFormat;
  /** Version-1 data are already normalised to the reference resistance. */
  readonly version1: boolean;
}

/** Collects the points of [Network Data] (or a version-1 body) in file order and checks each as it comes. */
export class NetworkBuilder {
  readonly valuesPerPoint: number;
  readonly frequencyMultiplier: number;
  lastFrequencyHz = -Infinity;
  private readonly store: PointStore;
  private readonly targets: readonly number[];
  private readonly mirrors: readonly [number, number][];
  private readonly normalisation: readonly number[];

  constructor(
    private readonly shape: NetworkShape,
    private readonly maxPoints: number,
    fileBytes: number,
  ) {
    const layout = pairLayout(shape.ports, shape.twoPortDataOrder, shape.matrixFormat);
    this.targets = layout.targets;
    this.mirrors = layout.mirrors;
    this.valuesPerPoint = 1 + 2 * layout.targets.length;
    this.frequencyMultiplier = FREQUENCY_UNIT_HZ[shape.frequencyUnit];
    this.normalisation = normalisationFactors(shape.parameter, shape.ports, shape.referenceOhms, shape.version1);
    // Sized from the file (about 24 bytes a 1-port point, 16 more per complex value), never beyond the point limit.
    this.store = new PointStore(shape.ports * shape.ports, Math.min(maxPoints, Math.ceil(fileBytes / (8 + 16 * layout.targets.length))));
  }

  get pointCount(): number {
    return this.store.length;
  }

  /** One point: the frequency, then `valuesPerPoint − 1` numbers in the file's format. */
  addPoint(values: Float64Array, lineNumber: number): void {
    const s = this.store;
    const { format, parameter } = this.shape;
    const frequencyMultiplier = this.frequencyMultiplier;
    const frequencyHz = values[0] * frequencyMultiplier;
    if (!(frequencyHz > this.lastFrequencyHz) || frequencyHz < 0) {
      throw new TouchstoneError(
        'TOUCHSTONE_FREQUENCY_NOT_INCREASING',
        lineNumber,
        frequencyHz < 0
          ? `frequency ${values[0]} is negative`
          : `frequency ${values[0]} does not increase (the previous point was ${this.lastFrequencyHz / frequencyMultiplier})`,
      );
    }
    if (!Number.isFinite(frequencyHz)) {
      throw new TouchstoneError(
        'TOUCHSTONE_BAD_NUMBER',
        lineNumber,
        `frequency ${values[0]} ${this.shape.frequencyUnit} is beyond any representable number of Hz`,
      );
    }
    if (s.length >= this.maxPoints) {
      throw new TouchstoneError('TOUCHSTONE_TOO_MANY_POINTS', lineNumber, `the file has more than ${this.maxPoints} points; the limit is ${this.maxPoints}`);
    }
    this.lastFrequencyHz = frequencyHz;
    if (s.length === s.capacity) s.grow();
    const index = s.length++;
    s.frequenciesHz[index] = frequencyHz;
    s.lines[index] = lineNumber;
    const targets = this.targets;
    const normalisation = this.normalisation;
    const direct = parameter === 'S';
    const converted: Complex[] | null = direct ? null : new Array<Complex>(s.elements);
    for (let k = 0; k < targets.length; k++) {
      const a = values[1 + 2 * k];
      const b = values[2 + 2 * k];
      let re: number;
      let im: number;
      if (format === 'RI') {
        re = a;
        im = b;
      } else {
        const magnitude = format === 'MA' ? a : 10 ** (a / 20);
        const angle = b * DEG_TO_RAD;
        re = magnitude * Math.cos(angle);
        im = magnitude * Math.sin(angle);
      }
      const target = targets[k];
      if (direct) {
        s.re[target][index] = re;
        s.im[target][index] = im;
      } else {
        converted![target] = { re: re * normalisation[target], im: im * normalisation[target] };
      }
    }
    for (const [from, to] of this.mirrors) {
      if (direct) {
        s.re[to][index] = s.re[from][index];
        s.im[to][index] = s.im[from][index];
      } else {
        converted![to] = converted![from];
      }
    }
    if (!direct) {
      const sMatrix = normalisedToS(parameter, this.shape.ports, converted!);
      for (let e = 0; e < sMatrix.length; e++) {
        s.re[e][index] = sMatrix[e].re;
        s.im[e][index] = sMatrix[e].im;
      }
    }
    // A huge dB value overflows 10^(dB/20), and Z or Y data can divide by zero on the way to S.
    for (let e = 0; e < s.elements; e++) {
      if (!Number.isFinite(s.re[e][index]) || !Number.isFinite(s.im[e][index])) {
        throw new TouchstoneError(
          'TOUCHSTONE_BAD_NUMBER',
          lineNumber,
          `the values of this point give no finite S-parameter (too large a magnitude, or a singular ${parameter} matrix)`,
        );
      }
    }
  }

  /** The collected points, trimmed to their count. */
  finish(): Pick<TouchstoneNetwork, 'frequenciesHz' | 's' | 'pointLines'> {
    const s = this.store;
    return { frequenciesHz: s.frequenciesHz.slice(0, s.length), s: s.series(), pointLines: s.lines.slice(0, s.length) };
  }
}

export function sParameter(network: TouchstoneNetwork, row: number, column: number): ComplexSeries {
  if (row < 1 || column < 1 || row > network.ports || column > network.ports) {
    throw new TouchstoneError('TOUCHSTONE_NO_SUCH_PORT', null, `S${row}${column} does not exist in a ${network.ports}-port file`);
  }
  return network.s[(row - 1) * network.ports + (column - 1)];
}
