import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { loadConfig } from '../../src-server/config/app-config';
import { createApiApp } from '../support/api-app';

/** The app runs on the configuration it was given, not on a second reading of the environment. */
describe('configuration injected once (API)', () => {
  let app: INestApplication;
  const givenOrigin = 'http://app.config-once.test:8443';

  beforeAll(async () => {
    app = await createApiApp({ ...loadConfig(), appUrl: givenOrigin });
  });
  afterAll(async () => {
    await app?.close();
  });

  it('allows the given APP_URL as the browser origin', async () => {
    const res = await request(app.getHttpServer()).get('/api/health').set('Origin', givenOrigin);
    expect(res.headers['access-control-allow-origin']).toBe(givenOrigin);
  });

  it('does not allow the origin the environment names instead', async () => {
    const res = await request(app.getHttpServer()).get('/api/health').set('Origin', loadConfig().appUrl);
    expect(res.headers['access-control-allow-origin']).toBeUndefined();
  });
});
