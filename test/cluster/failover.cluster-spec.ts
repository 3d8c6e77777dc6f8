import { execFile } from 'node:child_process';
import { resolve } from 'node:path';
import { promisify } from 'node:util';
import mysql from 'mysql2/promise';
import { s1pWithGamma } from '../support/parts';
import { testClientAddress } from '../support/client-address';

// Ports of scripts/cluster-common.sh.
const PROXY = 'http://127.0.0.1:3500';
const INSTANCES = ['http://127.0.0.1:3501', 'http://127.0.0.1:3502'];
const NODE_PORTS = [3411, 3412, 3413];
const DB = {
  user: process.env.DB_USER ?? 'bandwright',
  password: process.env.DB_PASSWORD ?? 'bandwright-local',
  database: process.env.CLUSTER_DB_NAME ?? 'bandwright_cluster',
};

const run = promisify(execFile);
const clusterNode = (...args: string[]) => run('bash', [resolve(__dirname, '../../scripts/cluster-node.sh'), ...args], { timeout: 300000 });
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

interface Answer {
  status: number;
  body: Record<string, unknown>;
  ms: number;
}

async function call(base: string, method: string, path: string, token: string | null, body?: unknown): Promise<Answer> {
  const started = Date.now();
  const headers: Record<string, string> = { 'X-Forwarded-For': testClientAddress() };
  if (token) headers.Authorization = `Bearer ${token}`;
  let payload: BodyInit | undefined;
  if (body instanceof FormData) payload = body;
  else if (body !== undefined) {
    headers['Content-Type'] = 'application/json';
    payload = JSON.stringify(body);
  }
  try {
    const res = await fetch(`${base}${path}`, { method, headers, body: payload, signal: AbortSignal.timeout(60000) });
    const text = await res.text();
    let parsed: Record<string, unknown> = {};
    try {
      parsed = text ? JSON.parse(text) : {};
    } catch {
      parsed = { text };
    }
    return { status: res.status, body: parsed, ms: Date.now() - started };
  } catch (error) {
    // No answer at all (the connection broke): counted as rejected without a code, which the test refuses.
    const cause = (error as { cause?: { code?: string; message?: string } }).cause;
    return { status: 0, body: { error: `${method} ${path}: ${String(error)} (${cause?.code ?? cause?.message ?? 'no cause'})` }, ms: Date.now() - started };
  }
}

const SPEC_BANDS = [{ fromMhz: 824, toMhz: 960, maxVswr: 2, minReturnLossDb: null, efficiencyPct: 50, peakGainDbi: 1, averageGainDbi: null }];
const draft = (mpn: string) => ({
  manufacturer: 'Cluster Test Antennas',
  mpn,
  title: 'Cluster test chip antenna',
  formFactor: 'chip',
  connector: 'solder-pad',
  polarization: 'linear',
  specBands: SPEC_BANDS,
});

