import { checkStorableCurve, MEASUREMENT_MAX_POINTS, parseCurveCsv, parseTouchstoneS11, PASSIVE_REFLECTION_LIMIT } from './measurement-parsers';

const s1p = (rows: string) => Buffer.from(`# MHz S MA R 50\n${rows}`);

describe(checkStorableCurve.name, () => {
  it('accepts |S11| up to the passive limit and refuses above it with the line', () => {
    expect(() => checkStorableCurve(parseTouchstoneS11(s1p(`800 0.5 0\n900 ${PASSIVE_REFLECTION_LIMIT} 90\n`), 'a.s1p'))).not.toThrow();
    expect(() => checkStorableCurve(parseTouchstoneS11(s1p('800 0.5 0\n! comment\n900 1.01 90\n'), 'a.s1p'))).toThrow(
      expect.objectContaining({ code: 'MEASUREMENT_REFLECTION_ABOVE_ONE', status: 422, details: { line: 4 } }),
    );
  });

  it('refuses a curve with more points than the store takes, naming the first line past the limit', () => {
    const n = MEASUREMENT_MAX_POINTS + 1;
    const curve = {
      kind: 'efficiency' as const,
      sourceFormat: 'CSV',
      referenceOhms: null,
      frequenciesHz: Float64Array.from({ length: n }, (_, i) => i + 1),
      valuesA: new Float64Array(n),
      valuesB: null,
      lines: Int32Array.from({ length: n }, (_, i) => i + 2),
    };
    expect(() => checkStorableCurve(curve)).toThrow(expect.objectContaining({ code: 'MEASUREMENT_TOO_MANY_POINTS', details: { line: n + 1 } }));
  });

  it('keeps the line of every CSV point, and refuses a frequency that overflows in Hz by row', () => {
    const curve = parseCurveCsv(Buffer.from('frequency (MHz),efficiency (%)\n# note\n800,40\n900,50\n'), 'efficiency');
    expect([...curve.lines]).toEqual([3, 4]);
    expect(() => parseCurveCsv(Buffer.from('frequency (GHz),efficiency (%)\n0.8,40\n1e300,50\n'), 'efficiency')).toThrow(
      expect.objectContaining({ code: 'CSV_BAD_ROWS', details: expect.objectContaining({ line: 3 }) }),
    );
  });
});
