import type { INestApplication } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { getDataSourceToken } from '@nestjs/typeorm';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { createApiApp, DEMO, tokenFor } from '../support/api-app';

describe('access token expiry', () => {
  let app: INestApplication;

  beforeAll(async () => {
    app = await createApiApp();
  });
  afterAll(async () => {
    await app.close();
  });

  describe('GET /api/auth/me', () => {
    it('answers 401 AUTH_TOKEN_EXPIRED once a token is past its exp, and a fresh sign-in works again', async () => {
      const db = app.get<DataSource>(getDataSourceToken());
      const [user] = await db.query('SELECT id, role, token_version AS tv FROM users WHERE email = ?', [DEMO.engineer]);
      // Signed by the app's own JwtService, so only exp differs from a normal sign-in token.
      const shortLived = app.get(JwtService).sign({ sub: user.id, role: user.role, tv: user.tv }, { expiresIn: 3 });
      const fresh = await request(app.getHttpServer()).get('/api/auth/me').set('Authorization', `Bearer ${shortLived}`).expect(200);
      expect(fresh.body.email).toBe(DEMO.engineer);

      // JWT iat/exp have one-second resolution (RFC 7519 §4.1.4 NumericDate), so a 3 s token lives 2–3 s: wait past it.
      await new Promise((r) => setTimeout(r, 4100));
      const expired = await request(app.getHttpServer()).get('/api/auth/me').set('Authorization', `Bearer ${shortLived}`).expect(401);
      expect(expired.body).toMatchObject({ code: 'AUTH_TOKEN_EXPIRED', message: expect.stringMatching(/sign in again/i) });

      const again = await tokenFor(app, DEMO.engineer);
      await request(app.getHttpServer()).get('/api/auth/me').set('Authorization', `Bearer ${again}`).expect(200);
    }, 20000);

    it('keeps AUTH_REQUIRED (not expired) for a token signed with another secret, so the client only says "expired" when it is', async () => {
      const forged = new JwtService({ secret: 'another-secret-of-at-least-32-characters!!' }).sign({ sub: 1, role: 'admin', tv: 0 }, { expiresIn: 60 });
      const res = await request(app.getHttpServer()).get('/api/auth/me').set('Authorization', `Bearer ${forged}`).expect(401);
      expect(res.body.code).toBe('AUTH_REQUIRED');
    });
  });
});