describe('the cluster: writes through HAProxy while a database node and an app instance die', () => {
  let engineer: string;

  beforeAll(async () => {
    const login = await call(PROXY, 'POST', '/api/auth/login', null, { email: 'engineer@bandwright.test', password: 'bandwright-demo' });
    expect(login.status).toBe(200);
    engineer = login.body.accessToken as string;
  });

  it('keeps every acknowledged write on every node, duplicates none, and answers the rest 503 with a code', async () => {
    const batch = `CL-${Date.now().toString(36)}`;
    // Two parts that the upload lane adds measurements to, made before anything fails.
    const targets: number[] = [];
    for (const n of [1, 2]) targets.push(Number((await call(PROXY, 'POST', '/api/parts', engineer, draft(`${batch}-target-${n}`))).body.id));
    expect(targets.every(Number.isInteger)).toBe(true);

    const parts: { mpn: string; answer: Answer }[] = [];
    const uploads: { answer: Answer }[] = [];
    const choices: { partId: number; answer: Answer; at: number }[] = [];
    const partLane = async (lane: number) => {
      for (let n = 0; n < 20; n += 1) {
        const mpn = `${batch}-${lane}-${n}`;
        parts.push({ mpn, answer: await call(PROXY, 'POST', '/api/parts', engineer, draft(mpn)) });
        await sleep(40);
      }
    };
    const uploadLane = async (lane: number) => {
      for (let n = 0; n < 10; n += 1) {
        const form = new FormData();
        form.set('kind', 's11');
        form.set(
          'file',
          new Blob([
            s1pWithGamma([
              [800, 0.2 + n / 100],
              [900, 0.1],
              [1000, 0.3],
            ]),
          ]),
          `lane${lane}-${n}.s1p`,
        );
        uploads.push({ answer: await call(PROXY, 'POST', `/api/parts/${targets[lane]}/measurements`, engineer, form) });
        await sleep(80);
      }
    };
    // Demo tracker (product 1), its LTE radio (11): the chosen part flips between two demo LTE parts.
    const choiceLane = async () => {
      for (let n = 0; n < 24; n += 1) {
        const partId = n % 2 === 0 ? 1004 : 1002;
        choices.push({ partId, answer: await call(PROXY, 'PUT', '/api/products/1/radios/11/choice', engineer, { partId }), at: n });
        await sleep(60);
      }
    };
    const chaos = (async () => {
      await sleep(800);
      await clusterNode('kill-db', '1'); // the node HAProxy sends every write to
      await sleep(1500);
      await clusterNode('kill-app', '1');
      await sleep(2500);
      await Promise.all([clusterNode('start-app', '1'), clusterNode('start-db', '1')]);
    })();
    await Promise.all([...[0, 1, 2, 3].map(partLane), uploadLane(0), uploadLane(1), choiceLane(), chaos]);

    const all = [...parts.map((p) => p.answer), ...uploads.map((u) => u.answer), ...choices.map((c) => c.answer)];
    const acknowledged = all.filter((a) => a.status >= 200 && a.status < 300);
    const rejected = all.filter((a) => !(a.status >= 200 && a.status < 300));
    // Every refusal says why: a 503 with a code, never a bare 502, a dropped connection or a 500.
    expect(rejected.filter((a) => a.status !== 503 || typeof a.body.code !== 'string').map((a) => [a.status, a.body.code ?? a.body.error])).toEqual([]);

    // Every node, asked directly: every acknowledged write is there, none twice.
    let lost = 0;
    let duplicated = 0;
    const chosenOnNodes: number[][] = [];
    for (const port of NODE_PORTS) {
      const connection = await mysql.createConnection({ host: '127.0.0.1', port, ...DB });
      try {
        const [rows] = await connection.query<mysql.RowDataPacket[]>('SELECT mpn, COUNT(*) AS n FROM parts WHERE mpn LIKE ? GROUP BY mpn', [`${batch}-%`]);
        const count = new Map(rows.map((r) => [r.mpn as string, Number(r.n)]));
        duplicated += rows.filter((r) => Number(r.n) > 1).length;
        lost += parts.filter((p) => p.answer.status === 201 && !count.has(p.mpn)).length;
        const uploadIds = uploads.filter((u) => u.answer.status === 201).map((u) => Number(u.answer.body.id));
        if (uploadIds.length > 0) {
          const [stored] = await connection.query<mysql.RowDataPacket[]>('SELECT id FROM part_measurements WHERE id IN (?)', [uploadIds]);
          lost += uploadIds.length - stored.length;
        }
        const [chosen] = await connection.query<mysql.RowDataPacket[]>(
          "SELECT part_id FROM part_assignments WHERE product_id = 1 AND radio_id = 11 AND state = 'chosen' ORDER BY part_id",
        );
        chosenOnNodes.push(chosen.map((r) => Number(r.part_id)));
      } finally {
        await connection.end();
      }
    }
    const longest = Math.max(...all.map((a) => a.ms));
    console.log(
      `cluster failover: ${all.length} writes, ${acknowledged.length} acknowledged, ${rejected.length} refused with 503, ` +
        `${lost} lost, ${duplicated} duplicated, longest answer ${longest} ms`,
    );
    expect(acknowledged.length).toBeGreaterThan(all.length / 2);
    expect(lost).toBe(0);
    expect(duplicated).toBe(0);
    // The radio's choice is the same on every node, and it is the last acknowledged one or a later attempt.
    expect(new Set(chosenOnNodes.map((c) => c.join())).size).toBe(1);
    const lastAcked = choices.map((c) => c.answer.status).lastIndexOf(200);
    const possible = new Set(choices.slice(Math.max(0, lastAcked)).map((c) => c.partId));
    expect(chosenOnNodes[0]).toHaveLength(1);
    expect(possible.has(chosenOnNodes[0][0])).toBe(true);
  });

  it('shows a change made through one instance through the other at once: search, part page, matrix', async () => {
    const mpn = `CL-SEEN-${Date.now().toString(36)}`;
    const created = await call(INSTANCES[0], 'POST', '/api/parts', engineer, draft(mpn));
    expect(created.status).toBe(201);
    const search = await call(INSTANCES[1], 'GET', `/api/parts?q=${encodeURIComponent(mpn)}`, engineer);
    expect(search.status).toBe(200);
    expect((search.body.items as { mpn: string }[]).map((p) => p.mpn)).toEqual([mpn]);
    expect((await call(INSTANCES[1], 'GET', `/api/parts/${created.body.id}`, engineer)).body.mpn).toBe(mpn);

    for (const partId of [1004, 1002]) {
      expect((await call(INSTANCES[0], 'PUT', '/api/products/1/radios/11/choice', engineer, { partId })).status).toBe(200);
      const matrix = await call(INSTANCES[1], 'GET', '/api/products/1/matrix?chosenOnly=true', engineer);
      const columns = matrix.body.columns as { partId: number; assignments: { radioId: number; state: string }[] }[];
      const chosenForLte = columns.filter((c) => c.assignments.some((a) => a.radioId === 11 && a.state === 'chosen')).map((c) => c.partId);
      expect(chosenForLte).toEqual([partId]);
    }
  });
});
