import { packFloat64, unpackFloat64 } from '../../parts/measurements/point-codec';
import type { ComplexSeries, TouchstoneNetwork } from '../../rf/touchstone';

/** What is kept of a parsed N-port file to rebuild its S-matrix without the original. */
export interface StoredNetworkShape {
  readonly ports: number;
  readonly referenceOhms: readonly number[];
  readonly sourceFormat: string;
}

/** The S-matrix as one float64 array: element (row-major) by element, each point's Re then Im. */
export function packSMatrix(network: Pick<TouchstoneNetwork, 's' | 'frequenciesHz'>): Buffer {
  const n = network.frequenciesHz.length;
  const flat = new Float64Array(network.s.length * n * 2);
  network.s.forEach((series, e) => {
    for (let i = 0; i < n; i++) {
      flat[(e * n + i) * 2] = series.re[i];
      flat[(e * n + i) * 2 + 1] = series.im[i];
    }
  });
  return packFloat64(flat);
}

/** A network from stored columns, shaped as the reader's so rf/ functions (sParameter, pairInBand …) take it. */
export function networkFromStored(shape: StoredNetworkShape, frequencies: Buffer, sMatrix: Buffer): TouchstoneNetwork {
  const frequenciesHz = unpackFloat64(frequencies);
  const flat = unpackFloat64(sMatrix);
  const n = frequenciesHz.length;
  const elements = shape.ports * shape.ports;
  if (flat.length !== elements * n * 2) throw new RangeError(`stored S-matrix holds ${flat.length} values, expected ${elements * n * 2}`);
  const s: ComplexSeries[] = [];
  for (let e = 0; e < elements; e++) {
    const re = new Float64Array(n);
    const im = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      re[i] = flat[(e * n + i) * 2];
      im[i] = flat[(e * n + i) * 2 + 1];
    }
    s.push({ re, im });
  }
  return {
    version: shape.sourceFormat,
    ports: shape.ports,
    parameter: 'S',
    format: 'RI',
    frequencyUnit: 'Hz',
    referenceOhms: shape.referenceOhms,
    twoPortDataOrder: null,
    matrixFormat: 'Full',
    frequenciesHz,
    s,
    noisePointCount: 0,
    pointLines: new Int32Array(n),
  };
}
