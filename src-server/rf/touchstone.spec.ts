import fc from 'fast-check';
import { type Complex, add, complex, div, mul, sub } from './complex';
import { gammaFromImpedance, returnLossDbFromGammaMagnitude, vswrFromGammaMagnitude } from './mismatch';
import { portsFromFileName, readTouchstone, sParameter, TOUCHSTONE_MAX_BYTES, TouchstoneError, type TouchstoneNetwork } from './touchstone';
import { writeTouchstone } from './touchstone-writer';

function errorOf(run: () => unknown): TouchstoneError {
  try {
    run();
  } catch (error) {
    if (error instanceof TouchstoneError) return error;
    throw error;
  }
  throw new Error('expected a TouchstoneError');
}

function at(network: TouchstoneNetwork, row: number, column: number, index: number): Complex {
  const series = sParameter(network, row, column);
  return complex(series.re[index], series.im[index]);
}

function magnitudeAt(network: TouchstoneNetwork, row: number, column: number, index: number): number {
  const value = at(network, row, column, index);
  return Math.hypot(value.re, value.im);
}

function angleAt(network: TouchstoneNetwork, row: number, column: number, index: number): number {
  const value = at(network, row, column, index);
  return (Math.atan2(value.im, value.re) * 180) / Math.PI;
}

// Examples (invented data, spec syntax from IBIS Touchstone Rev 1.1 / Version 2.0).
const EXAMPLE_A = `! Example A - invented data
# MHz S RI R 50
820   0.5000   0.0000
868   0.2000   0.0000
915   0.0000  -0.3333
`;
const EXAMPLE_B = `! Example B - invented data; columns S11 S21 S12 S22
# GHz S MA R 50
2.40  0.333 -30  0.90 -60  0.05 10  0.20 45
2.45  0.100  15  0.91 -75  0.05  5  0.18 40
`;
const EXAMPLE_C = `[Version] 2.0
# MHz S DB R 50
[Number of Ports] 2
[Two-Port Data Order] 12_21
[Number of Frequencies] 2
[Network Data]
! f  S11 S12 S21 S22 (dB, deg)
868  -9.54 120  -30.0 10  -0.5 -80  -14.0 60
915  -20.0  90  -30.5  5  -0.6 -95  -12.0 50
[End]
`;

