import type { INestApplication } from '@nestjs/common';
import fc from 'fast-check';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { createApiApp, demoTokens } from '../support/api-app';

interface WriteRoute {
  method: 'post' | 'put' | 'patch' | 'delete';
  path: string;
  multipart: boolean;
  isPublic: boolean;
}

const NO_SUCH_ID = '999999999';
// Tables that change as a side effect of any request, not because the request was accepted.
const VOLATILE_TABLES = new Set(['migrations', 'mail_outbox', 'login_attempts', 'rate_limit_counters']);
// Signing out would end the admin token the fuzz runs with.
const SKIPPED_ROUTES = new Set(['post /api/auth/logout']);

describe('hostile input to every write route (property-based)', () => {
  let app: INestApplication;
  let db: DataSource;
  let adminToken: string;
  let routes: WriteRoute[];

  beforeAll(async () => {
    app = await createApiApp();
    db = app.get(DataSource);
    adminToken = (await demoTokens(app)).admin;
    const docs = (await request(app.getHttpServer()).get('/api/docs-json').expect(200)).body as {
      paths: Record<string, Record<string, { 'x-roles'?: string[]; requestBody?: { content?: Record<string, unknown> } }>>;
    };
    routes = Object.entries(docs.paths).flatMap(([path, item]) =>
      Object.entries(item)
        .filter(([method]) => ['post', 'put', 'patch', 'delete'].includes(method))
        .map(([method, op]) => ({
          method: method as WriteRoute['method'],
          path: path.replace(/\{[^}]+\}/g, NO_SUCH_ID),
          multipart: Boolean(op.requestBody?.content?.['multipart/form-data']),
          isPublic: op['x-roles']?.includes('public') ?? false,
        }))
        .filter((route) => !SKIPPED_ROUTES.has(`${route.method} ${route.path}`)),
    );
  });
  afterAll(() => app.close());

  async function rowCounts(): Promise<Record<string, number>> {
    const tables: { name: string }[] = await db.query('SELECT table_name AS name FROM information_schema.tables WHERE table_schema = DATABASE()');
    const counts: Record<string, number> = {};
    for (const { name } of tables.filter((t) => !VOLATILE_TABLES.has(t.name))) {
      counts[name] = Number((await db.query(`SELECT COUNT(*) AS n FROM \`${name}\``))[0].n);
    }
    return counts;
  }

  const jsonBody = fc.oneof(
    fc.jsonValue({ maxDepth: 3 }),
    fc.dictionary(fc.string({ maxLength: 12 }), fc.oneof(fc.string({ maxLength: 300 }), fc.double(), fc.integer(), fc.boolean(), fc.constant(null), fc.array(fc.anything({ maxDepth: 1 }), { maxLength: 4 }))),
  );
  const rawBody = fc.oneof(fc.string({ maxLength: 200 }), fc.constantFrom('{', '{"a":', '[1,2', 'null', '"str"', '{"__proto__":{"x":1}}', '\u0000\u0001'));
  const query = fc.dictionary(fc.constantFrom('q', 'page', 'limit', 'sort', 'dryRun', 'vswrMax', 'port', 'x'), fc.string({ maxLength: 30 }), { maxKeys: 3 });
  const file = fc.record({ bytes: fc.uint8Array({ maxLength: 2048 }), name: fc.constantFrom('a.s1p', 'b.s2p', 'c.csv', 'd.pdf', '../../etc/passwd', 'x.exe', 'noext') });

  it('never answers 5xx, always explains the error with a code, and leaves every table as it was', async () => {
    expect(routes.length).toBeGreaterThan(5);
    const before = await rowCounts();
    const failures: string[] = [];

    await fc.assert(
      fc.asyncProperty(fc.nat({ max: 10_000 }), fc.oneof(jsonBody.map((b) => ({ json: b })), rawBody.map((r) => ({ raw: r }))), query, file, async (pick, body, qs, upload) => {
        const route = routes[pick % routes.length];
        const agent = request(app.getHttpServer()) as unknown as Record<string, (path: string) => request.Test>;
        let req = agent[route.method](route.path).query(qs).set('Authorization', `Bearer ${adminToken}`);
        if (route.multipart) {
          req = req.attach('file', Buffer.from(upload.bytes), upload.name).field('kind', String(qs.x ?? 's11'));
        } else if ('raw' in body) {
          req = req.set('Content-Type', 'application/json').send(body.raw);
        } else {
          req = req.set('Content-Type', 'application/json').send(JSON.stringify(body.json) ?? 'null');
        }
        const res = await req;
        const label = `${route.method.toUpperCase()} ${route.path} → ${res.status}`;
        if (res.status >= 500) failures.push(`${label} ${JSON.stringify(res.body).slice(0, 200)}`);
        if (res.status >= 400 && typeof res.body?.code !== 'string') failures.push(`${label} without an error code`);
        if (res.body?.code === 'VALIDATION_FAILED' && !(res.body.fields?.length > 0)) failures.push(`${label} VALIDATION_FAILED names no field`);
        if (JSON.stringify(res.body ?? '').match(/\bat .+\.(js|ts):\d+|\bER_[A-Z]|\bSELECT\b.*\bFROM\b|\bINSERT INTO\b/)) failures.push(`${label} leaks internals`);
        return true;
      }),
      { numRuns: 600, seed: Number(process.env.FC_SEED ?? Date.now() % 100000) },
    );

    expect(failures.slice(0, 20)).toEqual([]);
    expect(await rowCounts()).toEqual(before);
  }, 180000);
});
