import { PART_IMPORT_MAX_ROWS, SPEC_BANDS_MAX, parsePartCsv } from './part-csv';

const HEADER = 'manufacturer,mpn,title,formFactor,connector,polarization,nominalImpedanceOhms,lengthMm,tempMinC,notes,specBands\n';
const row = (cells: Partial<Record<string, string>>) => {
  const base: Record<string, string> = {
    manufacturer: 'Acme',
    mpn: 'M1',
    title: 'Chip',
    formFactor: 'chip',
    connector: 'SMA',
    polarization: 'linear',
    nominalImpedanceOhms: '50',
    lengthMm: '',
    tempMinC: '',
    notes: '',
    specBands: '791-862 vswr=3',
  };
  return (
    HEADER.trim()
      .split(',')
      .map((c) => cells[c] ?? base[c])
      .join(',') + '\n'
  );
};
const fieldsOf = (text: string) => parsePartCsv(Buffer.from(text)).problems.map((p) => `${p.row}:${p.field}`);

describe('parsePartCsv field checks (the same as POST /api/parts)', () => {
  it('accepts a row the JSON API accepts', () => {
    const { parts, problems } = parsePartCsv(Buffer.from(HEADER + row({})));
    expect(problems).toEqual([]);
    expect(parts[0].input).toMatchObject({ mpn: 'M1', nominalImpedanceOhms: 50, specBands: [{ fromMhz: 791, toMhz: 862, maxVswr: 3 }] });
  });

  it('refuses gains, frequencies and counts out of the DTO ranges, by row and column', () => {
    const manyBands = Array.from({ length: 2000 }, (_, i) => `${i + 1}-${i + 2}`).join('; ');
    const text =
      HEADER +
      row({ mpn: 'A', specBands: '791-862 peak=1e300' }) +
      row({ mpn: 'B', specBands: '791-999999999' }) +
      row({ mpn: 'C', specBands: manyBands }) +
      row({ mpn: 'D', nominalImpedanceOhms: '1e300' }) +
      row({ mpn: 'E', tempMinC: '1e309' }) +
      row({ mpn: 'F', notes: 'x'.repeat(4001) }) +
      row({ mpn: 'G', connector: 'BNC' });
    expect(fieldsOf(text)).toEqual(['1:specBands', '2:specBands', '3:specBands', '4:nominalImpedanceOhms', '5:tempMinC', '6:notes', '7:connector']);
    expect(parsePartCsv(Buffer.from(text)).parts).toEqual([]);
  });

  it(`refuses a file of more than ${PART_IMPORT_MAX_ROWS} rows with 422 PART_IMPORT_TOO_MANY_ROWS before reading it all`, () => {
    const text = HEADER + Array.from({ length: PART_IMPORT_MAX_ROWS + 1 }, (_, i) => row({ mpn: `M${i}` })).join('');
    expect(() => parsePartCsv(Buffer.from(text))).toThrow(expect.objectContaining({ code: 'PART_IMPORT_TOO_MANY_ROWS', status: 422 }));
    const shortLines = HEADER + 'a\n'.repeat(2_000_000);
    expect(() => parsePartCsv(Buffer.from(shortLines))).toThrow(expect.objectContaining({ code: 'PART_IMPORT_TOO_MANY_ROWS' }));
  });

  it('refuses a record longer than the record limit with a line, not a crash', () => {
    const { problems } = parsePartCsv(Buffer.from(HEADER + row({ notes: `"${'x'.repeat(40_000)}"` })));
    expect(problems).toEqual([expect.objectContaining({ row: 0, line: 2 })]);
  });
});

describe('SPEC_BANDS_MAX', () => {
  it("is CreatePartDto's own limit", () => {
    expect(SPEC_BANDS_MAX).toBe(64);
  });
});
