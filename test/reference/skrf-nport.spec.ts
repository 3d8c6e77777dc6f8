import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { portsFromFileName, readTouchstone, type TouchstoneNetwork } from '../../src-server/rf/touchstone';
import { writeTouchstone } from '../../src-server/rf/touchstone-writer';

// Outside reference: scikit-rf from Debian's python3-scikit-rf (0.15), reached through Debian's own interpreter.
// It reads the multi-port files its package ships and writes random N-port networks of its own (skrf_nport.py).
const DEBIAN_PYTHON = '/usr/bin/python3';
const SCRIPT = join(__dirname, 'skrf_nport.py');
const RELATIVE_TOLERANCE = 1e-9;

interface SkrfNetwork {
  kind: 'shipped' | 'generated';
  path: string;
  ports: number;
  frequenciesHz: number[];
  sRe: number[];
  sIm: number[];
  skrfError?: string;
}

/** Every S element of every point within 1e-9 of scikit-rf's, relative to the element's magnitude. */
function expectSameNetwork(network: TouchstoneNetwork, reference: SkrfNetwork, label: string): void {
  const ports = reference.ports;
  expect(network.ports).toBe(ports);
  expect(network.frequenciesHz.length).toBe(reference.frequenciesHz.length);
  network.frequenciesHz.forEach((f, i) => {
    if (Math.abs(f - reference.frequenciesHz[i]) > RELATIVE_TOLERANCE * Math.abs(reference.frequenciesHz[i])) {
      throw new Error(`${label} frequency ${i}: ${f} vs scikit-rf ${reference.frequenciesHz[i]}`);
    }
  });
  for (let i = 0; i < network.frequenciesHz.length; i++) {
    for (let row = 0; row < ports; row++) {
      for (let column = 0; column < ports; column++) {
        const flat = (i * ports + row) * ports + column;
        const element = network.s[row * ports + column];
        const re = element.re[i];
        const im = element.im[i];
        const scale = Math.max(Math.hypot(reference.sRe[flat], reference.sIm[flat]), 1e-12);
        const difference = Math.hypot(re - reference.sRe[flat], im - reference.sIm[flat]);
        if (difference > RELATIVE_TOLERANCE * scale) {
          throw new Error(`${label} point ${i} S${row + 1},${column + 1}: ${re}+j${im} vs scikit-rf ${reference.sRe[flat]}+j${reference.sIm[flat]}`);
        }
      }
    }
  }
}

describe('N-port Touchstone against scikit-rf (Debian python3-scikit-rf)', () => {
  const workDir = mkdtempSync(join(tmpdir(), 'bandwright-skrf-nport-'));
  let networks: SkrfNetwork[] = [];

  beforeAll(() => {
    const output = join(workDir, 'skrf.json');
    execFileSync(DEBIAN_PYTHON, [SCRIPT, workDir, output], { stdio: 'pipe', timeout: 240_000 });
    networks = (JSON.parse(readFileSync(output, 'utf8')) as { results: SkrfNetwork[] }).results;
  }, 300_000);
  afterAll(() => rmSync(workDir, { recursive: true, force: true }));

  it('has files of many shapes to compare: shipped files of 3 to 9 ports and generated ones up to 16', () => {
    const shipped = networks.filter((n) => n.kind === 'shipped' && !n.skrfError);
    expect(shipped.length).toBeGreaterThanOrEqual(20);
    expect(new Set(shipped.map((n) => n.ports)).size).toBeGreaterThanOrEqual(5);
    expect(Math.max(...networks.map((n) => n.ports ?? 0))).toBe(16);
  });

  it('reads every multi-port file scikit-rf ships to the same S-parameters, to 1e-9', () => {
    const shipped = networks.filter((n) => n.kind === 'shipped' && !n.skrfError);
    shipped.forEach((reference, k) => {
      const label = `shipped ${reference.ports}-port file #${k + 1}`;
      const network = readTouchstone(readFileSync(reference.path), { expectedPorts: portsFromFileName(reference.path) });
      expectSameNetwork(network, reference, label);
    });
  });

  it('reads the N-port files scikit-rf writes (version 1, rows wrapped after 4 pairs; RI, MA and DB) to the same S-parameters', () => {
    const generated = networks.filter((n) => n.kind === 'generated');
    expect(generated.length).toBe(21);
    for (const reference of generated) {
      const network = readTouchstone(readFileSync(reference.path), { expectedPorts: reference.ports });
      expectSameNetwork(network, reference, `generated ${reference.ports}-port ${reference.path.slice(-8)}`);
    }
  });

  it('reads the same networks written as version 2 with [Matrix Format] Full, Lower and Upper to scikit-rf values', () => {
    for (const reference of networks.filter((n) => n.kind === 'generated' && n.path.includes('_ri.'))) {
      const ports = reference.ports;
      const points = reference.frequenciesHz.length;
      const data = Array.from({ length: ports * ports }, (_, e) => ({
        re: Float64Array.from({ length: points }, (_, i) => reference.sRe[i * ports * ports + e]),
        im: Float64Array.from({ length: points }, (_, i) => reference.sIm[i * ports * ports + e]),
      }));
      for (const matrixFormat of ['Full', 'Lower', 'Upper'] as const) {
        const text = writeTouchstone({ version: 2, ports, matrixFormat, frequenciesHz: reference.frequenciesHz, data, format: 'RI', frequencyUnit: 'Hz' });
        const path = join(workDir, `v2-${ports}-${matrixFormat}.ts`);
        writeFileSync(path, text);
        expectSameNetwork(readTouchstone(readFileSync(path)), reference, `version 2 ${matrixFormat} ${ports}-port`);
      }
    }
  });
});
