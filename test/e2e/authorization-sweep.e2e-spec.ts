import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { createApiApp, demoTokens, type DemoRole } from '../support/api-app';

interface Operation {
  method: string;
  path: string;
  roles: string[] | undefined;
}

const ROLES: DemoRole[] = ['procurement', 'engineer', 'admin'];
const METHODS = ['get', 'post', 'put', 'patch', 'delete'];
// An id no test creates, so allowed calls answer 4xx without touching stored data.
const NO_SUCH_ID = '999999999';
const DOCS_ROUTES = /^\/api\/docs/;
// Signing out ends the token each role's sweep runs with, so it is called last.
const ENDS_SESSION = 'post /api/auth/logout';

const toConcretePath = (openApiPath: string) => openApiPath.replace(/\{[^{}]+\}/g, NO_SUCH_ID);
const expressToOpenApi = (path: string) => path.replace(/:(\w+)/g, '{$1}');

/** Every route the running Express app answers, as "METHOD /path" in OpenAPI notation. */
function liveRoutes(app: INestApplication): string[] {
  const express = app.getHttpAdapter().getInstance() as { router: { stack: { route?: { path: string; methods: Record<string, boolean> } }[] } };
  return express.router.stack
    .filter((layer) => layer.route)
    .flatMap((layer) =>
      Object.keys(layer.route!.methods)
        .filter((m) => METHODS.includes(m))
        .map((m) => `${m.toUpperCase()} ${expressToOpenApi(layer.route!.path)}`),
    )
    .filter((route) => !DOCS_ROUTES.test(route.split(' ')[1]));
}

describe('authorization sweep over every documented route', () => {
  let app: INestApplication;
  let tokens: Record<DemoRole, string>;
  let operations: Operation[];

  beforeAll(async () => {
    app = await createApiApp();
    tokens = await demoTokens(app);
    const docs = (await request(app.getHttpServer()).get('/api/docs-json').expect(200)).body as {
      paths: Record<string, Record<string, { 'x-roles'?: string[] }>>;
    };
    operations = Object.entries(docs.paths).flatMap(([path, item]) =>
      Object.entries(item)
        .filter(([method]) => METHODS.includes(method))
        .map(([method, op]) => ({ method, path, roles: op['x-roles'] })),
    );
    const endsSession = (op: Operation) => Number(`${op.method} ${op.path}` === ENDS_SESSION);
    operations.sort((a, b) => endsSession(a) - endsSession(b));
  });
  afterAll(() => app.close());

  const call = (op: Operation, token?: string) => {
    const agent = request(app.getHttpServer()) as unknown as Record<string, (path: string) => request.Test>;
    const req = agent[op.method](toConcretePath(op.path));
    if (token) req.set('Authorization', `Bearer ${token}`);
    return ['post', 'put', 'patch'].includes(op.method) ? req.send({}) : req;
  };

  it('documents every live route, and states the roles of every documented one', () => {
    const documented = new Set(operations.map((op) => `${op.method.toUpperCase()} ${op.path}`));
    const undocumented = liveRoutes(app).filter((route) => !documented.has(route));
    expect(liveRoutes(app).length).toBeGreaterThan(10);
    expect(undocumented).toEqual([]);
    const withoutRoles = operations.filter((op) => !op.roles || op.roles.length === 0).map((op) => `${op.method} ${op.path}`);
    expect(withoutRoles).toEqual([]);
    expect(operations.length).toBeGreaterThan(10);
  });

  it('answers 401 to anonymous calls of every non-public route', async () => {
    const leaks: string[] = [];
    for (const op of operations.filter((o) => !o.roles?.includes('public'))) {
      const res = await call(op);
      if (res.status !== 401) leaks.push(`${op.method.toUpperCase()} ${op.path} → ${res.status}`);
    }
    expect(leaks).toEqual([]);
  });

  it.each(ROLES)(
    'as %s: 403 where the role is not listed, never 401/403/5xx where it is',
    async (role) => {
      const problems: string[] = [];
      for (const op of operations.filter((o) => !o.roles?.includes('public'))) {
        const res = await call(op, tokens[role]);
        const allowed = op.roles!.includes(role);
        if (!allowed && res.status !== 403) problems.push(`${op.method.toUpperCase()} ${op.path}: expected 403, got ${res.status}`);
        if (allowed && (res.status === 401 || res.status === 403 || res.status >= 500)) {
          problems.push(`${op.method.toUpperCase()} ${op.path}: allowed for ${role} but got ${res.status} ${res.body?.code ?? ''}`);
        }
      }
      expect(problems).toEqual([]);
    },
    60000,
  );
});
