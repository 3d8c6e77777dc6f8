import { parse } from 'csv-parse/sync';
import { csvCellText, writeCsv } from './csv-writer';

describe(csvCellText.name, () => {
  it.each([
    ['=1+1', "'=1+1"],
    ['=HYPERLINK("http://x","y")', `'=HYPERLINK("http://x","y")`],
    ['+cmd', "'+cmd"],
    ["-1+1+cmd|' /C calc'!A0", "'-1+1+cmd|' /C calc'!A0"],
    ['-2+3', "'-2+3"],
    ['@SUM(A1:A2)', "'@SUM(A1:A2)"],
    ['\t=1', "'\t=1"],
    ['\r=1', "'\r=1"],
    ['-', "'-"],
    ['-x', "'-x"],
    ['+', "'+"],
    ['-12.5e', "'-12.5e"],
  ])('neutralises %j', (input, expected) => {
    expect(csvCellText(input)).toBe(expected);
  });

  it.each([['-12.5'], ['+3'], ['1e-3'], ['-1E+9'], ['-.5'], ['12'], ['0'], ['1e-3x'], ['a=b']])(
    'leaves %j alone (a plain number, or no formula start)',
    (input) => {
      expect(csvCellText(input)).toBe(input);
    },
  );

  it('writes numbers, nothing and dates as a spreadsheet expects', () => {
    expect(csvCellText(-2.5)).toBe('-2.5');
    expect(csvCellText(1e-7)).toBe('1e-7');
    expect(csvCellText(-Infinity)).toBe('');
    expect(csvCellText(Number.NaN)).toBe('');
    expect(csvCellText(null)).toBe('');
    expect(csvCellText(undefined)).toBe('');
    expect(csvCellText(new Date('2026-01-02T03:04:05Z'))).toBe('2026-01-02T03:04:05.000Z');
    expect(csvCellText('plain text, with comma')).toBe('plain text, with comma');
  });
});

describe(writeCsv.name, () => {
  it('quotes commas, quotes and line breaks (a lone carriage return too) and reads back to the neutralised cells', () => {
    const cells = ['a,"b"', 'two\nlines', 'cr\ronly', '=1+1', -3, "-1+1+cmd|' /C calc'!A0"];
    const text = writeCsv(['Name', 'Value (dB)'], [cells], [['# caution']]);
    expect(text.startsWith('# caution\r\nName,Value (dB)\r\n')).toBe(true);
    expect(text.endsWith('\r\n')).toBe(true);
    const records: string[][] = parse(text, { relax_column_count: true });
    expect(records[2]).toEqual(['a,"b"', 'two\nlines', 'cr\ronly', "'=1+1", '-3', "'-1+1+cmd|' /C calc'!A0"]);
    // No cell of the file, once read, starts a formula.
    for (const record of records) for (const cell of record) expect(/^[=+@\t\r]/.test(cell) || (/^-/.test(cell) && Number.isNaN(Number(cell)))).toBe(false);
  });
});
