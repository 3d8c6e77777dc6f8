import { ChildProcess, spawn } from 'node:child_process';
import { createServer } from 'node:net';
import { resolve } from 'node:path';
import { DEMO, DEMO_PASSWORD, testClientAddress, unique } from '../support/api-app';

const freePort = () =>
  new Promise<number>((done) => {
    const probe = createServer().listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as { port: number };
      probe.close(() => done(port));
    });
  });

/** A real server process from the build, as a second machine behind a load balancer would run it. */
async function startInstance(): Promise<{ url: string; process: ChildProcess }> {
  const port = await freePort();
  const child = spawn(process.execPath, [resolve(__dirname, '../../dist/server/main.js')], {
    env: { ...process.env, PORT: String(port), NODE_ENV: 'test' },
    stdio: 'ignore',
  });
  const url = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 30000;
  while (Date.now() < deadline) {
    const up = await fetch(`${url}/api/health`).then(
      (r) => r.ok,
      () => false,
    );
    if (up) return { url, process: child };
    await new Promise((r) => setTimeout(r, 150));
  }
  child.kill();
  throw new Error(`instance on ${port} did not start`);
}

const json = (url: string, init: RequestInit & { token?: string; body?: string } = {}) =>
  fetch(url, {
    ...init,
    headers: { 'Content-Type': 'application/json', 'X-Forwarded-For': testClientAddress(), ...(init.token ? { Authorization: `Bearer ${init.token}` } : {}) },
  });

describe('two API instances against one database', () => {
  let a: Awaited<ReturnType<typeof startInstance>>;
  let b: Awaited<ReturnType<typeof startInstance>>;

  beforeAll(async () => {
    [a, b] = await Promise.all([startInstance(), startInstance()]);
  }, 60000);
  afterAll(() => {
    a?.process.kill();
    b?.process.kill();
  });

  it('accepts on one instance a token issued by the other', async () => {
    const login = await json(`${a.url}/api/auth/login`, { method: 'POST', body: JSON.stringify({ email: DEMO.engineer, password: DEMO_PASSWORD }) });
    expect(login.status).toBe(200);
    const { accessToken } = await login.json();
    const me = await json(`${b.url}/api/auth/me`, { token: accessToken });
    expect(me.status).toBe(200);
    expect((await me.json()).email).toBe(DEMO.engineer);
  });

  it('50 concurrent edits of one product with the same version, spread over both: exactly one wins, 49 get 409, nothing lost', async () => {
    const { accessToken: token } = await (
      await json(`${a.url}/api/auth/login`, { method: 'POST', body: JSON.stringify({ email: DEMO.engineer, password: DEMO_PASSWORD }) })
    ).json();
    const created = await json(`${a.url}/api/products`, {
      method: 'POST',
      token,
      body: JSON.stringify({
        name: 'Concurrency probe',
        code: unique('CC').slice(0, 40),
        owner: 'Test',
        groundPlaneLengthMm: 80,
        groundPlaneWidthMm: 40,
        targetRegions: ['EU'],
      }),
    });
    expect(created.status).toBe(201);
    const product = await created.json();

    const attempts = Array.from({ length: 50 }, (_, i) =>
      json(`${(i % 2 ? a : b).url}/api/products/${product.id}`, {
        method: 'PATCH',
        token,
        body: JSON.stringify({ version: product.version, notes: `edit ${i}` }),
      }).then(async (r) => ({ status: r.status, body: await r.json(), i })),
    );
    const results = await Promise.all(attempts);
    const winners = results.filter((r) => r.status === 200);
    const conflicts = results.filter((r) => r.status === 409);
    expect(winners).toHaveLength(1);
    expect(conflicts).toHaveLength(49);
    expect(new Set(conflicts.map((c) => c.body.code))).toEqual(new Set(['PRODUCT_VERSION_CONFLICT']));

    const stored = await (await json(`${b.url}/api/products/${product.id}`, { token })).json();
    expect(stored.version).toBe(product.version + 1);
    expect(stored.notes).toBe(`edit ${winners[0].i}`);
  }, 60000);
});
