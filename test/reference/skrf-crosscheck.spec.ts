import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { type Complex, add, complex, div, inverse, magnitude } from '../../src-server/rf/complex';
import { gammaFromImpedance, returnLossDbFromGammaMagnitude, vswrFromGammaMagnitude } from '../../src-server/rf/mismatch';
import { impedanceAtIndex, matchedRanges, reflectionCurveFromNetwork } from '../../src-server/rf/reflection';
import { portsFromFileName, readTouchstone } from '../../src-server/rf/touchstone';
import { type ComplexColumns, type TouchstoneWriteInput, writeTouchstone } from '../../src-server/rf/touchstone-writer';

// Outside reference: scikit-rf from Debian's python3-scikit-rf, reached through Debian's own interpreter
// (the pyenv python3 on PATH does not see Debian's packages).
const DEBIAN_PYTHON = '/usr/bin/python3';
const DUMP_SCRIPT = join(__dirname, 'skrf_dump.py');
const RELATIVE_TOLERANCE = 1e-9;
const VSWR_MAX = 2;

interface SkrfPort {
  port: 1 | 2;
  sRe: number[];
  sIm: number[];
  sMagnitude: number[];
  vswr: number[];
  returnLossDb: number[];
  zRe: number[];
  zIm: number[];
  matchedRanges: [number, number][];
}

interface SkrfResult {
  path: string;
  skrfVersion: string;
  frequenciesHz: number[];
  ports: SkrfPort[];
}

/** Invented series-RLC resonator: Z = R + j(ωL − 1/(ωC)), resonant at f0 with quality q. */
function resonatorOhms(frequencyHz: number, f0Hz: number, resistanceOhms: number, q: number): Complex {
  const x = resistanceOhms * q * (frequencyHz / f0Hz - f0Hz / frequencyHz);
  return complex(resistanceOhms, x);
}

function columns(count: number, valueAt: (i: number) => Complex): ComplexColumns {
  const re = new Float64Array(count);
  const im = new Float64Array(count);
  for (let i = 0; i < count; i++) {
    const v = valueAt(i);
    re[i] = v.re;
    im[i] = v.im;
  }
  return { re, im };
}

interface Shape {
  readonly name: string;
  readonly input: TouchstoneWriteInput;
}

function sweep(fromHz: number, toHz: number, count: number): Float64Array {
  return Float64Array.from({ length: count }, (_, i) => fromHz + ((toHz - fromHz) * i) / (count - 1));
}

