/**
 * Touchstone benchmark: writes a 100,000-point .s2p (parsed, then its matched ranges computed), a 10,000-point
 * .s4p and a 1,000-point .s16p (parsed), and times Debian's scikit-rf reading the same files in the same run.
 * Figures are printed, not asserted.
 * Run: npx tsc -p tsconfig.bench.json && node dist/bench/bench/rf-bench.js
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { complex } from '../rf/complex';
import { gammaFromImpedance } from '../rf/mismatch';
import { matchedRanges, reflectionCurveFromNetwork } from '../rf/reflection';
import { readTouchstone } from '../rf/touchstone';
import { writeTouchstone } from '../rf/touchstone-writer';

const ROUNDS = 5;
const DEBIAN_PYTHON = '/usr/bin/python3';

// Times only Network() inside python; numpy's removed np.complex alias is restored for skrf 0.15.
const SKRF_TIMER = `
import sys, time, json
import numpy as np
if not hasattr(np, 'complex'):
    np.complex = complex
import skrf
times = []
for _ in range(int(sys.argv[2])):
    start = time.perf_counter()
    network = skrf.Network(sys.argv[1])
    times.append(time.perf_counter() - start)
print('SKRF_RESULT ' + json.dumps({'best': min(times), 'points': int(network.f.size), 'version': skrf.__version__}))
`;

interface BenchCase {
  readonly ports: number;
  readonly points: number;
  /** The 2-port case also computes matched ranges of both ports, as an upload does. */
  readonly withRanges: boolean;
}

const CASES: readonly BenchCase[] = [
  { ports: 2, points: 100_000, withRanges: true },
  { ports: 4, points: 10_000, withRanges: false },
  { ports: 16, points: 1_000, withRanges: false },
];

/** Invented antennas on the diagonal (resonators at spread frequencies), a lossy coupling between every pair. */
function synthesiseFile(path: string, ports: number, points: number): void {
  const frequenciesHz = new Float64Array(points);
  const columns = Array.from({ length: ports * ports }, () => ({ re: new Float64Array(points), im: new Float64Array(points) }));
  for (let i = 0; i < points; i++) {
    const f = 600e6 + (5.4e9 * i) / (points - 1);
    frequenciesHz[i] = f;
    for (let row = 0; row < ports; row++) {
      for (let column = 0; column < ports; column++) {
        let value;
        if (row === column) {
          const f0 = 868e6 * (1 + row * 0.37);
          value = gammaFromImpedance(complex(40 + row, 50 * 6 * (f / f0 - f0 / f)), 50);
        } else {
          const coupling = 0.7 / (1 + Math.abs(row - column));
          value = complex(coupling * Math.cos(f / 1e8 + row), -coupling * Math.sin(f / 1e8 + column));
        }
        columns[row * ports + column].re[i] = value.re;
        columns[row * ports + column].im[i] = value.im;
      }
    }
  }
  // 9 significant digits, as a measurement instrument writes them.
  const formatNumber = (value: number) => Number(value.toPrecision(9)).toString();
  writeFileSync(
    path,
    writeTouchstone({
      version: 1,
      ports,
      format: 'MA',
      frequencyUnit: 'GHz',
      frequenciesHz,
      data: columns,
      formatNumber,
      comments: ['invented benchmark data'],
    }),
  );
}

function timeOursMs(bytes: Buffer, benchCase: BenchCase): { bestMs: number; firstMs: number; ranges: number } {
  let bestMs = Infinity;
  let firstMs = NaN;
  let ranges = 0;
  for (let round = 0; round < ROUNDS; round++) {
    const start = process.hrtime.bigint();
    const network = readTouchstone(bytes, { expectedPorts: benchCase.ports });
    if (benchCase.withRanges) {
      ranges = matchedRanges(reflectionCurveFromNetwork(network, 1)).length + matchedRanges(reflectionCurveFromNetwork(network, 2)).length;
    }
    const elapsedMs = Number(process.hrtime.bigint() - start) / 1e6;
    if (round === 0) firstMs = elapsedMs;
    bestMs = Math.min(bestMs, elapsedMs);
  }
  return { bestMs, firstMs, ranges };
}

function runCase(dir: string, benchCase: BenchCase): number | null {
  const { ports, points } = benchCase;
  const path = join(dir, `bench.s${ports}p`);
  synthesiseFile(path, ports, points);
  const sizeMb = statSync(path).size / 1e6;
  const values = points * ports * ports;
  const ours = timeOursMs(readFileSync(path), benchCase);
  const oursSeconds = ours.bestMs / 1000;
  console.log(`\nfile: ${ports}-port, ${points.toLocaleString('en')} points, ${sizeMb.toFixed(2)} MB (version 1, MA, GHz)`);
  console.log(
    `  bandwright parse${benchCase.withRanges ? ' + matched ranges' : ''} (best of ${ROUNDS}): ${ours.bestMs.toFixed(1)} ms, ${(sizeMb / oursSeconds).toFixed(1)} MB/s, ` +
      `${Math.round(values / oursSeconds).toLocaleString('en')} complex values/s${benchCase.withRanges ? `, ${ours.ranges} matched ranges` : ''}; first (cold) run ${ours.firstMs.toFixed(1)} ms`,
  );
  let skrf: { best: number; points: number; version: string };
  try {
    const output = execFileSync(DEBIAN_PYTHON, ['-c', SKRF_TIMER, path, String(ROUNDS)], { encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'] });
    const line = output.split('\n').find((l) => l.startsWith('SKRF_RESULT '));
    if (!line) throw new Error(`no result line in: ${output}`);
    skrf = JSON.parse(line.slice('SKRF_RESULT '.length));
  } catch (error) {
    console.error(`scikit-rf could not run (${DEBIAN_PYTHON} needs python3-scikit-rf): ${(error as Error).message}`);
    process.exitCode = 1;
    return null;
  }
  console.log(
    `  scikit-rf ${skrf.version} Network() read (best of ${ROUNDS}, inside python): ${(skrf.best * 1000).toFixed(1)} ms, ${(sizeMb / skrf.best).toFixed(1)} MB/s`,
  );
  const ratio = skrf.best / oursSeconds;
  console.log(`  ratio (scikit-rf read time / bandwright): ${ratio.toFixed(1)}x (target >= 3x) ${ratio >= 3 ? 'MET' : 'NOT MET'}`);
  return values / oursSeconds;
}

function main(): void {
  const dir = mkdtempSync(join(tmpdir(), 'bandwright-bench-'));
  try {
    const throughputs = CASES.map((benchCase) => runCase(dir, benchCase));
    const twoPort = throughputs[0];
    if (twoPort !== null) {
      // Per-value throughput of the N-port reads against the 2-port read (target: within 2x of it).
      CASES.slice(1).forEach((benchCase, k) => {
        const own = throughputs[k + 1];
        if (own === null) return;
        const slowdown = twoPort / own;
        console.log(
          `${benchCase.ports}-port per-value throughput vs 2-port: ${slowdown.toFixed(2)}x slower (target <= 2x) ${slowdown <= 2 ? 'MET' : 'NOT MET'}`,
        );
      });
    }
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

main();
