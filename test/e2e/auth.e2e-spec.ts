import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { createApiApp, DEMO, DEMO_PASSWORD, demoTokens, tokenFor, unique } from '../support/api-app';
import { linkIn, waitForMail } from '../support/mailbox';
import { testClientAddress } from '../support/client-address';

// Sign-ins of this file come from an address of their own: the per-address allowance is shared through the database.
const clientAddress = testClientAddress();

describe('auth and users (API)', () => {
  let app: INestApplication;
  let tokens: Awaited<ReturnType<typeof demoTokens>>;
  const http = () => request(app.getHttpServer());

  beforeAll(async () => {
    app = await createApiApp();
    tokens = await demoTokens(app);
  }, 30000);
  afterAll(() => app.close());

  describe('POST /api/auth/login', () => {
    it.each(Object.entries(DEMO))('signs in the demo %s and returns the user with the role', async (role, email) => {
      const res = await http().post('/api/auth/login').set('X-Forwarded-For', clientAddress).send({ email, password: DEMO_PASSWORD }).expect(200);
      expect(res.body.accessToken).toEqual(expect.any(String));
      expect(res.body.user).toEqual({ id: expect.any(Number), email, name: expect.any(String), role });
    });

    it('answers 401 with one message for a wrong password and for an unknown e-mail', async () => {
      const wrong = await http()
        .post('/api/auth/login')
        .set('X-Forwarded-For', clientAddress)
        .send({ email: DEMO.admin, password: 'not-the-password' })
        .expect(401);
      const unknown = await http()
        .post('/api/auth/login')
        .set('X-Forwarded-For', clientAddress)
        .send({ email: 'nobody@bandwright.test', password: 'not-the-password' })
        .expect(401);
      expect(wrong.body.code).toBe('AUTH_BAD_CREDENTIALS');
      expect(unknown.body).toEqual(wrong.body);
    });

    it('answers 400 naming the field for bad bodies', async () => {
      const missing = await http().post('/api/auth/login').set('X-Forwarded-For', clientAddress).send({ email: DEMO.admin }).expect(400);
      expect(missing.body.code).toBe('VALIDATION_FAILED');
      expect(missing.body.fields.map((f: { field: string }) => f.field)).toContain('password');
      const extra = await http()
        .post('/api/auth/login')
        .set('X-Forwarded-For', clientAddress)
        .send({ email: DEMO.admin, password: 'x', isAdmin: true })
        .expect(400);
      expect(extra.body.fields[0].field).toBe('isAdmin');
      const long = await http()
        .post('/api/auth/login')
        .set('X-Forwarded-For', clientAddress)
        .send({ email: DEMO.admin, password: 'x'.repeat(201) })
        .expect(400);
      expect(long.body.fields[0].field).toBe('password');
      const wrongType = await http().post('/api/auth/login').set('X-Forwarded-For', clientAddress).send({ email: 42, password: 'x' }).expect(400);
      expect(wrongType.body.fields[0].field).toBe('email');
    });

    it('answers 400 MALFORMED_JSON for a body that is not JSON', async () => {
      const res = await http()
        .post('/api/auth/login')
        .set('X-Forwarded-For', clientAddress)
        .set('Content-Type', 'application/json')
        .send('{"email": ')
        .expect(400);
      expect(res.body.code).toBe('MALFORMED_JSON');
      expect(JSON.stringify(res.body)).not.toMatch(/at .*\.js|node_modules/);
    });
  });

  describe('GET /api/auth/me', () => {
    it('answers 401 without a token and with a forged one', async () => {
      expect((await http().get('/api/auth/me').expect(401)).body.code).toBe('AUTH_REQUIRED');
      await http().get('/api/auth/me').set('Authorization', 'Bearer not.a.token').expect(401);
    });

    it('returns the signed-in user', async () => {
      const res = await http().get('/api/auth/me').set('Authorization', `Bearer ${tokens.engineer}`).expect(200);
      expect(res.body).toMatchObject({ email: DEMO.engineer, role: 'engineer' });
    });
  });

  describe('user management routes: who may call them', () => {
    const routes: { method: string; path: string; body?: object }[] = [
      { method: 'get', path: '/api/users' },
      { method: 'post', path: '/api/users/invitations', body: { email: 'x@bandwright.test', name: 'X', role: 'engineer' } },
      { method: 'patch', path: '/api/users/3/role', body: { role: 'engineer' } },
      { method: 'post', path: '/api/users/3/deactivation' },
      { method: 'post', path: '/api/users/3/reactivation' },
      { method: 'get', path: '/api/audit' },
    ];

    it.each(routes)('$method $path: 401 anonymous, 403 for engineer and procurement', async ({ method, path, body }) => {
      const call = (token?: string) => {
        const req = (http() as unknown as Record<string, (p: string) => request.Test>)[method](path);
        if (token) req.set('Authorization', `Bearer ${token}`);
        return body ? req.send(body) : req;
      };
      await call().expect(401);
      expect((await call(tokens.engineer).expect(403)).body.code).toBe('FORBIDDEN_ROLE');
      await call(tokens.procurement).expect(403);
    });

    it('GET /api/users lists users for an admin', async () => {
      const res = await http().get('/api/users').set('Authorization', `Bearer ${tokens.admin}`).expect(200);
      expect(res.body.map((u: { email: string }) => u.email)).toEqual(expect.arrayContaining(Object.values(DEMO)));
    });
  });

  describe('invitation round trip', () => {
    it('invite → caught e-mail → accept with the link token → sign in; the link works once', async () => {
      const email = `${unique('invitee')}@bandwright.test`;
      const invited = await http()
        .post('/api/users/invitations')
        .set('Authorization', `Bearer ${tokens.admin}`)
        .send({ email, name: 'Ivy Invitee', role: 'engineer' })
        .expect(201);
      expect(invited.body).toMatchObject({ email, status: 'invited', role: 'engineer' });

      // Not yet able to sign in: no password is set.
      await http().post('/api/auth/login').set('X-Forwarded-For', clientAddress).send({ email, password: 'whatever-password' }).expect(401);

      const mail = await waitForMail(email, /invited/i);
      const link = new URL(linkIn(mail, '/accept-invitation'));
      const token = link.searchParams.get('token')!;
      const accepted = await http()
        .post('/api/auth/accept-invitation')
        .set('X-Forwarded-For', clientAddress)
        .send({ token, password: 'a-fresh-password-1' })
        .expect(200);
      expect(accepted.body.user).toMatchObject({ email, role: 'engineer' });

      await tokenFor(app, email, 'a-fresh-password-1');
      const again = await http()
        .post('/api/auth/accept-invitation')
        .set('X-Forwarded-For', clientAddress)
        .send({ token, password: 'another-password-2' })
        .expect(400);
      expect(again.body.code).toBe('LINK_TOKEN_USED');
    }, 30000);

    it('rejects an invitation to an e-mail that already has an account with 409', async () => {
      const res = await http()
        .post('/api/users/invitations')
        .set('Authorization', `Bearer ${tokens.admin}`)
        .send({ email: DEMO.engineer, name: 'Dup', role: 'engineer' })
        .expect(409);
      expect(res.body.code).toBe('USER_EMAIL_TAKEN');
    });
  });

  describe('password reset round trip', () => {
    it('request → e-mail → new password; old tokens stop working; unknown e-mails get the same 202', async () => {
      const email = `${unique('resetter')}@bandwright.test`;
      await http()
        .post('/api/users/invitations')
        .set('Authorization', `Bearer ${tokens.admin}`)
        .send({ email, name: 'Rae Reset', role: 'procurement' })
        .expect(201);
      const invite = await waitForMail(email, /invited/i);
      const inviteToken = new URL(linkIn(invite, '/accept-invitation')).searchParams.get('token')!;
      await http()
        .post('/api/auth/accept-invitation')
        .set('X-Forwarded-For', clientAddress)
        .send({ token: inviteToken, password: 'first-password-1' })
        .expect(200);
      const oldToken = await tokenFor(app, email, 'first-password-1');

      await http().post('/api/auth/password-reset-requests').set('X-Forwarded-For', clientAddress).send({ email }).expect(202);
      await http().post('/api/auth/password-reset-requests').set('X-Forwarded-For', clientAddress).send({ email: 'nobody-at-all@bandwright.test' }).expect(202);
      const mail = await waitForMail(email, /reset/i);
      const token = new URL(linkIn(mail, '/reset-password')).searchParams.get('token')!;
      await http().post('/api/auth/password-reset').set('X-Forwarded-For', clientAddress).send({ token, password: 'second-password-2' }).expect(200);

      await http().post('/api/auth/login').set('X-Forwarded-For', clientAddress).send({ email, password: 'first-password-1' }).expect(401);
      await tokenFor(app, email, 'second-password-2');
      const revoked = await http().get('/api/auth/me').set('Authorization', `Bearer ${oldToken}`).expect(401);
      expect(revoked.body.code).toBe('AUTH_TOKEN_REVOKED');
    }, 30000);

    it('rejects a made-up token', async () => {
      const res = await http()
        .post('/api/auth/password-reset')
        .set('X-Forwarded-For', clientAddress)
        .send({ token: 'x'.repeat(43), password: 'some-password-3' })
        .expect(400);
      expect(res.body.code).toBe('LINK_TOKEN_INVALID');
    });
  });

  describe('role change and deactivation', () => {
    it('deactivating a user stops their token at once and records an audit entry', async () => {
      const email = `${unique('leaver')}@bandwright.test`;
      const invited = await http()
        .post('/api/users/invitations')
        .set('Authorization', `Bearer ${tokens.admin}`)
        .send({ email, name: 'Lee Leaver', role: 'engineer' })
        .expect(201);
      const mail = await waitForMail(email, /invited/i);
      const inviteToken = new URL(linkIn(mail, '/accept-invitation')).searchParams.get('token')!;
      const { body } = await http()
        .post('/api/auth/accept-invitation')
        .set('X-Forwarded-For', clientAddress)
        .send({ token: inviteToken, password: 'leaver-password-1' })
        .expect(200);
      await http().get('/api/auth/me').set('Authorization', `Bearer ${body.accessToken}`).expect(200);

      await http().post(`/api/users/${invited.body.id}/deactivation`).set('Authorization', `Bearer ${tokens.admin}`).expect(200);
      await http().get('/api/auth/me').set('Authorization', `Bearer ${body.accessToken}`).expect(401);
      await http().post('/api/auth/login').set('X-Forwarded-For', clientAddress).send({ email, password: 'leaver-password-1' }).expect(401);

      const audit = await http()
        .get('/api/audit')
        .query({ entityType: 'user', entityId: invited.body.id })
        .set('Authorization', `Bearer ${tokens.admin}`)
        .expect(200);
      expect(audit.body.items.map((e: { action: string }) => e.action)).toEqual(expect.arrayContaining(['invited', 'invitation-accepted', 'deactivated']));
    }, 30000);

    it('changes a role, and answers 400 naming the field for an unknown role and for a bad id', async () => {
      const email = `${unique('mover')}@bandwright.test`;
      const invited = await http()
        .post('/api/users/invitations')
        .set('Authorization', `Bearer ${tokens.admin}`)
        .send({ email, name: 'Mo Mover', role: 'procurement' })
        .expect(201);
      const res = await http()
        .patch(`/api/users/${invited.body.id}/role`)
        .set('Authorization', `Bearer ${tokens.admin}`)
        .send({ role: 'engineer' })
        .expect(200);
      expect(res.body.role).toBe('engineer');
      const bad = await http().patch(`/api/users/${invited.body.id}/role`).set('Authorization', `Bearer ${tokens.admin}`).send({ role: 'wizard' }).expect(400);
      expect(bad.body.fields[0].field).toBe('role');
      const badId = await http().patch('/api/users/abc/role').set('Authorization', `Bearer ${tokens.admin}`).send({ role: 'engineer' }).expect(400);
      expect(badId.body.fields[0].field).toBe('id');
      await http().patch('/api/users/999999/role').set('Authorization', `Bearer ${tokens.admin}`).send({ role: 'engineer' }).expect(404);
    });
  });

  describe('hardening of sign-in', () => {
    it('locks an account for a while after 5 wrong passwords in a row, even for the right password', async () => {
      const email = `${unique('target')}@bandwright.test`;
      await http()
        .post('/api/users/invitations')
        .set('Authorization', `Bearer ${tokens.admin}`)
        .send({ email, name: 'Tia Target', role: 'engineer' })
        .expect(201);
      const mail = await waitForMail(email, /invited/i);
      const token = new URL(linkIn(mail, '/accept-invitation')).searchParams.get('token')!;
      await http().post('/api/auth/accept-invitation').set('X-Forwarded-For', clientAddress).send({ token, password: 'target-password-1' }).expect(200);
      for (let i = 0; i < 5; i += 1)
        await http()
          .post('/api/auth/login')
          .set('X-Forwarded-For', clientAddress)
          .send({ email, password: `wrong-${i}` })
          .expect(401);
      const locked = await http().post('/api/auth/login').set('X-Forwarded-For', clientAddress).send({ email, password: 'target-password-1' }).expect(429);
      expect(locked.body.code).toBe('AUTH_TEMPORARILY_LOCKED');
    }, 30000);

    it('rate-limits repeated reset requests for one address and e-mail with 429', async () => {
      const email = `${unique('flood')}@bandwright.test`;
      // An address of its own, so this flood does not use up the allowance of the other tests on loopback.
      const address = `2001:db8:${Date.now().toString(16).slice(-4)}:${Math.floor(Math.random() * 0xffff).toString(16)}::1`;
      const statuses: number[] = [];
      for (let i = 0; i < 32; i += 1)
        statuses.push((await http().post('/api/auth/password-reset-requests').set('X-Forwarded-For', address).send({ email })).status);
      expect(statuses.slice(0, 30).every((s) => s === 202)).toBe(true);
      expect(statuses.slice(30)).toEqual([429, 429]);
    }, 30000);

    it('sends security headers and a request id on every answer', async () => {
      const res = await http().get('/api/health');
      expect(res.headers['x-content-type-options']).toBe('nosniff');
      expect(res.headers['content-security-policy']).toContain("default-src 'self'");
      expect(res.headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);
      const echoed = await http().get('/api/health').set('X-Request-Id', 'proxy-given-id-123');
      expect(echoed.headers['x-request-id']).toBe('proxy-given-id-123');
    });

    it('does not allow other origins to call the API from a browser', async () => {
      const res = await http().options('/api/auth/login').set('Origin', 'http://evil.example').set('Access-Control-Request-Method', 'POST');
      expect(res.headers['access-control-allow-origin']).toBeUndefined();
    });
  });
});
