/** IEC 60063:2015 preferred-number series, as fixed tables (not rounded powers of ten). */
export type PreferredSeries = 'E12' | 'E24';

// Mantissas × 10 so the tables hold integers and scaling stays exact.
const E12_TIMES_TEN: readonly number[] = [10, 12, 15, 18, 22, 27, 33, 39, 47, 56, 68, 82];
const E24_TIMES_TEN: readonly number[] = [10, 11, 12, 13, 15, 16, 18, 20, 22, 24, 27, 30, 33, 36, 39, 43, 47, 51, 56, 62, 68, 75, 82, 91];

export function preferredMantissas(series: PreferredSeries): readonly number[] {
  return (series === 'E12' ? E12_TIMES_TEN : E24_TIMES_TEN).map((m) => m / 10);
}

function scaled(mantissaTimesTen: number, decade: number): number {
  // decade d means mantissa × 10^d; dividing by a power of ten keeps 0.91 as 0.91, not 0.9100000000000001.
  const exponent = decade - 1;
  return exponent >= 0 ? mantissaTimesTen * 10 ** exponent : mantissaTimesTen / 10 ** -exponent;
}

/** The nearest preferred value on a logarithmic scale (the series are geometric), e.g. 0.923 → E24 0.91, E12 1.0. */
export function snapToPreferredValue(value: number, series: PreferredSeries): number {
  if (!(value > 0) || !Number.isFinite(value)) throw new RangeError(`a preferred value needs a positive finite number, got ${value}`);
  const table = series === 'E12' ? E12_TIMES_TEN : E24_TIMES_TEN;
  const decade = Math.floor(Math.log10(value));
  let best = NaN;
  let bestDistance = Infinity;
  for (const d of [decade - 1, decade, decade + 1]) {
    for (const m of table) {
      const candidate = scaled(m, d);
      const distance = Math.abs(Math.log(value / candidate));
      if (distance < bestDistance) {
        bestDistance = distance;
        best = candidate;
      }
    }
  }
  return best;
}
