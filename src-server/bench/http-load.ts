import autocannon from 'autocannon';
import { spawn, type ChildProcess } from 'node:child_process';
import { resolve } from 'node:path';

export interface LoadResult {
  label: string;
  connections: number;
  seconds: number;
  requests: number;
  throughputPerS: number;
  p50Ms: number;
  p95Ms: number;
  p99Ms: number;
  errors: number;
  non2xx: number;
}

const percentile = (sorted: number[], p: number) => (sorted.length ? sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))] : NaN);

/** Drives one GET route with autocannon and computes percentiles from every response time (autocannon has no p95). */
export async function loadRoute(opts: { label: string; url: string; token?: string; connections: number; seconds: number }): Promise<LoadResult> {
  const times: number[] = [];
  const result = await new Promise<autocannon.Result>((done, fail) => {
    const instance = autocannon(
      { url: opts.url, connections: opts.connections, duration: opts.seconds, headers: opts.token ? { authorization: `Bearer ${opts.token}` } : {} },
      (error, finished) => (error ? fail(error) : done(finished)),
    );
    instance.on('response', (_client, _status, _bytes, responseTime) => times.push(responseTime));
  });
  times.sort((x, y) => x - y);
  return {
    label: opts.label,
    connections: opts.connections,
    seconds: opts.seconds,
    requests: result.requests.total,
    throughputPerS: result.requests.average,
    p50Ms: percentile(times, 50),
    p95Ms: percentile(times, 95),
    p99Ms: percentile(times, 99),
    errors: result.errors + result.timeouts,
    non2xx: result.non2xx,
  };
}

export function printLoad(r: LoadResult, targetP95Ms?: number): void {
  const verdict =
    targetP95Ms === undefined ? '' : r.errors + r.non2xx === 0 && r.p95Ms <= targetP95Ms ? '  OK' : `  MISSES TARGET (p95 ≤ ${targetP95Ms} ms, 0 errors)`;
  console.log(
    `${r.label.padEnd(44)} c=${String(r.connections).padStart(2)} ${r.seconds}s  ${r.throughputPerS.toFixed(0).padStart(6)} req/s  ` +
      `p50 ${r.p50Ms.toFixed(1)} ms  p95 ${r.p95Ms.toFixed(1)} ms  p99 ${r.p99Ms.toFixed(1)} ms  errors ${r.errors}  non-2xx ${r.non2xx}${verdict}`,
  );
}

/** Starts the built server as its own process (as in production) and waits for its health route. */
export async function startServer(port: number, env: NodeJS.ProcessEnv = {}): Promise<{ url: string; stop: () => void; child: ChildProcess }> {
  const child = spawn(process.execPath, [resolve(__dirname, '../main.js')], { env: { ...process.env, ...env, PORT: String(port) }, stdio: 'ignore' });
  const url = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 60000;
  while (Date.now() < deadline) {
    if (
      await fetch(`${url}/api/health`).then(
        (r) => r.ok,
        () => false,
      )
    )
      return { url, child, stop: () => child.kill() };
    await new Promise((r) => setTimeout(r, 200));
  }
  child.kill();
  throw new Error(`server on port ${port} did not become healthy`);
}

export async function signInForBench(url: string, email: string, password = process.env.DEMO_PASSWORD ?? 'bandwright-demo'): Promise<string> {
  const res = await fetch(`${url}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password }),
  });
  if (!res.ok) throw new Error(`bench sign-in failed: ${res.status}`);
  return (await res.json()).accessToken;
}
