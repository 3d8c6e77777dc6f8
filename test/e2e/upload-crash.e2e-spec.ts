import { ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import { ChildProcess, spawn } from 'node:child_process';
import { createServer } from 'node:net';
import { resolve } from 'node:path';
import { DataSource } from 'typeorm';
import { loadConfig } from '../../src-server/config/app-config';
import { dataSourceOptions } from '../../src-server/database/data-source-options';
import { DEMO, DEMO_PASSWORD, testClientAddress } from '../support/api-app';
import { draftBody, s1pWithGamma } from '../support/parts';

const freePort = () =>
  new Promise<number>((done) => {
    const probe = createServer().listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as { port: number };
      probe.close(() => done(port));
    });
  });

/** The built server as its own process, so it can be killed for real. */
async function startInstance(extraEnv: Record<string, string> = {}): Promise<{ url: string; process: ChildProcess }> {
  const port = await freePort();
  const child = spawn(process.execPath, [resolve(__dirname, '../../dist/server/main.js')], {
    env: { ...process.env, PORT: String(port), NODE_ENV: 'test', ...extraEnv },
    stdio: 'ignore',
  });
  const url = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 30000;
  while (Date.now() < deadline) {
    if (
      await fetch(`${url}/api/health`).then(
        (r) => r.ok,
        () => false,
      )
    )
      return { url, process: child };
    await new Promise((r) => setTimeout(r, 150));
  }
  child.kill('SIGKILL');
  throw new Error(`instance on ${port} did not start`);
}

async function waitUntil(check: () => Promise<boolean>, timeoutMs: number, what: string): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (await check()) return;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`timed out waiting for ${what}`);
}

describe('an upload killed between storing the object and committing its row', () => {
  const config = loadConfig();
  let db: DataSource;
  let s3: S3Client;
  const instances: ChildProcess[] = [];

  const objectKeysOf = async (partId: number) =>
    ((await s3.send(new ListObjectsV2Command({ Bucket: config.s3.bucket, Prefix: `parts/${partId}/` }))).Contents ?? []).map((o) => o.Key!);
  const count = async (sql: string, partId: number) => Number((await db.query(sql, [partId]))[0].n);
  const measurementRows = (partId: number) => count('SELECT COUNT(*) AS n FROM part_measurements WHERE part_id = ?', partId);
  const documentRows = (partId: number) => count('SELECT COUNT(*) AS n FROM part_documents WHERE part_id = ?', partId);
  const pendingNotes = (partId: number) => count("SELECT COUNT(*) AS n FROM pending_uploads WHERE object_key LIKE CONCAT('parts/', ?, '/%')", partId);

  beforeAll(async () => {
    db = await new DataSource(dataSourceOptions(config)).initialize();
    s3 = new S3Client({
      endpoint: config.s3.endpoint,
      region: config.s3.region,
      forcePathStyle: true,
      credentials: { accessKeyId: config.s3.accessKeyId, secretAccessKey: config.s3.secretAccessKey },
    });
  });
  afterAll(async () => {
    for (const child of instances) child.kill('SIGKILL');
    s3.destroy();
    await db.destroy();
  });

  it('POST /api/parts/:id/measurements and /documents, SIGKILL mid-upload, restart: no row and no object remain', async () => {
    // Test-only pause (UPLOAD_TEST_PAUSE_MS) holds each upload after its object is stored, before its row commits.
    const doomed = await startInstance({ UPLOAD_TEST_PAUSE_MS: '60000' });
    instances.push(doomed.process);
    const login = await fetch(`${doomed.url}/api/auth/login`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', 'X-Forwarded-For': testClientAddress() },
      body: JSON.stringify({ email: DEMO.engineer, password: DEMO_PASSWORD }),
    });
    const { accessToken } = await login.json();
    const auth = { Authorization: `Bearer ${accessToken}` };
    const created = await fetch(`${doomed.url}/api/parts`, {
      method: 'POST',
      headers: { ...auth, 'Content-Type': 'application/json' },
      body: JSON.stringify(draftBody()),
    });
    expect(created.status).toBe(201);
    const part: { id: number } = await created.json();

    // About 1.7 MB of Touchstone: 80,000 points from 600 MHz upwards.
    const touchstone = s1pWithGamma(Array.from({ length: 80_000 }, (_, i) => [600 + i * 0.05, 0.1 + (i % 50) / 100] as [number, number]));
    expect(touchstone.length).toBeGreaterThan(1_500_000);
    const pdf = Buffer.concat([Buffer.from('%PDF-1.4\n% invented crash-test datasheet\n'), Buffer.alloc(3 * 1024 * 1024, 0x20), Buffer.from('\n%%EOF\n')]);
    const curveForm = new FormData();
    curveForm.set('kind', 's11');
    curveForm.set('file', new Blob([touchstone], { type: 'text/plain' }), 'big-sweep.s1p');
    const documentForm = new FormData();
    documentForm.set('kind', 'datasheet');
    documentForm.set('file', new Blob([pdf], { type: 'application/pdf' }), 'big-datasheet.pdf');
    const inFlight = [
      fetch(`${doomed.url}/api/parts/${part.id}/measurements`, { method: 'POST', headers: auth, body: curveForm }).then(
        (r) => r.status,
        (e: Error) => e.name,
      ),
      fetch(`${doomed.url}/api/parts/${part.id}/documents`, { method: 'POST', headers: auth, body: documentForm }).then(
        (r) => r.status,
        (e: Error) => e.name,
      ),
    ];

    // Inside the window: both objects are in the bucket, both notes committed, no rows yet.
    await waitUntil(async () => (await objectKeysOf(part.id)).length === 2 && (await pendingNotes(part.id)) === 2, 20000, 'both objects to be stored');
    expect(await measurementRows(part.id)).toBe(0);
    expect(await documentRows(part.id)).toBe(0);

    doomed.process.kill('SIGKILL');
    // Neither request got an answer: the process died holding them.
    expect(await Promise.all(inFlight)).toEqual(['TypeError', 'TypeError']);
    expect(await objectKeysOf(part.id)).toHaveLength(2);

    const restarted = await startInstance();
    instances.push(restarted.process);
    await waitUntil(async () => (await objectKeysOf(part.id)).length === 0 && (await pendingNotes(part.id)) === 0, 20000, 'the sweeper to remove the orphans');
    expect(await measurementRows(part.id)).toBe(0);
    expect(await documentRows(part.id)).toBe(0);

    // The restarted instance still takes uploads normally, and the ledger keeps nothing for a committed one.
    const again = new FormData();
    again.set('kind', 's11');
    again.set(
      'file',
      new Blob(
        [
          s1pWithGamma([
            [800, 0.2],
            [900, 0.3],
          ]),
        ],
        { type: 'text/plain' },
      ),
      'small.s1p',
    );
    expect(
      (await fetch(`${restarted.url}/api/parts/${part.id}/measurements`, { method: 'POST', headers: { Authorization: `Bearer ${accessToken}` }, body: again }))
        .status,
    ).toBe(201);
    expect(await measurementRows(part.id)).toBe(1);
    expect(await objectKeysOf(part.id)).toHaveLength(1);
    expect(await pendingNotes(part.id)).toBe(0);
  }, 90000);
});
