/**
 * Touchstone benchmark: writes a 100,000-point .s2p, parses it and computes its matched ranges,
 * then times Debian's scikit-rf reading the same file in the same run. Figures are printed, not asserted.
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

const POINTS = 100_000;
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

function synthesiseFile(path: string): void {
  const frequenciesHz = new Float64Array(POINTS);
  const columns = Array.from({ length: 4 }, () => ({ re: new Float64Array(POINTS), im: new Float64Array(POINTS) }));
  for (let i = 0; i < POINTS; i++) {
    const f = 600e6 + (5.4e9 * i) / (POINTS - 1);
    frequenciesHz[i] = f;
    // Invented dual-resonance antenna on port 1, a single resonance on port 2, a lossy thru between them.
    const low = 40 * 8 * (f / 868e6 - 868e6 / f);
    const high = 35 * 5 * (f / 2.45e9 - 2.45e9 / f);
    const s11 = gammaFromImpedance(complex(42, Math.abs(low) < Math.abs(high) ? low : high), 50);
    const s22 = gammaFromImpedance(complex(60, 50 * 4 * (f / 1.8e9 - 1.8e9 / f)), 50);
    const thru = complex(0.7 * Math.cos(f / 1e8), -0.7 * Math.sin(f / 1e8));
    const values = [s11, thru, thru, s22];
    values.forEach((v, k) => {
      columns[k].re[i] = v.re;
      columns[k].im[i] = v.im;
    });
  }
  // 9 significant digits, as a measurement instrument writes them.
  const formatNumber = (value: number) => Number(value.toPrecision(9)).toString();
  writeFileSync(
    path,
    writeTouchstone({
      version: 1,
      ports: 2,
      format: 'MA',
      frequencyUnit: 'GHz',
      frequenciesHz,
      data: columns,
      formatNumber,
      comments: ['invented benchmark data'],
    }),
  );
}

function timeOursMs(bytes: Buffer): { bestMs: number; firstMs: number; ranges: number } {
  let bestMs = Infinity;
  let firstMs = NaN;
  let ranges = 0;
  for (let round = 0; round < ROUNDS; round++) {
    const start = process.hrtime.bigint();
    const network = readTouchstone(bytes, { expectedPorts: 2 });
    ranges = matchedRanges(reflectionCurveFromNetwork(network, 1)).length + matchedRanges(reflectionCurveFromNetwork(network, 2)).length;
    const elapsedMs = Number(process.hrtime.bigint() - start) / 1e6;
    if (round === 0) firstMs = elapsedMs;
    bestMs = Math.min(bestMs, elapsedMs);
  }
  return { bestMs, firstMs, ranges };
}

function main(): void {
  const dir = mkdtempSync(join(tmpdir(), 'bandwright-bench-'));
  try {
    const path = join(dir, 'bench.s2p');
    synthesiseFile(path);
    const sizeMb = statSync(path).size / 1e6;
    const fileBytes = readFileSync(path);
    const ours = timeOursMs(fileBytes);
    const oursSeconds = ours.bestMs / 1000;
    console.log(`file: ${POINTS} points, ${sizeMb.toFixed(2)} MB (2-port, MA, GHz)`);
    console.log(
      `bandwright parse + matched ranges (best of ${ROUNDS}): ${ours.bestMs.toFixed(1)} ms, ${(sizeMb / oursSeconds).toFixed(1)} MB/s, ${Math.round(POINTS / oursSeconds).toLocaleString('en')} points/s, ${ours.ranges} matched ranges; first (cold) run ${ours.firstMs.toFixed(1)} ms`,
    );

    let skrf: { best: number; points: number; version: string };
    const totalStart = process.hrtime.bigint();
    try {
      const output = execFileSync(DEBIAN_PYTHON, ['-c', SKRF_TIMER, path, String(ROUNDS)], { encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'] });
      const line = output.split('\n').find((l) => l.startsWith('SKRF_RESULT '));
      if (!line) throw new Error(`no result line in: ${output}`);
      skrf = JSON.parse(line.slice('SKRF_RESULT '.length));
    } catch (error) {
      console.error(`scikit-rf could not run (${DEBIAN_PYTHON} needs python3-scikit-rf): ${(error as Error).message}`);
      process.exitCode = 1;
      return;
    }
    const totalSeconds = Number(process.hrtime.bigint() - totalStart) / 1e9;
    console.log(
      `scikit-rf ${skrf.version} Network() read (best of ${ROUNDS}, inside python): ${(skrf.best * 1000).toFixed(1)} ms, ${(sizeMb / skrf.best).toFixed(1)} MB/s, ${Math.round(skrf.points / skrf.best).toLocaleString('en')} points/s`,
    );
    console.log(`scikit-rf process total for ${ROUNDS} reads incl. interpreter start and imports: ${(totalSeconds * 1000).toFixed(0)} ms`);
    const ratio = skrf.best / oursSeconds;
    console.log(`ratio (scikit-rf read time / bandwright parse + ranges): ${ratio.toFixed(1)}x (target >= 3x) ${ratio >= 3 ? 'MET' : 'NOT MET'}`);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

main();
