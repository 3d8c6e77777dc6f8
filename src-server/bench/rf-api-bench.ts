/**
 * End-to-end Touchstone benchmark: a 100,000-point .s2p uploaded to POST /api/rf/touchstone/analyze on the
 * real app (booted in-process, listening on BENCH_PORT), timed from the first byte sent to the parsed JSON answer.
 * Figures are printed, not asserted. Run through `npm run bench` (scripts/bench.sh sets the database and fakes).
 */
import 'reflect-metadata';
import { createApp } from '../app.setup';
import { loadConfig } from '../config/app-config';
import { complex } from '../rf/complex';
import { gammaFromImpedance } from '../rf/mismatch';
import { writeTouchstone } from '../rf/touchstone-writer';

const POINTS = 100_000;
const ROUNDS = 5;
const TARGET_MS = 1000;
const PORT = Number(process.env.BENCH_PORT ?? 3200);
const DEMO_EMAIL = 'engineer@bandwright.test';

/** An invented dual-resonance antenna on port 1 and a lossy thru, written as a measurement instrument would (9 digits, MA, GHz). */
function synthesiseFile(): string {
  const frequenciesHz = new Float64Array(POINTS);
  const columns = Array.from({ length: 4 }, () => ({ re: new Float64Array(POINTS), im: new Float64Array(POINTS) }));
  for (let i = 0; i < POINTS; i++) {
    const f = 600e6 + (5.4e9 * i) / (POINTS - 1);
    frequenciesHz[i] = f;
    const low = 40 * 8 * (f / 868e6 - 868e6 / f);
    const high = 35 * 5 * (f / 2.45e9 - 2.45e9 / f);
    const s11 = gammaFromImpedance(complex(42, Math.abs(low) < Math.abs(high) ? low : high), 50);
    const s22 = gammaFromImpedance(complex(60, 50 * 4 * (f / 1.8e9 - 1.8e9 / f)), 50);
    const thru = complex(0.7 * Math.cos(f / 1e8), -0.7 * Math.sin(f / 1e8));
    [s11, thru, thru, s22].forEach((v, k) => {
      columns[k].re[i] = v.re;
      columns[k].im[i] = v.im;
    });
  }
  const formatNumber = (value: number) => Number(value.toPrecision(9)).toString();
  return writeTouchstone({
    version: 1,
    ports: 2,
    format: 'MA',
    frequencyUnit: 'GHz',
    frequenciesHz,
    data: columns,
    formatNumber,
    comments: ['invented benchmark data'],
  });
}

const config = loadConfig();

async function signIn(base: string): Promise<string> {
  const res = await fetch(`${base}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email: DEMO_EMAIL, password: config.demoPassword }),
  });
  if (res.status !== 200) throw new Error(`sign-in as ${DEMO_EMAIL} failed: ${res.status} ${await res.text()}`);
  return ((await res.json()) as { accessToken: string }).accessToken;
}

async function uploadOnce(
  base: string,
  token: string,
  file: Blob,
): Promise<{ ms: number; body: { points: number; matchedRanges: unknown[]; curve: unknown[] } }> {
  const form = new FormData();
  form.append('file', file, 'bench.s2p');
  const start = process.hrtime.bigint();
  const res = await fetch(`${base}/api/rf/touchstone/analyze`, { method: 'POST', headers: { Authorization: `Bearer ${token}` }, body: form });
  const body = await res.json();
  const ms = Number(process.hrtime.bigint() - start) / 1e6;
  if (res.status !== 200) throw new Error(`analyze answered ${res.status}: ${JSON.stringify(body)}`);
  return { ms, body };
}

const median = (values: number[]) => {
  const sorted = [...values].sort((a, b) => a - b);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[middle] : (sorted[middle - 1] + sorted[middle]) / 2;
};

async function main(): Promise<void> {
  const text = synthesiseFile();
  const file = new Blob([text], { type: 'application/octet-stream' });
  const sizeMb = file.size / 1e6;
  const app = await createApp(config);
  app.useLogger(['error']);
  await app.listen(PORT, '127.0.0.1');
  const base = `http://127.0.0.1:${PORT}`;
  try {
    const token = await signIn(base);
    const warm = await uploadOnce(base, token, file);
    const times: number[] = [];
    for (let round = 0; round < ROUNDS; round++) times.push((await uploadOnce(base, token, file)).ms);
    const mid = median(times);
    console.log(
      `file: ${POINTS} points, ${sizeMb.toFixed(2)} MB (2-port, MA, GHz); answer: ${warm.body.points} points, ${warm.body.matchedRanges.length} matched ranges, ${warm.body.curve.length} plot points`,
    );
    console.log(
      `POST /api/rf/touchstone/analyze wall time per upload (sign-in excluded): first (cold) ${warm.ms.toFixed(0)} ms; median of ${ROUNDS} ${mid.toFixed(0)} ms (min ${Math.min(...times).toFixed(0)}, max ${Math.max(...times).toFixed(0)})`,
    );
    console.log(`target < ${TARGET_MS} ms: ${mid < TARGET_MS ? 'MET' : 'NOT MET'} (${(sizeMb / (mid / 1000)).toFixed(1)} MB/s end to end)`);
  } finally {
    await app.close();
  }
}

main().catch((error) => {
  console.error(error);
  process.exitCode = 1;
});
