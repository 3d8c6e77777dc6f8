/** The shapes and limits of a Touchstone file (IBIS Touchstone File Format Specification 1.1, 2.0, 2.1). */

/** Largest file accepted: 32 MiB, above the 20 MB the API promises and about 250,000 2-port points. */
export const TOUCHSTONE_MAX_BYTES = 32 * 1024 * 1024;
/** Most points read by default: more than any instrument sweep (they stop near 100,001), and bounded memory. */
export const TOUCHSTONE_MAX_POINTS = 250_000;
/** Longest line: a 2-port data line is under 200 bytes; a longer line is not Touchstone. */
export const TOUCHSTONE_MAX_LINE_BYTES = 8192;
/** Most ports read: more than any assembly of antennas; with the byte cap it bounds a point's memory. */
export const TOUCHSTONE_MAX_PORTS = 64;

export type FrequencyUnit = 'Hz' | 'kHz' | 'MHz' | 'GHz';
export type NetworkParameter = 'S' | 'Y' | 'Z' | 'H' | 'G';
export type DataFormat = 'DB' | 'MA' | 'RI';
/** `21_12` is the version-1 order N11 N21 N12 N22; `12_21` is row-major N11 N12 N21 N22 (Touchstone 2.0, [Two-Port Data Order]). */
export type TwoPortDataOrder = '12_21' | '21_12';
export type MatrixFormat = 'Full' | 'Lower' | 'Upper';

export const FREQUENCY_UNIT_HZ: Readonly<Record<FrequencyUnit, number>> = { Hz: 1, kHz: 1e3, MHz: 1e6, GHz: 1e9 };

export interface ComplexSeries {
  readonly re: Float64Array;
  readonly im: Float64Array;
}

export interface TouchstoneNetwork {
  /** '1.0', '1.1' (v1 syntax with one R per port), '2.0' or '2.1'. */
  readonly version: string;
  /** 1 to TOUCHSTONE_MAX_PORTS. */
  readonly ports: number;
  /** The parameter the file was written in; `s` below is always S. */
  readonly parameter: NetworkParameter;
  readonly format: DataFormat;
  readonly frequencyUnit: FrequencyUnit;
  /** One reference resistance per port, in ohms. */
  readonly referenceOhms: readonly number[];
  readonly twoPortDataOrder: TwoPortDataOrder | null;
  readonly matrixFormat: MatrixFormat;
  readonly frequenciesHz: Float64Array;
  /** S-parameters row-major: index (row − 1) × ports + (column − 1). */
  readonly s: readonly ComplexSeries[];
  /** Noise-parameter points recognised and skipped. */
  readonly noisePointCount: number;
  /** The 1-based file line each point starts on, so a later check can name it. */
  readonly pointLines: Int32Array;
}

export interface TouchstoneReadOptions {
  /** Port count implied by the file name (.s1p → 1); a file that disagrees is refused. */
  readonly expectedPorts?: number;
  readonly maxBytes?: number;
  /** Most network points accepted (default TOUCHSTONE_MAX_POINTS); the point past it is refused with its line. */
  readonly maxPoints?: number;
  /** Longest line accepted (default TOUCHSTONE_MAX_LINE_BYTES). */
  readonly maxLineBytes?: number;
}