describe(readTouchstone.name, () => {
  describe('published examples', () => {
    it('Example A: 820 MHz |Γ| 0.5 VSWR 3 RL 6.02 dB; 868 MHz 0.2, 1.5, 13.98 dB; 915 MHz 0.3333, 2.0, 9.54 dB', () => {
      const network = readTouchstone(EXAMPLE_A, { expectedPorts: 1 });
      expect(Array.from(network.frequenciesHz)).toEqual([820e6, 868e6, 915e6]);
      const expected = [
        [0.5, 3.0, 6.02],
        [0.2, 1.5, 13.98],
        [0.3333, 2.0, 9.54],
      ];
      expected.forEach(([gamma, vswr, rl], i) => {
        const g = magnitudeAt(network, 1, 1, i);
        expect(g).toBeCloseTo(gamma, 4);
        expect(vswrFromGammaMagnitude(g)).toBeCloseTo(vswr, 3);
        expect(returnLossDbFromGammaMagnitude(g)).toBeCloseTo(rl, 2);
      });
      expect(network).toMatchObject({ version: '1.0', ports: 1, parameter: 'S', format: 'RI', frequencyUnit: 'MHz', referenceOhms: [50] });
    });

    it('Example B: version 1 puts S21 before S12 (S21 = 0.90∠−60°, S12 = 0.05∠10°)', () => {
      const network = readTouchstone(EXAMPLE_B, { expectedPorts: 2 });
      expect(magnitudeAt(network, 2, 1, 0)).toBeCloseTo(0.9, 12);
      expect(angleAt(network, 2, 1, 0)).toBeCloseTo(-60, 10);
      expect(magnitudeAt(network, 1, 2, 0)).toBeCloseTo(0.05, 12);
      expect(angleAt(network, 1, 2, 0)).toBeCloseTo(10, 10);
      expect(magnitudeAt(network, 2, 2, 1)).toBeCloseTo(0.18, 12);
      expect(network.twoPortDataOrder).toBe('21_12');
    });

    it('Example C: version 2 12_21 is row-major (S12 = −30 dB, S21 = −0.5 dB)', () => {
      const network = readTouchstone(EXAMPLE_C, { expectedPorts: 2 });
      expect(20 * Math.log10(magnitudeAt(network, 1, 2, 0))).toBeCloseTo(-30, 10);
      expect(20 * Math.log10(magnitudeAt(network, 2, 1, 0))).toBeCloseTo(-0.5, 10);
      expect(angleAt(network, 2, 1, 1)).toBeCloseTo(-95, 10);
      expect(vswrFromGammaMagnitude(magnitudeAt(network, 1, 1, 0))).toBeCloseTo(2, 2);
      expect(network).toMatchObject({ version: '2.0', twoPortDataOrder: '12_21', format: 'DB' });
    });

    it('21_12 in version 2 is the version-1 order (Touchstone 2.0 §[Two-Port Data Order])', () => {
      const network = readTouchstone(EXAMPLE_C.replace('12_21', '21_12'));
      expect(20 * Math.log10(magnitudeAt(network, 2, 1, 0))).toBeCloseTo(-30, 10);
      expect(20 * Math.log10(magnitudeAt(network, 1, 2, 0))).toBeCloseTo(-0.5, 10);
    });
  });

  describe('option line (Touchstone 1.1, Option Line)', () => {
    it('"#" alone means GHz S MA R 50', () => {
      const network = readTouchstone('#\n1.5 0.5 90\n');
      expect(network).toMatchObject({ frequencyUnit: 'GHz', parameter: 'S', format: 'MA', referenceOhms: [50] });
      expect(network.frequenciesHz[0]).toBe(1.5e9);
      expect(at(network, 1, 1, 0).im).toBeCloseTo(0.5, 15);
    });
    it('accepts any order and case, every unit, and R with a value', () => {
      for (const [unit, scale] of [
        ['hz', 1],
        ['KHZ', 1e3],
        ['Mhz', 1e6],
        ['gHz', 1e9],
      ] as const) {
        const network = readTouchstone(`# ri R 75 s ${unit}\n2 0.1 0.2\n`);
        expect(network.frequenciesHz[0]).toBe(2 * scale);
        expect(network.referenceOhms).toEqual([75]);
      }
    });
    it('ignores option lines after the first', () => {
      expect(readTouchstone('# MHz S RI\n# GHz\n1 0 0\n').frequencyUnit).toBe('MHz');
    });
    it('reads one R per port as version 1.1', () => {
      const network = readTouchstone('# MHz S RI R 50 75\n1 0 0 0 0 0 0 0 0\n');
      expect(network).toMatchObject({ version: '1.1', referenceOhms: [50, 75] });
    });
    it('DB format is 20 log10 |S| with the angle in degrees', () => {
      const network = readTouchstone('# MHz S DB\n100 -6.020599913279624 180\n');
      expect(at(network, 1, 1, 0).re).toBeCloseTo(-0.5, 12);
    });
  });

  describe('comments, blank lines and line endings', () => {
    it('ignores comments anywhere and reads CRLF and CR files', () => {
      const text = '! head\r\n\r\n# MHz S RI ! trailing\r\n  868 0.2 0 ! after data\r\n!915 9 9\r\n915 0.1 0\r\n';
      expect(Array.from(readTouchstone(text).frequenciesHz)).toEqual([868e6, 915e6]);
      expect(Array.from(readTouchstone(text.replace(/\r\n/g, '\r')).frequenciesHz)).toEqual([868e6, 915e6]);
    });
    it('reads bytes as well as strings', () => {
      expect(readTouchstone(new TextEncoder().encode(EXAMPLE_A)).frequenciesHz).toHaveLength(3);
    });
  });

  describe('noise data', () => {
    it('skips a version-1 2-port noise block that starts where frequency stops increasing (Touchstone 1.1)', () => {
      const text = EXAMPLE_B + '2.0 1.2 0.4 30 0.3\n2.4 1.3 0.4 35 0.3\n';
      const network = readTouchstone(text);
      expect(network.frequenciesHz).toHaveLength(2);
      expect(network.noisePointCount).toBe(2);
    });
    it('skips a version-2 [Noise Data] block and checks [Number of Noise Frequencies]', () => {
      const withNoise = EXAMPLE_C.replace('[Network Data]', '[Number of Noise Frequencies] 1\n[Network Data]').replace(
        '[End]',
        '[Noise Data]\n800 1.2 0.4 30 20\n[End]',
      );
      expect(readTouchstone(withNoise).noisePointCount).toBe(1);
      expect(errorOf(() => readTouchstone(withNoise.replace('[Number of Noise Frequencies] 1', '[Number of Noise Frequencies] 2'))).code).toBe(
        'TOUCHSTONE_NOISE_COUNT_MISMATCH',
      );
    });
  });

  describe('version 2 keywords (Touchstone 2.0)', () => {
    it('reads [Reference] wrapped over lines, skips [Begin Information] blocks and reads Lower matrices', () => {
      const text = `[Version] 2.1
# MHz S RI R 50
[Number of Ports] 2
[Two-Port Data Order] 12_21
[Begin Information]
anything here, even 1 2 3
[End Information]
[Number of Frequencies] 1
[Reference] 50
75
[Matrix Format] Lower
[Network Data]
100 0.1 0.01
    0.2 0.02 0.3 0.03
[End]
trailing text after [End] is ignored`;
      const network = readTouchstone(text);
      expect(network).toMatchObject({ version: '2.1', referenceOhms: [50, 75], matrixFormat: 'Lower' });
      expect(at(network, 2, 1, 0)).toEqual(complex(0.2, 0.02));
      expect(at(network, 1, 2, 0)).toEqual(complex(0.2, 0.02));
      expect(at(network, 2, 2, 0)).toEqual(complex(0.3, 0.03));
    });
  });

  describe('Z and Y data are converted to S (Pozar 4th ed. §4.3; v1 normalised, v2 in ohms — Touchstone 2.0 Option Line)', () => {
    const z = complex(30, 40);
    const expected = gammaFromImpedance(z, 75);
    it('version 1 Z is normalised to R', () => {
      const network = readTouchstone(`# MHz Z RI R 75\n100 ${30 / 75} ${40 / 75}\n`);
      expect(at(network, 1, 1, 0).re).toBeCloseTo(expected.re, 14);
      expect(at(network, 1, 1, 0).im).toBeCloseTo(expected.im, 14);
    });
    it('version 2 Z is in ohms and Y in siemens', () => {
      const header = (parameter: string) => `[Version] 2.0\n# MHz ${parameter} RI R 75\n[Number of Ports] 1\n[Number of Frequencies] 1\n[Network Data]\n`;
      const fromZ = readTouchstone(`${header('Z')}100 30 40\n[End]\n`);
      const y = div(complex(1), z);
      const fromY = readTouchstone(`${header('Y')}100 ${y.re} ${y.im}\n[End]\n`);
      for (const network of [fromZ, fromY]) {
        expect(at(network, 1, 1, 0).re).toBeCloseTo(expected.re, 14);
        expect(at(network, 1, 1, 0).im).toBeCloseTo(expected.im, 14);
      }
    });
    it('2-port Z, Y, H and G of the same network give the same S (conversions of Pozar 4th ed. Table 4.2)', () => {
      // An invented T-network of impedances: Z = [[za+zc, zc], [zc, zb+zc]].
      const za = complex(12, 5);
      const zb = complex(30, -20);
      const zc = complex(80, 15);
      const zMatrix = [add(za, zc), zc, zc, add(zb, zc)];
      const det = sub(mul(zMatrix[0], zMatrix[3]), mul(zMatrix[1], zMatrix[2]));
      const yMatrix = [div(zMatrix[3], det), div(mul(complex(-1), zMatrix[1]), det), div(mul(complex(-1), zMatrix[2]), det), div(zMatrix[0], det)];
      // Table 4.2: h11 = ΔZ/Z22, h12 = Z12/Z22, h21 = −Z21/Z22, h22 = 1/Z22; G = H⁻¹.
      const hMatrix = [div(det, zMatrix[3]), div(zMatrix[1], zMatrix[3]), div(mul(complex(-1), zMatrix[2]), zMatrix[3]), div(complex(1), zMatrix[3])];
      const hDet = sub(mul(hMatrix[0], hMatrix[3]), mul(hMatrix[1], hMatrix[2]));
      const gMatrix = [div(hMatrix[3], hDet), div(mul(complex(-1), hMatrix[1]), hDet), div(mul(complex(-1), hMatrix[2]), hDet), div(hMatrix[0], hDet)];
      const file = (parameter: string, m: Complex[]) =>
        `[Version] 2.0\n# MHz ${parameter} RI R 50\n[Number of Ports] 2\n[Two-Port Data Order] 12_21\n[Number of Frequencies] 1\n[Reference]\n50 75\n[Network Data]\n100 ${m.map((v) => `${v.re} ${v.im}`).join(' ')}\n[End]\n`;
      const fromZ = readTouchstone(file('Z', zMatrix));
      // Port 1 seen with port 2 terminated in 75 Ω: Zin = Z11 − Z12 Z21 / (Z22 + 75).
      const zin = sub(zMatrix[0], div(mul(zMatrix[1], zMatrix[2]), add(zMatrix[3], complex(75))));
      const s11 = gammaFromImpedance(zin, 50);
      expect(at(fromZ, 1, 1, 0).re).toBeCloseTo(s11.re, 13);
      expect(at(fromZ, 1, 1, 0).im).toBeCloseTo(s11.im, 13);
      for (const [parameter, m] of [
        ['Y', yMatrix],
        ['H', hMatrix],
        ['G', gMatrix],
      ] as const) {
        const other = readTouchstone(file(parameter, m));
        for (const [row, column] of [
          [1, 1],
          [1, 2],
          [2, 1],
          [2, 2],
        ]) {
          expect(at(other, row, column, 0).re).toBeCloseTo(at(fromZ, row, column, 0).re, 12);
          expect(at(other, row, column, 0).im).toBeCloseTo(at(fromZ, row, column, 0).im, 12);
        }
      }
    });
  });

  describe('errors carry a code and a 1-based line', () => {
    const cases: [string, string, string, number | null][] = [
      ['empty file', '', 'TOUCHSTONE_EMPTY', null],
      ['only comments', '! nothing\n\n', 'TOUCHSTONE_EMPTY', null],
      ['option line but no data', '# MHz S RI\n', 'TOUCHSTONE_EMPTY', null],
      ['no option line', '868 0.1 0\n', 'TOUCHSTONE_MISSING_OPTION_LINE', 1],
      ['bad option token', '# MHz S XY\n', 'TOUCHSTONE_BAD_OPTION_LINE', 1],
      ['R without value', '! c\n# MHz S RI R\n', 'TOUCHSTONE_BAD_OPTION_LINE', 2],
      ['unknown unit', '# THz S RI\n1 0 0\n', 'TOUCHSTONE_UNKNOWN_UNIT', 1],
      ['bad number', '# MHz S RI\n868 0.1 O.2\n', 'TOUCHSTONE_BAD_NUMBER', 2],
      ['short line', '# MHz S RI\n868 0.1 0\n\n\n\n915 0.1\n', 'TOUCHSTONE_DATA_LINE_LENGTH', 6],
      ['non-increasing', '# MHz S RI\n868 0.1 0\n868 0.1 0\n', 'TOUCHSTONE_FREQUENCY_NOT_INCREASING', 3],
      ['decreasing 1-port', '# MHz S RI\n868 0.1 0\n800 0.1 0\n', 'TOUCHSTONE_FREQUENCY_NOT_INCREASING', 3],
      ['missing [End]', EXAMPLE_C.replace('[End]\n', ''), 'TOUCHSTONE_MISSING_END', 9],
      ['count mismatch', EXAMPLE_C.replace('[Number of Frequencies] 2', '[Number of Frequencies] 3'), 'TOUCHSTONE_FREQUENCY_COUNT_MISMATCH', 10],
      ['65 ports (above the limit of 64)', '[Version] 2.0\n# MHz S RI\n[Number of Ports] 65\n', 'TOUCHSTONE_WRONG_PORT_COUNT', 3],
      ['mixed-mode data', '[Version] 2.0\n# MHz S RI\n[Number of Ports] 4\n[Mixed-Mode Order] D2,3 D1,4 C2,3 C1,4\n', 'TOUCHSTONE_UNSUPPORTED', 4],
      ['Z data of 3 ports', '[Version] 2.0\n# MHz Z RI\n[Number of Ports] 3\n[Number of Frequencies] 1\n[Network Data]\n', 'TOUCHSTONE_UNSUPPORTED', 2],
      ['no data order', EXAMPLE_C.replace('[Two-Port Data Order] 12_21\n', ''), 'TOUCHSTONE_MISSING_KEYWORD', 5],
      ['unsupported version', '[Version] 3.0\n', 'TOUCHSTONE_UNSUPPORTED_VERSION', 1],
      ['unknown keyword', EXAMPLE_C.replace('[Network Data]', '[Frobnicate]'), 'TOUCHSTONE_UNKNOWN_KEYWORD', 6],
      ['keyword in version 1', '# MHz S RI\n[Number of Ports] 1\n', 'TOUCHSTONE_UNKNOWN_KEYWORD', 2],
      ['v2 point too long', EXAMPLE_C.replace('-14.0 60\n', '-14.0 60 1\n'), 'TOUCHSTONE_DATA_LINE_LENGTH', 8],
      ['v2 point cut short', EXAMPLE_C.replace('  -12.0 50\n', '\n'), 'TOUCHSTONE_DATA_LINE_LENGTH', 9],
    ];
    it.each(cases)('%s → %s', (_, text, code, line) => {
      const error = errorOf(() => readTouchstone(text));
      expect(error.code).toBe(code);
      expect(error.line).toBe(line);
      if (line !== null) expect(error.message.startsWith(`line ${line}: `)).toBe(true);
    });

    it('says what a data line needs: "line 7: a 1-port data line needs 3 numbers, found 2"', () => {
      const text = '! a\n! b\n# MHz S RI\n! c\n820 0.5 0\n868 0.2 0\n915 0.1\n';
      expect(errorOf(() => readTouchstone(text)).message).toBe('line 7: a 1-port data line needs 3 numbers, found 2');
    });

    it('checks the port count the file name implies', () => {
      expect(portsFromFileName('antenna.S2P')).toBe(2);
      expect(portsFromFileName('antenna.ts')).toBeUndefined();
      expect(errorOf(() => readTouchstone(EXAMPLE_B, { expectedPorts: 1 })).code).toBe('TOUCHSTONE_WRONG_PORT_COUNT');
      expect(errorOf(() => readTouchstone(EXAMPLE_A, { expectedPorts: 2 })).code).toBe('TOUCHSTONE_WRONG_PORT_COUNT');
      expect(errorOf(() => readTouchstone('# MHz S RI\n1 2 3 4 5\n', { expectedPorts: 2 })).message).toBe(
        'line 2: a 2-port data line needs 9 numbers (or 5 in a noise block), found 5',
      );
      expect(errorOf(() => readTouchstone(EXAMPLE_C, { expectedPorts: 1 })).code).toBe('TOUCHSTONE_WRONG_PORT_COUNT');
      expect(errorOf(() => sParameter(readTouchstone(EXAMPLE_A), 2, 2)).code).toBe('TOUCHSTONE_NO_SUCH_PORT');
    });

    it(`refuses files above TOUCHSTONE_MAX_BYTES (${TOUCHSTONE_MAX_BYTES} bytes, at least 20 MB) as a matter of size`, () => {
      expect(TOUCHSTONE_MAX_BYTES).toBeGreaterThanOrEqual(20 * 1000 * 1000);
      const oversized = new Uint8Array(TOUCHSTONE_MAX_BYTES + 1).fill(0x20);
      const error = errorOf(() => readTouchstone(oversized));
      expect(error.code).toBe('TOUCHSTONE_TOO_LARGE');
      expect(error.kind).toBe('too-large');
      expect(errorOf(() => readTouchstone(EXAMPLE_A, { maxBytes: 10 })).code).toBe('TOUCHSTONE_TOO_LARGE');
    });

    it('a bad file is refused for its content (the API answers 422: common/touchstone-http-error.ts)', () => {
      expect(errorOf(() => readTouchstone('')).kind).toBe('malformed');
    });
  });

  it('reads a single-point file', () => {
    const network = readTouchstone('# Hz S MA\n1e9 0.5 45\n');
    expect(network.frequenciesHz).toEqual(new Float64Array([1e9]));
  });

  it('parses long and exotic decimals exactly like Number()', () => {
    const values = ['0.1', '1e-300', '123456789012345678901234', '-.5', '+5.', '1.7976931348623157e308', '4.9e-324', '0.30000000000000004'];
    const network = readTouchstone(`# Hz S RI\n${values.map((v, i) => `${i + 1} ${v} ${v}`).join('\n')}\n`);
    values.forEach((v, i) => expect(network.s[0].re[i]).toBe(Number(v)));
  });
});

