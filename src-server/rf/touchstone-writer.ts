import { FREQUENCY_UNIT_HZ, type DataFormat, type FrequencyUnit, type MatrixFormat, type NetworkParameter, type TwoPortDataOrder } from './touchstone';
import { pairLayout } from './touchstone/network';

export interface ComplexColumns {
  readonly re: ArrayLike<number>;
  readonly im: ArrayLike<number>;
}

/** One noise point: frequency (Hz), NFmin (dB), |Γopt|, ∠Γopt (deg), Rn (normalised in v1, ohms in v2). */
export type NoisePoint = readonly [number, number, number, number, number];

export interface TouchstoneWriteInput {
  readonly version: 1 | 2;
  readonly ports: number;
  readonly frequenciesHz: ArrayLike<number>;
  /** Row-major matrix elements of `parameter`, as written: v1 Z/Y normalised to R, v2 Z/Y in ohms/siemens. */
  readonly data: readonly ComplexColumns[];
  readonly parameter?: NetworkParameter;
  readonly format?: DataFormat;
  readonly frequencyUnit?: FrequencyUnit;
  /** One value (all ports) or one per port; v1 writes them on the option line, v2 in [Reference]. */
  readonly referenceOhms?: readonly number[];
  /** Version 2 only; version 1 always writes S21 before S12. */
  readonly twoPortDataOrder?: TwoPortDataOrder;
  /** Version 2 only: Lower or Upper write half of a symmetric matrix. */
  readonly matrixFormat?: MatrixFormat;
  readonly comments?: readonly string[];
  readonly noise?: readonly NoisePoint[];
  /** Defaults to String(), the shortest text that reads back to the same double. */
  readonly formatNumber?: (value: number) => string;
}

/** Writes a Touchstone file: used by tests, demo data and the benchmark, so it favours exactness over looks. */
export function writeTouchstone(input: TouchstoneWriteInput): string {
  const parameter = input.parameter ?? 'S';
  const format = input.format ?? 'RI';
  const unit = input.frequencyUnit ?? 'GHz';
  const references = input.referenceOhms ?? [50];
  const matrixFormat = input.version === 2 ? (input.matrixFormat ?? 'Full') : 'Full';
  // Version 1 has only one 2-port order (S21 before S12).
  const order = input.version === 1 ? '21_12' : (input.twoPortDataOrder ?? '12_21');
  const text = input.formatNumber ?? String;
  const multiplier = FREQUENCY_UNIT_HZ[unit];
  const lines: string[] = (input.comments ?? []).map((comment) => `! ${comment}`);
  const optionReference = input.version === 1 ? references.join(' ') : String(references[0]);
  const optionLine = `# ${unit} ${parameter} ${format} R ${optionReference}`;
  if (input.version === 2) {
    lines.push('[Version] 2.0', optionLine, `[Number of Ports] ${input.ports}`);
    if (input.ports === 2) lines.push(`[Two-Port Data Order] ${order}`);
    if (matrixFormat !== 'Full') lines.push(`[Matrix Format] ${matrixFormat}`);
    lines.push(`[Number of Frequencies] ${input.frequenciesHz.length}`);
    if (input.noise && input.noise.length > 0) lines.push(`[Number of Noise Frequencies] ${input.noise.length}`);
    if (references.length > 1) lines.push('[Reference]', references.join(' '));
    lines.push('[Network Data]');
  } else {
    lines.push(optionLine);
  }
  const elementOrder = pairLayout(input.ports, order, matrixFormat).targets;
  // Version 1 above 2 ports: each row on a new line, wrapped after 4 pairs (Touchstone 1.1); version 2 above 2 ports too.
  const breakAfter = (k: number) => input.ports > 2 && k + 1 < elementOrder.length && (rowEnds.has(k) || (k - rowStart(k) + 1) % 4 === 0);
  const rowOf = (k: number) => Math.floor(elementOrder[k] / input.ports);
  const rowEnds = new Set(elementOrder.map((_, k) => k).filter((k) => k + 1 === elementOrder.length || rowOf(k + 1) !== rowOf(k)));
  const rowStart = (k: number) => {
    let start = k;
    while (start > 0 && rowOf(start - 1) === rowOf(k)) start--;
    return start;
  };
  const pair = (re: number, im: number): string => {
    if (format === 'RI') return `${text(re)} ${text(im)}`;
    const magnitude = Math.hypot(re, im);
    const angle = (Math.atan2(im, re) * 180) / Math.PI;
    return `${text(format === 'MA' ? magnitude : 20 * Math.log10(magnitude))} ${text(angle)}`;
  };
  for (let i = 0; i < input.frequenciesHz.length; i++) {
    let line = text(input.frequenciesHz[i] / multiplier);
    elementOrder.forEach((element, k) => {
      line += ' ' + pair(input.data[element].re[i], input.data[element].im[i]);
      if (breakAfter(k)) {
        lines.push(line);
        line = '';
      }
    });
    lines.push(line);
  }
  if (input.noise && input.noise.length > 0) {
    if (input.version === 2) lines.push('[Noise Data]');
    for (const [frequencyHz, ...rest] of input.noise) lines.push([frequencyHz / multiplier, ...rest].map(text).join(' '));
  }
  if (input.version === 2) lines.push('[End]');
  return lines.join('\n') + '\n';
}
