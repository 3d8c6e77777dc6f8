import type { INestApplication } from '@nestjs/common';
import { execFileSync } from 'node:child_process';
import { resolve } from 'node:path';
import request from 'supertest';
import { createApiApp } from '../support/api-app';
import { testClientAddress } from '../support/client-address';

const dbScript = (command: 'start' | 'stop') => execFileSync('bash', [resolve(__dirname, '../../scripts/db.sh'), command], { stdio: 'pipe', timeout: 60000 });

async function waitForHealth(app: INestApplication, status: number, timeoutMs = 20000) {
  const deadline = Date.now() + timeoutMs;
  let last: request.Response | undefined;
  while (Date.now() < deadline) {
    last = await request(app.getHttpServer()).get('/api/health');
    if (last.status === status) return last;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`health stayed ${last?.status} ${JSON.stringify(last?.body)}`);
}

describe('GET /api/health', () => {
  let app: INestApplication;

  beforeAll(async () => {
    app = await createApiApp();
  });
  afterAll(async () => {
    dbScript('start');
    await app.close();
  });

  it('is public and reports the database, object storage and mail relay up', async () => {
    const res = await request(app.getHttpServer()).get('/api/health').expect(200);
    expect(res.body).toEqual({ status: 'ok', db: 'up', storage: 'up', mail: 'up', down: [] });
  });

  it('answers 503 with db "down" while MariaDB is stopped, and recovers by itself when it returns', async () => {
    dbScript('stop');
    const down = await waitForHealth(app, 503);
    expect(down.body).toMatchObject({ db: 'down' });
    // A route that needs the database fails cleanly rather than hanging or leaking SQL.
    const login = await request(app.getHttpServer())
      .post('/api/auth/login')
      .set('X-Forwarded-For', testClientAddress())
      .send({ email: 'admin@bandwright.test', password: 'x' });
    expect(login.status).toBe(503);
    expect(login.body.code).toBe('DATABASE_UNAVAILABLE');

    dbScript('start');
    const up = await waitForHealth(app, 200, 30000);
    expect(up.body).toMatchObject({ status: 'ok', db: 'up' });
    await request(app.getHttpServer())
      .post('/api/auth/login')
      .set('X-Forwarded-For', testClientAddress())
      .send({ email: 'admin@bandwright.test', password: 'bandwright-demo' })
      .expect(200);
  }, 90000);
});
