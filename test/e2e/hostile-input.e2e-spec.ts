import type { INestApplication } from '@nestjs/common';
import fc from 'fast-check';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { createApiApp, demoTokens, unique } from '../support/api-app';
import { createDraft } from '../support/parts';

interface OpenApiOperation {
  'x-roles'?: string[];
  parameters?: { name: string; in: string }[];
  requestBody?: { content?: Record<string, { schema?: { $ref?: string } }> };
}
type OpenApiDocument = {
  paths: Record<string, Record<string, OpenApiOperation>>;
  components: { schemas: Record<string, { properties?: Record<string, unknown> }> };
};

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
  let docs: OpenApiDocument;

  beforeAll(async () => {
    app = await createApiApp();
    db = app.get(DataSource);
    adminToken = (await demoTokens(app)).admin;
    docs = (await request(app.getHttpServer()).get('/api/docs-json').expect(200)).body as OpenApiDocument;
    routes = Object.entries(docs.paths).flatMap(([path, item]) =>
      Object.entries(item)
        .filter(([method]) => ['post', 'put', 'patch', 'delete'].includes(method))
        .map(([method, op]) => ({
          method: method as WriteRoute['method'],
          path: path.replace(/\{[^{}]+\}/g, NO_SUCH_ID),
          multipart: Boolean(op.requestBody?.content?.['multipart/form-data']),
          isPublic: op['x-roles']?.includes('public') ?? false,
        }))
        .filter((route) => !SKIPPED_ROUTES.has(`${route.method} ${route.path}`)),
    );
  }, 60000);
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
    fc.dictionary(
      fc.string({ maxLength: 12 }),
      fc.oneof(
        fc.string({ maxLength: 300 }),
        fc.double(),
        fc.integer(),
        fc.boolean(),
        fc.constant(null),
        fc.array(fc.anything({ maxDepth: 1 }), { maxLength: 4 }),
      ),
    ),
  );
  const rawBody = fc.oneof(fc.string({ maxLength: 200 }), fc.constantFrom('{', '{"a":', '[1,2', 'null', '"str"', '{"__proto__":{"x":1}}', '\u0000\u0001'));
  const query = fc.dictionary(fc.constantFrom('q', 'page', 'limit', 'sort', 'dryRun', 'vswrMax', 'port', 'x'), fc.string({ maxLength: 30 }), { maxKeys: 3 });
  const file = fc.record({
    bytes: fc.uint8Array({ maxLength: 2048 }),
    name: fc.constantFrom('a.s1p', 'b.s2p', 'c.csv', 'd.pdf', '../../etc/passwd', 'x.exe', 'noext'),
  });

  it('never answers 5xx, always explains the error with a code, and leaves every table as it was', async () => {
    expect(routes.length).toBeGreaterThan(5);
    const before = await rowCounts();
    const failures: string[] = [];

    await fc.assert(
      fc.asyncProperty(
        fc.nat({ max: 10_000 }),
        fc.oneof(
          jsonBody.map((b) => ({ json: b })),
          rawBody.map((r) => ({ raw: r })),
        ),
        query,
        file,
        async (pick, body, qs, upload) => {
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
          if (JSON.stringify(res.body ?? '').match(/\bat .+\.(js|ts):\d+|\bER_[A-Z]|\bSELECT\b.+\bFROM\b|\bINSERT INTO\b/))
            failures.push(`${label} leaks internals`);
          return true;
        },
      ),
      { numRuns: 600, seed: Number(process.env.FC_SEED ?? Date.now() % 100000) },
    );

    expect(failures.slice(0, 20)).toEqual([]);
    expect(await rowCounts()).toEqual(before);
  }, 180000);
  /**
   * The classes of bad input that answered 500 before: null in every field of every JSON write route (PATCH ones on
   * real records), numbers beyond any column, impossible dates, lone surrogates, deep nesting, huge query numbers,
   * and the same record created in parallel. Writes may succeed; no answer may be a 5xx.
   */
  it('finds no 5xx among nulls, huge numbers, impossible dates, surrogates, deep nesting and parallel duplicates', async () => {
    const http = () => request(app.getHttpServer());
    const auth = { Authorization: `Bearer ${adminToken}` };
    const product = (
      await http()
        .post('/api/products')
        .set(auth)
        .send({
          name: unique('Fuzz product'),
          code: unique('FZ').slice(0, 40),
          owner: 'Fuzz',
          groundPlaneLengthMm: 80,
          groundPlaneWidthMm: 40,
          targetRegions: ['EU'],
        })
        .expect(201)
    ).body;
    const radio = (
      await http()
        .post(`/api/products/${product.id}/radios`)
        .set(auth)
        .send({
          name: 'Cellular',
          technology: 'lte',
          module: 'Fuzz modem (invented)',
          transmitPowerDbm: 23,
          polarization: 'linear',
          connector: 'solder-pad',
          feedLossDb: 0.5,
          bands: [{ bandId: 103 }],
        })
        .expect(201)
    ).body;
    const band = (
      await http()
        .post('/api/bands')
        .set(auth)
        .send({
          technology: 'ism',
          designation: unique('FZ').slice(0, 40),
          name: 'Fuzz band',
          duplex: 'half-duplex',
          ranges: [{ role: 'transmit-receive', fromMhz: 433.05, toMhz: 434.79 }],
          regions: ['EU'],
          sourceDocument: 'fuzz',
          sourceTable: 'fuzz',
        })
        .expect(201)
    ).body;
    const limit = (
      await http()
        .post('/api/regulatory-limits')
        .set(auth)
        .send({ region: 'EU', title: unique('Fuzz limit'), fromMhz: 433.05, toMhz: 434.79, kind: 'erp', valueDbm: 10, valueText: '10 mW', source: 'fuzz' })
        .expect(201)
    ).body;
    const bandSet = (
      await http()
        .post('/api/band-sets')
        .set(auth)
        .send({ name: unique('Fuzz set'), description: 'fuzz', bandIds: [103] })
        .expect(201)
    ).body;
    const part = await createDraft(app, adminToken);
    const offer = (
      await http()
        .post(`/api/parts/${part.id}/offers`)
        .set(auth)
        .send({ supplier: 'Fuzz Supply', currency: 'USD', priceBreaks: [{ quantity: 1, unitPrice: '1.00' }] })
        .expect(201)
    ).body;
    const realIds: Record<string, number> = {
      productId: product.id,
      radioId: radio.id,
      bandId: band.id,
      limitId: limit.id,
      bandSetId: bandSet.id,
      partId: part.id,
      offerId: offer.id,
    };
    // Template → path on a real record, so PATCH validation and services run against rows that exist.
    const realPath = (template: string) => {
      const owner = template.startsWith('/api/products')
        ? realIds.productId
        : template.startsWith('/api/bands')
          ? realIds.bandId
          : template.startsWith('/api/regulatory-limits')
            ? realIds.limitId
            : template.startsWith('/api/band-sets')
              ? realIds.bandSetId
              : template.startsWith('/api/parts')
                ? realIds.partId
                : Number(NO_SUCH_ID);
      return template
        .replace('{id}', String(owner))
        .replace(/\{(\w+)\}/g, (_, name: string) => String(realIds[name] ?? (name === 'otherId' ? 1025 : NO_SUCH_ID)));
    };

    const jsonRoutes = Object.entries(docs.paths).flatMap(([template, item]) =>
      Object.entries(item)
        .filter(([method, op]) => ['post', 'put', 'patch'].includes(method) && op.requestBody?.content?.['application/json']?.schema?.$ref)
        .map(([method, op]) => {
          const schema = docs.components.schemas[op.requestBody!.content!['application/json'].schema!.$ref!.split('/').pop()!];
          return { method: method as 'post' | 'put' | 'patch', path: realPath(template), fields: Object.keys(schema?.properties ?? {}) };
        })
        .filter((r) => r.fields.length > 0 && !r.path.startsWith('/api/auth')),
    );
    const queryRoutes = Object.entries(docs.paths).flatMap(([template, item]) =>
      Object.entries(item)
        .filter(([method, op]) => method === 'get' && (op.parameters ?? []).some((p) => p.in === 'query'))
        .map(([, op]) => ({ path: realPath(template), params: (op.parameters ?? []).filter((p) => p.in === 'query').map((p) => p.name) })),
    );
    expect(jsonRoutes.filter((r) => r.method === 'patch').length).toBeGreaterThanOrEqual(6);

    const PLACEHOLDER = '"__hostile__"';
    // Raw JSON text, so that literals JSON.stringify cannot write (1e309, lone surrogates) reach the server.
    const hostileValue = fc.oneof(
      fc.constant('null'),
      fc.constantFrom(
        '1e20',
        '-1e20',
        '2147483648',
        '9007199254740993',
        '1e308',
        '-1.7976931348623157e308',
        '1e309',
        '9'.repeat(309),
        '-0.000000000000000000000000000001',
      ),
      fc.constantFrom('"2025-02-31"', '"9999-99-99"', '"0000-00-00"', '"2025-13-01"', '"1899-12-31"'),
      fc.constantFrom('"\\ud800"', '"x\\udfff"', '"\\ud83d\\u0041"'),
      fc.integer({ min: 65, max: 5000 }).map((depth) => `${'['.repeat(depth)}${']'.repeat(depth)}`),
      fc.constantFrom('[null]', '[1e20]', '{"a":null}', '[{"bandId":1e20}]', '[{"fromMhz":null,"toMhz":1e309}]'),
    );
    const hugeQuery = fc.constantFrom(
      '1e20',
      '-1e20',
      '2147483648',
      '9'.repeat(309),
      `1-${'9'.repeat(309)}`,
      'Infinity',
      'NaN',
      '2025-02-31',
      '0x10',
      '1e-400',
    );

    let sent = 0;
    const failures: string[] = [];
    const check = (label: string, res: request.Response) => {
      sent += 1;
      if (res.status >= 500) failures.push(`${label} → ${res.status} ${JSON.stringify(res.body).slice(0, 200)}`);
      if (res.status >= 400 && typeof res.body?.code !== 'string') failures.push(`${label} → ${res.status} without an error code`);
    };

    await fc.assert(
      fc.asyncProperty(fc.nat(), fc.nat(), hostileValue, fc.boolean(), async (routePick, fieldPick, raw, withVersion) => {
        const route = jsonRoutes[routePick % jsonRoutes.length];
        const field = route.fields[fieldPick % route.fields.length];
        const body: Record<string, unknown> = { [field]: '__hostile__' };
        if (withVersion && field !== 'version' && route.fields.includes('version')) body.version = 1;
        const res = await (http() as unknown as Record<string, (p: string) => request.Test>)
          [route.method](route.path)
          .set(auth)
          .set('Content-Type', 'application/json')
          .send(JSON.stringify(body).replace(PLACEHOLDER, raw));
        check(`${route.method.toUpperCase()} ${route.path} ${field}=${raw.slice(0, 30)}`, res);
        return true;
      }),
      { numRuns: 500, seed: Number(process.env.FC_SEED ?? Date.now() % 100000) },
    );

    await fc.assert(
      fc.asyncProperty(fc.nat(), fc.nat(), hugeQuery, async (routePick, paramPick, value) => {
        const route = queryRoutes[routePick % queryRoutes.length];
        const param = route.params[paramPick % route.params.length];
        check(
          `GET ${route.path}?${param}=${value.slice(0, 30)}`,
          await http()
            .get(route.path)
            .query({ [param]: value })
            .set(auth),
        );
        return true;
      }),
      { numRuns: 150, seed: Number(process.env.FC_SEED ?? Date.now() % 100000) },
    );

    // The same record created in parallel: one 201 for the unique ones, never a 5xx.
    const duplicates: { path: string; body: () => object; oneWinner: boolean }[] = [
      {
        path: '/api/products',
        body: () => ({
          name: 'Fuzz twin',
          code: unique('FZT').slice(0, 40),
          owner: 'Fuzz',
          groundPlaneLengthMm: 50,
          groundPlaneWidthMm: 50,
          targetRegions: ['EU'],
        }),
        oneWinner: true,
      },
      { path: '/api/band-sets', body: () => ({ name: unique('Fuzz twin set'), description: 'fuzz', bandIds: [103] }), oneWinner: true },
      {
        path: '/api/bands',
        body: () => ({
          technology: 'ism',
          designation: unique('FT').slice(0, 40),
          name: 'Fuzz twin band',
          duplex: 'half-duplex',
          ranges: [{ role: 'transmit-receive', fromMhz: 868, toMhz: 869 }],
          regions: ['EU'],
          sourceDocument: 'fuzz',
          sourceTable: 'fuzz',
        }),
        oneWinner: true,
      },
      {
        path: '/api/parts',
        body: () => ({
          manufacturer: 'Testbench Antennas',
          mpn: unique('FZT'),
          title: 'Fuzz twin',
          formFactor: 'chip',
          connector: 'solder-pad',
          polarization: 'linear',
        }),
        oneWinner: true,
      },
      {
        path: '/api/users/invitations',
        body: () => ({ email: `${unique('fuzz-twin')}@bandwright.test`.toLowerCase(), name: 'Fuzz Twin', role: 'engineer' }),
        oneWinner: false,
      },
    ];
    for (const { path, body, oneWinner } of duplicates) {
      const same = body();
      const responses = await Promise.all(Array.from({ length: 8 }, () => http().post(path).set(auth).send(same)));
      responses.forEach((res) => check(`parallel POST ${path}`, res));
      if (oneWinner && responses.filter((r) => r.status === 201).length !== 1)
        failures.push(`parallel POST ${path} → ${responses.map((r) => r.status).join(',')}`);
    }
    const assignmentBase = `/api/products/${product.id}/radios/${radio.id}`;
    const races = await Promise.all(
      [1025, 1029, 1019, 1025, 1029, 1019].flatMap((partId) => [
        http().post(`${assignmentBase}/shortlist`).set(auth).send({ partId }),
        http().put(`${assignmentBase}/choice`).set(auth).send({ partId }),
      ]),
    );
    races.forEach((res) => check('parallel shortlist/choice', res));

    console.log(`bad-input fuzz: ${sent} requests, ${failures.length} failures`);
    expect(failures.slice(0, 20)).toEqual([]);
  }, 240000);
});