function shapes(): Shape[] {
  const list: Shape[] = [];
  const f1 = sweep(700e6, 1000e6, 601);
  const f2 = sweep(2.3e9, 2.6e9, 301);
  const gammaOf = (f: Float64Array, f0: number, r: number, q: number, z0: number) =>
    columns(f.length, (i) => gammaFromImpedance(resonatorOhms(f[i], f0, r, q), z0));
  const transfer = (f: Float64Array, scale: number) => columns(f.length, (i) => complex(scale * Math.cos(i / 40), -scale * Math.sin(i / 40)));
  for (const format of ['RI', 'MA', 'DB'] as const) {
    for (const frequencyUnit of ['Hz', 'kHz', 'MHz', 'GHz'] as const) {
      for (const version of [1, 2] as const) {
        list.push({
          name: `${version === 1 ? 'v1' : 'v2'} 1-port S ${format} ${frequencyUnit}`,
          input: { version, ports: 1, format, frequencyUnit, frequenciesHz: f1, data: [gammaOf(f1, 868e6, 42, 8, 50)], comments: ['invented resonator'] },
        });
      }
    }
  }
  list.push({
    name: 'v1 1-port S RI 75 ohm',
    input: { version: 1, ports: 1, format: 'RI', frequencyUnit: 'MHz', referenceOhms: [75], frequenciesHz: f1, data: [gammaOf(f1, 900e6, 60, 5, 75)] },
  });
  for (const format of ['RI', 'MA', 'DB'] as const) {
    const data = [gammaOf(f2, 2.45e9, 40, 6, 50), transfer(f2, 0.9), transfer(f2, 0.05), gammaOf(f2, 2.5e9, 70, 4, 50)];
    list.push({ name: `v1 2-port S ${format}`, input: { version: 1, ports: 2, format, frequencyUnit: 'GHz', frequenciesHz: f2, data } });
    for (const twoPortDataOrder of ['12_21', '21_12'] as const) {
      list.push({
        name: `v2 2-port S ${format} ${twoPortDataOrder}`,
        input: { version: 2, ports: 2, format, frequencyUnit: 'MHz', twoPortDataOrder, frequenciesHz: f2, data },
      });
    }
  }
  const data75 = [gammaOf(f2, 2.45e9, 40, 6, 50), transfer(f2, 0.9), transfer(f2, 0.05), gammaOf(f2, 2.44e9, 90, 6, 75)];
  list.push({
    name: 'v2 2-port S references 50/75',
    input: { version: 2, ports: 2, format: 'MA', frequencyUnit: 'GHz', referenceOhms: [50, 75], frequenciesHz: f2, data: data75 },
  });
  list.push({
    name: 'v1 2-port S with noise block',
    input: {
      version: 1,
      ports: 2,
      format: 'DB',
      frequencyUnit: 'GHz',
      frequenciesHz: f2,
      data: data75,
      noise: [
        [2.3e9, 1.2, 0.4, 30, 0.3],
        [2.5e9, 1.3, 0.4, 35, 0.3],
      ],
    },
  });
  // Z and Y: version 1 normalised to R, version 2 in ohms and siemens (Touchstone 2.0, Option Line).
  const z = (f: Float64Array, scale: number) =>
    columns(f.length, (i) => {
      const v = resonatorOhms(f[i], 868e6, 45, 7);
      return complex(v.re * scale, v.im * scale);
    });
  const y = (f: Float64Array, scale: number) =>
    columns(f.length, (i) => {
      const v = inverse(resonatorOhms(f[i], 868e6, 45, 7));
      return complex(v.re * scale, v.im * scale);
    });
  list.push({
    name: 'v1 1-port Z RI',
    input: { version: 1, ports: 1, parameter: 'Z', format: 'RI', frequencyUnit: 'MHz', referenceOhms: [50], frequenciesHz: f1, data: [z(f1, 1 / 50)] },
  });
  list.push({
    name: 'v1 1-port Y MA 75',
    input: { version: 1, ports: 1, parameter: 'Y', format: 'MA', frequencyUnit: 'GHz', referenceOhms: [75], frequenciesHz: f1, data: [y(f1, 75)] },
  });
  list.push({
    name: 'v2 1-port Z RI ohms',
    input: { version: 2, ports: 1, parameter: 'Z', format: 'RI', frequencyUnit: 'MHz', referenceOhms: [50], frequenciesHz: f1, data: [z(f1, 1)] },
  });
  list.push({
    name: 'v2 1-port Y DB siemens',
    input: { version: 2, ports: 1, parameter: 'Y', format: 'DB', frequencyUnit: 'kHz', referenceOhms: [50], frequenciesHz: f1, data: [y(f1, 1)] },
  });
  // A 2-port T-network: Z = [[za + zc, zc], [zc, zb + zc]] with an invented resonant za.
  const tNetwork = (f: Float64Array, scale: number) => {
    const za = (i: number) => resonatorOhms(f[i], 868e6, 30, 6);
    const zb = complex(20, -15);
    const zc = complex(150, 40);
    return [columns(f.length, (i) => add(za(i), zc)), columns(f.length, () => zc), columns(f.length, () => zc), columns(f.length, () => add(zb, zc))].map(
      (c) => ({
        re: Float64Array.from(c.re, (v) => v * scale),
        im: Float64Array.from(c.im, (v) => v * scale),
      }),
    );
  };
  list.push({
    name: 'v1 2-port Z RI',
    input: { version: 1, ports: 2, parameter: 'Z', format: 'RI', frequencyUnit: 'MHz', frequenciesHz: f1, data: tNetwork(f1, 1 / 50) },
  });
  list.push({
    name: 'v2 2-port Z MA 12_21 references 50/75',
    input: {
      version: 2,
      ports: 2,
      parameter: 'Z',
      format: 'MA',
      frequencyUnit: 'MHz',
      twoPortDataOrder: '12_21',
      referenceOhms: [50, 75],
      frequenciesHz: f1,
      data: tNetwork(f1, 1),
    },
  });
  return list;
}

function expectRelativelyClose(actual: number, expected: number, what: string): void {
  const scale = Math.max(Math.abs(expected), 1e-12);
  if (Math.abs(actual - expected) > RELATIVE_TOLERANCE * scale) {
    throw new Error(`${what}: Bandwright ${actual} vs scikit-rf ${expected} (relative ${Math.abs(actual - expected) / scale})`);
  }
}