describe('more than 2 ports (Touchstone 1.1 and 2.0, Network Data and [Matrix Format])', () => {
  // The layout of Touchstone 1.1's 4-port example (from memory: each matrix row on its own line, the frequency on the first).
  const FOUR_PORT_V1 = `! 4-port S-parameter data, one frequency
# GHz S MA R 50
5.00000 0.60 161.24 0.40 -42.20 0.42 -66.58 0.53 -79.34 !row 1
        0.40 -42.20 0.60 161.20 0.53 -79.34 0.42 -66.58 !row 2
        0.42 -66.58 0.53 -79.34 0.60 161.24 0.40 -42.20 !row 3
        0.53 -79.34 0.42 -66.58 0.40 -42.20 0.60 161.24 !row 4
`;

  it('reads a version-1 4-port point written one row per line, row-major (S12 is the second pair)', () => {
    const network = readTouchstone(FOUR_PORT_V1, { expectedPorts: 4 });
    expect(network.ports).toBe(4);
    expect(network.frequenciesHz[0]).toBe(5e9);
    expect(magnitudeAt(network, 1, 2, 0)).toBeCloseTo(0.4, 12);
    expect(angleAt(network, 1, 2, 0)).toBeCloseTo(-42.2, 10);
    expect(angleAt(network, 2, 2, 0)).toBeCloseTo(161.2, 10);
    expect(magnitudeAt(network, 4, 1, 0)).toBeCloseTo(0.53, 12);
    expect(angleAt(network, 3, 4, 0)).toBeCloseTo(-42.2, 10);
  });

  it('needs the file name to know more than 2 ports in version 1, and refuses a point that runs into the next', () => {
    // Without the name the first line looks like a 2-port point (9 numbers), and the next line is then too short.
    expect(errorOf(() => readTouchstone(FOUR_PORT_V1)).code).toBe('TOUCHSTONE_DATA_LINE_LENGTH');
    const spilled = FOUR_PORT_V1.replace('!row 4', '5.1 0.1 0 !the next point on the same line');
    const error = errorOf(() => readTouchstone(spilled, { expectedPorts: 4 }));
    expect([error.code, error.line]).toEqual(['TOUCHSTONE_DATA_LINE_LENGTH', 3]);
    const cut = FOUR_PORT_V1.split('\n').slice(0, 5).join('\n') + '\n';
    const truncated = errorOf(() => readTouchstone(cut, { expectedPorts: 4 }));
    expect([truncated.code, truncated.line]).toEqual(['TOUCHSTONE_DATA_LINE_LENGTH', 3]);
  });

  it('reads a version-1 5-port row wrapped after 4 pairs', () => {
    const row = (r: number) => Array.from({ length: 5 }, (_, c) => `${(r * 10 + c) / 100} ${r + c}`);
    const lines = ['# MHz S RI R 50'];
    for (let r = 1; r <= 5; r++) {
      const pairs = row(r);
      lines.push(`${r === 1 ? '100' : '   '} ${pairs.slice(0, 4).join(' ')}`, `    ${pairs[4]}`);
    }
    const network = readTouchstone(lines.join('\n') + '\n', { expectedPorts: 5 });
    expect(network.ports).toBe(5);
    expect(at(network, 3, 5, 0)).toEqual(complex(0.34, 7));
    expect(at(network, 5, 1, 0)).toEqual(complex(0.5, 5));
  });

  it('fills a symmetric matrix from [Matrix Format] Lower and Upper of a 3-port file', () => {
    const lower = `[Version] 2.0
# MHz S RI R 50
[Number of Ports] 3
[Number of Frequencies] 1
[Matrix Format] Lower
[Network Data]
868 0.11 0.01
    0.21 0.02 0.22 0.03
    0.31 0.04 0.32 0.05 0.33 0.06
[End]
`;
    const upper = lower
      .replace('Lower', 'Upper')
      .replace(
        '868 0.11 0.01\n    0.21 0.02 0.22 0.03\n    0.31 0.04 0.32 0.05 0.33 0.06',
        '868 0.11 0.01 0.21 0.02 0.31 0.04\n    0.22 0.03 0.32 0.05\n    0.33 0.06',
      );
    for (const text of [lower, upper]) {
      const network = readTouchstone(text);
      expect(network.matrixFormat === 'Lower' || network.matrixFormat === 'Upper').toBe(true);
      expect(at(network, 1, 2, 0)).toEqual(complex(0.21, 0.02));
      expect(at(network, 2, 1, 0)).toEqual(complex(0.21, 0.02));
      expect(at(network, 1, 3, 0)).toEqual(complex(0.31, 0.04));
      expect(at(network, 3, 2, 0)).toEqual(complex(0.32, 0.05));
      expect(at(network, 3, 3, 0)).toEqual(complex(0.33, 0.06));
    }
  });

  it('reads back what the writer writes for 3 to 12 ports, version 1 and version 2 Full, Lower and Upper', () => {
    for (const ports of [3, 4, 5, 8, 12]) {
      const frequenciesHz = Float64Array.from({ length: 7 }, (_, i) => 1e9 + i * 1e6);
      // Symmetric (reciprocal) data, so that half a matrix describes the whole.
      const value = (element: number, i: number) => {
        const row = Math.floor(element / ports);
        const column = element % ports;
        const key = Math.min(row, column) * 100 + Math.max(row, column);
        return complex(((key * 7 + i) % 97) / 100, 0 - ((key * 3 + i) % 89) / 100); // 0 - x: never a -0, which text cannot carry
      };
      const data = Array.from({ length: ports * ports }, (_, e) => ({
        re: Float64Array.from(frequenciesHz, (_, i) => value(e, i).re),
        im: Float64Array.from(frequenciesHz, (_, i) => value(e, i).im),
      }));
      const variants = [
        { version: 1 as const, matrixFormat: 'Full' as const },
        { version: 2 as const, matrixFormat: 'Full' as const },
        { version: 2 as const, matrixFormat: 'Lower' as const },
        { version: 2 as const, matrixFormat: 'Upper' as const },
      ];
      for (const variant of variants) {
        const text = writeTouchstone({ ...variant, ports, frequenciesHz, data, format: 'RI', frequencyUnit: 'Hz' });
        const network = readTouchstone(text, { expectedPorts: ports });
        expect(network.ports).toBe(ports);
        for (let e = 0; e < ports * ports; e++) {
          expect([...network.s[e].re]).toEqual([...data[e].re]);
          expect([...network.s[e].im]).toEqual([...data[e].im]);
        }
      }
    }
  });
});

