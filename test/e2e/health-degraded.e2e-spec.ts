import type { INestApplication } from '@nestjs/common';
import { createServer } from 'node:net';
import request from 'supertest';
import { createApiApp } from '../support/api-app';

// Nothing listens on a port just freed, so every call to it is refused at once.
const closedPort = () =>
  new Promise<number>((resolve) => {
    const probe = createServer().listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as { port: number };
      probe.close(() => resolve(port));
    });
  });

/** An app whose object store and/or mail relay point at a closed port; the database stays up. */
async function healthWith(closed: { storage?: boolean; mail?: boolean }): Promise<request.Response> {
  const saved = { S3_PORT: process.env.S3_PORT, S3_ENDPOINT: process.env.S3_ENDPOINT, SMTP_PORT: process.env.SMTP_PORT };
  let app: INestApplication | undefined;
  try {
    if (closed.storage) {
      delete process.env.S3_ENDPOINT;
      process.env.S3_PORT = String(await closedPort());
    }
    if (closed.mail) process.env.SMTP_PORT = String(await closedPort());
    app = await createApiApp();
    return await request(app.getHttpServer()).get('/api/health');
  } finally {
    for (const [key, value] of Object.entries(saved)) {
      if (value === undefined) delete process.env[key];
      else process.env[key] = value;
    }
    await app?.close();
  }
}

describe('GET /api/health (object store and mail relay)', () => {
  it('is 200 "ok" with nothing down when every component answers', async () => {
    const res = await healthWith({});
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: 'ok', db: 'up', storage: 'up', mail: 'up', down: [] });
  });

  it('is 200 "degraded" naming storage when the object store is down', async () => {
    const res = await healthWith({ storage: true });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: 'degraded', db: 'up', storage: 'down', mail: 'up', down: ['storage'] });
  });

  it('is 200 "degraded" naming mail when the mail relay is down', async () => {
    const res = await healthWith({ mail: true });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: 'degraded', db: 'up', storage: 'up', mail: 'down', down: ['mail'] });
  });

  it('names both when both are down, and stays 200 while the database answers', async () => {
    const res = await healthWith({ storage: true, mail: true });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: 'degraded', db: 'up', storage: 'down', mail: 'down', down: ['storage', 'mail'] });
  });
});
