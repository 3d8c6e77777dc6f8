import { describe, expect, it } from 'vitest';
import { antennaLabel, countText, eccText, frequencySpanText, isolationText, mappingLines, mhzText, uploadRefusalText } from './in-product-words';

const NBSP = '\u00a0';

describe(antennaLabel.name, () => {
  it('reads "Radio name · role (port n)", the role in words', () => {
    expect(antennaLabel({ radioName: 'Cellular LTE Cat-1', role: 'diversity', port: 2 })).toBe(`Cellular LTE Cat-1 · diversity (port${NBSP}2)`);
    expect(antennaLabel({ radioName: 'Wi-Fi', role: 'mimo-2', port: 3 })).toBe(`Wi-Fi · MIMO 2 (port${NBSP}3)`);
  });
});

describe(frequencySpanText.name, () => {
  it('gives the span in MHz with its unit, without trailing zeros', () => {
    expect(frequencySpanText({ fromMhz: 600, toMhz: 6000 })).toBe(`600–6000${NBSP}MHz`);
    expect(mhzText(2483.5)).toBe('2483.5');
    expect(mhzText(0.1234567)).toBe('0.123');
  });
});

describe(isolationText.name, () => {
  it('gives dB to one decimal, and says so when the file has no points in the bands', () => {
    expect(isolationText(10.768473105079316)).toBe(`10.8${NBSP}dB`);
    expect(isolationText(null)).toBe('no points in these bands');
  });
});

describe(eccText.name, () => {
  it('gives three decimals, and a floor for values that would round to zero', () => {
    expect(eccText(0.025366329401647566)).toBe('0.025');
    expect(eccText(0.62)).toBe('0.620');
    expect(eccText(0.0001)).toBe('< 0.001');
    expect(eccText(null)).toBe('no points in this band');
  });
});

describe(countText.name, () => {
  it('picks the noun by the count', () => {
    expect(countText(1, 'port', 'ports')).toBe('1 port');
    expect(countText(10000, 'point', 'points')).toBe('10,000 points');
  });
});

describe(mappingLines.name, () => {
  it('lists each mapped port with its radio and antenna in words', () => {
    expect(
      mappingLines({
        portMapping: [
          { port: 1, radioId: 21, role: 'main', radioName: 'LTE' },
          { port: 2, radioId: 21, role: 'diversity', radioName: 'LTE' },
        ],
      }),
    ).toEqual(['Port 1: LTE · main', 'Port 2: LTE · diversity']);
  });
});

describe(uploadRefusalText.name, () => {
  it('drops the field prefix, starts with a capital and says nothing was stored, once', () => {
    expect(uploadRefusalText("line 4: 'x' is not a number")).toBe("Line 4: 'x' is not a number. Nothing was stored.");
    expect(uploadRefusalText('file: bin.s4p is not a text file; in-product measurements are Touchstone text')).toBe(
      'Bin.s4p is not a text file; in-product measurements are Touchstone text. Nothing was stored.',
    );
    expect(uploadRefusalText('file: an in-product measurement may be at most 16 MiB; nothing was stored')).toBe(
      'An in-product measurement may be at most 16 MiB. Nothing was stored.',
    );
  });
});