describe(writeTouchstone.name, () => {
  // DB cannot write |S| = 0 (−∞ dB), so points keep a magnitude of at least 1e-6.
  const point = fc
    .record({ re: fc.double({ min: -0.7, max: 0.7, noNaN: true }), im: fc.double({ min: -0.7, max: 0.7, noNaN: true }) })
    .map((p) => (Math.hypot(p.re, p.im) < 1e-6 ? { re: 0.5, im: p.im } : p));
  const networkShape = fc.record({
    version: fc.constantFrom(1 as const, 2 as const),
    ports: fc.constantFrom(1 as const, 2 as const),
    format: fc.constantFrom('RI' as const, 'MA' as const, 'DB' as const),
    frequencyUnit: fc.constantFrom('Hz' as const, 'kHz' as const, 'MHz' as const, 'GHz' as const),
    twoPortDataOrder: fc.constantFrom('12_21' as const, '21_12' as const),
    reference: fc.constantFrom(50, 75, 100),
    steps: fc.array(fc.integer({ min: 1, max: 1_000_000 }), { minLength: 1, maxLength: 20 }),
    values: fc.array(point, { minLength: 80, maxLength: 80 }),
  });

  it('round-trips through readTouchstone for every version, port count, format, unit and order (property)', () => {
    fc.assert(
      fc.property(networkShape, (shape) => {
        let frequency = 1e6;
        const frequenciesHz = shape.steps.map((step) => (frequency += step * 1000));
        const elements = shape.ports * shape.ports;
        const data = Array.from({ length: elements }, (_, e) => ({
          re: frequenciesHz.map((_, i) => shape.values[(i * elements + e) % 80].re),
          im: frequenciesHz.map((_, i) => shape.values[(i * elements + e) % 80].im),
        }));
        const text = writeTouchstone({ ...shape, frequenciesHz, data, referenceOhms: [shape.reference] });
        const network = readTouchstone(text, { expectedPorts: shape.ports });
        expect(network.referenceOhms.every((r) => r === shape.reference)).toBe(true);
        frequenciesHz.forEach((f, i) => {
          expect(network.frequenciesHz[i]).toBeCloseTo(f, 3);
          for (let e = 0; e < elements; e++) {
            const tolerance = shape.format === 'RI' ? 0 : 1e-12;
            expect(Math.abs(network.s[e].re[i] - data[e].re[i])).toBeLessThanOrEqual(tolerance);
            expect(Math.abs(network.s[e].im[i] - data[e].im[i])).toBeLessThanOrEqual(tolerance);
          }
        });
      }),
      { numRuns: 300 },
    );
  });

  it('random corruptions give a TouchstoneError or a valid network, never another exception (property)', () => {
    const alphabet = [
      '!',
      '#',
      '[',
      ']',
      ' ',
      '\n',
      '\r',
      '\t',
      '-',
      '+',
      '.',
      'e',
      'E',
      'x',
      '0',
      '9',
      'R',
      'MHz',
      '[End]',
      '[Network Data]',
      '1e999',
      ',',
      'NaN',
    ];
    fc.assert(
      fc.property(
        fc.constantFrom(EXAMPLE_A, EXAMPLE_B, EXAMPLE_C),
        fc.array(fc.record({ at: fc.nat(), remove: fc.nat({ max: 6 }), insert: fc.constantFrom(...alphabet) }), { minLength: 1, maxLength: 6 }),
        (base, edits) => {
          let text = base;
          for (const edit of edits) {
            const position = edit.at % (text.length + 1);
            text = text.slice(0, position) + edit.insert + text.slice(position + edit.remove);
          }
          try {
            const network = readTouchstone(text);
            expect(network.frequenciesHz.length).toBeGreaterThan(0);
          } catch (error) {
            expect(error).toBeInstanceOf(TouchstoneError);
            expect(typeof (error as TouchstoneError).code).toBe('string');
          }
        },
      ),
      { numRuns: 3000 },
    );
  });

  it('random bytes never crash or hang the reader (property)', () => {
    fc.assert(
      fc.property(fc.uint8Array({ maxLength: 400 }), (bytes) => {
        try {
          readTouchstone(bytes);
        } catch (error) {
          expect(error).toBeInstanceOf(TouchstoneError);
        }
      }),
      { numRuns: 2000 },
    );
  });
});