describe('scikit-rf cross-check (Debian python3-scikit-rf)', () => {
  const workDir = mkdtempSync(join(tmpdir(), 'bandwright-skrf-'));
  const cases = shapes().map((shape, k) => {
    const extension = shape.input.version === 2 ? 'ts' : `s${shape.input.ports}p`;
    const path = join(workDir, `case${k}.${extension}`);
    writeFileSync(path, writeTouchstone(shape.input));
    return { ...shape, path };
  });
  let skrfByPath = new Map<string, SkrfResult>();

  beforeAll(() => {
    try {
      execFileSync(DEBIAN_PYTHON, ['-c', 'import skrf'], { stdio: 'pipe' });
    } catch (error) {
      throw new Error(
        `${DEBIAN_PYTHON} cannot import skrf, so the scikit-rf cross-check cannot run. Install Debian's python3-scikit-rf ` +
          `(apt-get install python3-scikit-rf; npm test does this). ${(error as Error).message}`,
        { cause: error },
      );
    }
    const manifest = join(workDir, 'manifest.json');
    const output = join(workDir, 'skrf.json');
    writeFileSync(manifest, JSON.stringify({ files: cases.map((c) => c.path), vswrMax: VSWR_MAX }));
    execFileSync(DEBIAN_PYTHON, [DUMP_SCRIPT, manifest, output], { stdio: 'pipe', timeout: 120_000 });
    const parsed = JSON.parse(readFileSync(output, 'utf8')) as { results: SkrfResult[] };
    skrfByPath = new Map(parsed.results.map((r) => [r.path, r]));
  }, 150_000);

  afterAll(() => rmSync(workDir, { recursive: true, force: true }));

  it('generates every shape the brief asks for', () => {
    expect(cases.length).toBeGreaterThanOrEqual(30);
  });

  it.each(cases.map((c) => [c.name, c] as const))('%s: |S|, VSWR, return loss and impedance per point agree to 1e-9 relative', (_, testCase) => {
    const reference = skrfByPath.get(testCase.path);
    if (!reference) throw new Error(`scikit-rf gave no result for ${testCase.path}`);
    const network = readTouchstone(readFileSync(testCase.path), { expectedPorts: portsFromFileName(testCase.path) });
    expect(network.frequenciesHz.length).toBe(reference.frequenciesHz.length);
    network.frequenciesHz.forEach((f, i) => expectRelativelyClose(f, reference.frequenciesHz[i], `frequency ${i}`));
    expect(reference.ports.length).toBe(network.ports);
    for (const port of reference.ports) {
      const curve = reflectionCurveFromNetwork(network, port.port);
      for (let i = 0; i < curve.frequenciesHz.length; i++) {
        const at = `port ${port.port} point ${i}`;
        expectRelativelyClose(curve.gammaRe[i], port.sRe[i], `${at} Re S`);
        expectRelativelyClose(curve.gammaIm[i], port.sIm[i], `${at} Im S`);
        expectRelativelyClose(curve.gammaMagnitude[i], port.sMagnitude[i], `${at} |S|`);
        expectRelativelyClose(vswrFromGammaMagnitude(curve.gammaMagnitude[i]), port.vswr[i], `${at} VSWR`);
        expectRelativelyClose(returnLossDbFromGammaMagnitude(curve.gammaMagnitude[i]), port.returnLossDb[i], `${at} return loss`);
        const z = impedanceAtIndex(curve, i);
        const zReference = complex(port.zRe[i], port.zIm[i]);
        const difference = magnitude(div(complex(z.re - zReference.re, z.im - zReference.im), zReference));
        if (difference > RELATIVE_TOLERANCE) throw new Error(`${at} impedance ${z.re}+j${z.im} vs scikit-rf ${zReference.re}+j${zReference.im}`);
      }
    }
  });

  it.each(cases.map((c) => [c.name, c] as const))('%s: matched ranges (VSWR ≤ 2) agree within one frequency step', (_, testCase) => {
    const reference = skrfByPath.get(testCase.path)!;
    const network = readTouchstone(readFileSync(testCase.path));
    const step = network.frequenciesHz[1] - network.frequenciesHz[0];
    for (const port of reference.ports) {
      const ranges = matchedRanges(reflectionCurveFromNetwork(network, port.port), { kind: 'vswr', maxVswr: VSWR_MAX });
      expect(ranges.length).toBe(port.matchedRanges.length);
      ranges.forEach((range, k) => {
        expect(Math.abs(range.fromHz - port.matchedRanges[k][0])).toBeLessThanOrEqual(step * (1 + 1e-9));
        expect(Math.abs(range.toHz - port.matchedRanges[k][1])).toBeLessThanOrEqual(step * (1 + 1e-9));
      });
    }
  });

  it('the resonator shapes do have matched ranges, so the edge comparison is not vacuous', () => {
    const withRanges = [...skrfByPath.values()].filter((r) => r.ports.some((p) => p.matchedRanges.length > 0));
    expect(withRanges.length).toBeGreaterThan(cases.length / 2);
  });
});
