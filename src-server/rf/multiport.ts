import { type Complex, complex } from './complex';
import { type BandResult, type BandStatistics, type FrequencyRange, bandStatistics } from './curves';
import { type TouchstoneNetwork, sParameter } from './touchstone';

/**
 * Quantities between two ports of one network measured with several antennas in place: isolation and
 * the envelope correlation coefficient. Ports are 1-based, as in the file.
 */

/** Isolation in positive dB from a transmission coefficient: −20·log10 |Sij| (Pozar, Microwave Engineering 4th ed. §4.3). */
export function isolationDbFromTransmission(transmission: Complex): number {
  return -20 * Math.log10(Math.hypot(transmission.re, transmission.im));
}

/**
 * Envelope correlation coefficient of two antennas from their S-parameters (Blanch, Romeu and Corbella,
 * Electronics Letters 39(9), 2003, pp. 705–707):
 *   ρe = |S11* S12 + S21* S22|² / ((1 − |S11|² − |S21|²)(1 − |S22|² − |S12|²)).
 * It assumes lossless antennas in a uniform multipath environment; with lossy antennas it understates the
 * true correlation's uncertainty. Null where a factor of the denominator is not positive (the two ports
 * reflect or pass on all they receive, so no radiated field is left to correlate).
 */
export function envelopeCorrelation(s11: Complex, s12: Complex, s21: Complex, s22: Complex): number | null {
  // S11* S12 + S21* S22, with z* the complex conjugate.
  const re = s11.re * s12.re + s11.im * s12.im + (s21.re * s22.re + s21.im * s22.im);
  const im = s11.re * s12.im - s11.im * s12.re + (s21.re * s22.im - s21.im * s22.re);
  const radiatedA = 1 - (s11.re * s11.re + s11.im * s11.im) - (s21.re * s21.re + s21.im * s21.im);
  const radiatedB = 1 - (s22.re * s22.re + s22.im * s22.im) - (s12.re * s12.re + s12.im * s12.im);
  if (!(radiatedA > 0) || !(radiatedB > 0)) return null;
  return (re * re + im * im) / (radiatedA * radiatedB);
}

function element(network: TouchstoneNetwork, row: number, column: number, index: number): Complex {
  const series = sParameter(network, row, column);
  return complex(series.re[index], series.im[index]);
}

function checkPair(network: TouchstoneNetwork, portA: number, portB: number): void {
  if (portA === portB) throw new RangeError(`a pair needs two different ports, got port ${portA} twice`);
  // sParameter refuses ports the file does not have, with the reader's own error.
  sParameter(network, portA, portB);
}

/** Isolation (positive dB) from port A to port B at every point: −20·log10 |S_BA|. */
export function isolationCurve(network: TouchstoneNetwork, portA: number, portB: number): Float64Array {
  checkPair(network, portA, portB);
  const transmission = sParameter(network, portB, portA);
  return Float64Array.from(network.frequenciesHz, (_, i) => isolationDbFromTransmission(complex(transmission.re[i], transmission.im[i])));
}

/** ρe between ports A and B at every point; NaN where it is not defined (see envelopeCorrelation). */
export function envelopeCorrelationCurve(network: TouchstoneNetwork, portA: number, portB: number): Float64Array {
  checkPair(network, portA, portB);
  return Float64Array.from(network.frequenciesHz, (_, i) => {
    const value = envelopeCorrelation(
      element(network, portA, portA, i),
      element(network, portA, portB, i),
      element(network, portB, portA, i),
      element(network, portB, portB, i),
    );
    return value ?? NaN;
  });
}

export interface PairInBand {
  /** The least isolation over the band (the worst case), in dB, with the statistics it came from. */
  readonly isolation: BandResult<BandStatistics>;
  /** The highest ρe over the band (the worst case); no-data also when ρe is undefined somewhere in it. */
  readonly correlation: BandResult<BandStatistics>;
}

/** Isolation and ρe of a port pair over one band: the figures the product page and the rules use. */
export function pairInBand(network: TouchstoneNetwork, portA: number, portB: number, band: FrequencyRange): PairInBand {
  const frequenciesHz = network.frequenciesHz;
  const isolation = bandStatistics({ frequenciesHz, values: isolationCurve(network, portA, portB) }, band);
  const correlationValues = envelopeCorrelationCurve(network, portA, portB);
  let correlation = bandStatistics({ frequenciesHz, values: correlationValues }, band);
  if (correlation.status === 'ok' && ![correlation.min, correlation.max, correlation.average].every(Number.isFinite)) {
    correlation = { status: 'no-data', code: 'no-points', reason: 'the envelope correlation is not defined in this band (the ports radiate nothing)' };
  }
  return { isolation, correlation };
}