describe('readTouchstone bounds', () => {
  const header = '# MHz S RI R 50\n';
  const refused = (text: string, options: Parameters<typeof readTouchstone>[1] = {}) => {
    try {
      readTouchstone(text, options);
    } catch (error) {
      return { code: (error as TouchstoneError).code, line: (error as TouchstoneError).line };
    }
    throw new Error('the file was accepted');
  };

  it.each([
    ['NaN', `${header}800 0.1 0\n900 NaN 0\n`, 3],
    ['Infinity', `${header}800 0.1 0\n900 Infinity 0\n`, 3],
    ['1e309', `${header}800 0.1 0\n900 1e309 0\n`, 3],
    ['a frequency that overflows in Hz', `# GHz S RI R 50\n1 0.1 0\n1e300 0.1 0\n`, 3],
    ['a dB value that overflows', `# MHz S DB R 50\n800 -10 0\n900 7000 0\n`, 3],
    ['a Z point that divides by zero', `# MHz Z RI R 50\n800 1 0\n900 -1 0\n`, 3],
  ])('refuses %s with TOUCHSTONE_BAD_NUMBER and its line', (_name, text, line) => {
    expect(refused(text)).toEqual({ code: 'TOUCHSTONE_BAD_NUMBER', line });
  });

  it('refuses a line longer than the limit, with its line number, before reading it as text', () => {
    expect(refused(`${header}800 0.1 0\n# ${'x'.repeat(100)}\n`, { maxLineBytes: 64 })).toEqual({ code: 'TOUCHSTONE_LINE_TOO_LONG', line: 3 });
    expect(refused(`${header}800 0.1 0 ${' 1'.repeat(100)}\n`, { maxLineBytes: 64 })).toMatchObject({ line: 2 });
    expect(refused(`${header}800 ${'1'.repeat(200)} 0\n`)).toEqual({ code: 'TOUCHSTONE_BAD_NUMBER', line: 2 });
  });

  it('refuses the point past maxPoints with its line, and records the line of every point', () => {
    const text = `${header}! comment\n800 0.1 0\n\n900 0.2 0\n1000 0.3 0\n`;
    expect(refused(text, { maxPoints: 2 })).toEqual({ code: 'TOUCHSTONE_TOO_MANY_POINTS', line: 6 });
    expect([...readTouchstone(text, { maxPoints: 3 }).pointLines]).toEqual([3, 5, 6]);
  });
});
