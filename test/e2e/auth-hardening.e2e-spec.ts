import type { INestApplication } from '@nestjs/common';
import bcrypt from 'bcryptjs';
import type { Transporter } from 'nodemailer';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { hashPassword } from '../../src-server/auth/password';
import { ADDRESS_LIMIT } from '../../src-server/common/auth-throttler.guard';
import { MailService, REMOVED_BODY } from '../../src-server/mail/mail.service';
import { User } from '../../src-server/users/user.entity';
import type { Role } from '../../src-server/common/roles';
import { createApiApp, DEMO, demoTokens, testClientAddress, unique } from '../support/api-app';
import { linkIn, waitForMail } from '../support/mailbox';
import { createDraft } from '../support/parts';

const PASSWORD = 'hardening-password-1';

/** A client address of its own per test, so rate limits of other tests and runs never mix in. */
const newAddress = testClientAddress;

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];

async function waitFor<T>(check: () => Promise<T | undefined>, timeoutMs: number): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const value = await check();
    if (value !== undefined) return value;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error('timed out');
}

describe('sign-in and account hardening (API)', () => {
  let app: INestApplication;
  let db: DataSource;
  // A second instance against the same database, as behind a load balancer. Closed last: passport keeps the
  // newest app's JWT strategy for both.
  let second: INestApplication;
  let tokens: Awaited<ReturnType<typeof demoTokens>>;
  const http = () => request(app.getHttpServer());

  /** An active account with PASSWORD, made directly in the database. */
  async function activeUser(role: Role = 'engineer'): Promise<string> {
    const email = `${unique('hardened')}@bandwright.test`;
    await db.getRepository(User).insert({ email, name: 'Hana Hardened', role, status: 'active', passwordHash: await hashPassword(PASSWORD) });
    return email;
  }

  /** Makes the SMTP relay take `ms` for every message, as a slow relay would. */
  function slowRelay(ms: number): jest.SpyInstance {
    const transport = (app.get(MailService) as unknown as { transport: Transporter }).transport;
    const send = transport.sendMail.bind(transport);
    return jest
      .spyOn(transport, 'sendMail')
      .mockImplementation(((mail: Parameters<Transporter['sendMail']>[0]) =>
        new Promise((r) => setTimeout(r, ms)).then(() => send(mail))) as unknown as Transporter['sendMail']);
  }

  beforeAll(async () => {
    app = await createApiApp();
    second = await createApiApp();
    db = app.get(DataSource);
    tokens = await demoTokens(app);
  }, 60000);
  afterEach(() => jest.restoreAllMocks());
  afterAll(async () => {
    await app.close();
    await second.close();
  });

  describe('POST /api/auth/login: the failed-sign-in count', () => {
    it.each([
      ['a real account', true],
      ['an unknown e-mail', false],
    ])(
      '25 parallel wrong passwords for %s check at most 5 passwords; the rest get 429',
      async (_label, real) => {
        const email = real ? await activeUser() : `${unique('nobody')}@bandwright.test`;
        const address = newAddress();
        const checks = jest.spyOn(bcrypt, 'compare');
        const results = await Promise.all(
          Array.from({ length: 25 }, (_, i) =>
            http()
              .post('/api/auth/login')
              .set('X-Forwarded-For', address)
              .send({ email, password: `wrong-${i}` }),
          ),
        );
        const statuses = results.map((r) => r.status);
        expect(statuses.filter((s) => s === 401)).toHaveLength(5);
        expect(statuses.filter((s) => s === 429)).toHaveLength(20);
        expect(new Set(results.filter((r) => r.status === 429).map((r) => r.body.code))).toEqual(new Set(['AUTH_TEMPORARILY_LOCKED']));
        expect(checks.mock.calls.length).toBeLessThanOrEqual(5);
        if (real) await http().post('/api/auth/login').set('X-Forwarded-For', address).send({ email, password: PASSWORD }).expect(429);
      },
      30000,
    );

    it('locks an unknown e-mail exactly like a real one: same answers in the same order', async () => {
      const address = newAddress();
      const run = async (email: string) => {
        const answers: { status: number; body: unknown }[] = [];
        for (let i = 0; i < 6; i += 1) {
          const res = await http()
            .post('/api/auth/login')
            .set('X-Forwarded-For', address)
            .send({ email, password: `wrong-${i}` });
          answers.push({ status: res.status, body: res.body });
        }
        return answers;
      };
      const real = await run(await activeUser());
      const unknown = await run(`${unique('ghost')}@bandwright.test`);
      expect(real.map((a) => a.status)).toEqual([401, 401, 401, 401, 401, 429]);
      expect(unknown).toEqual(real);
    }, 30000);

    it('a correct password ends the run of failures', async () => {
      const email = await activeUser();
      const address = newAddress();
      for (let i = 0; i < 4; i += 1)
        await http()
          .post('/api/auth/login')
          .set('X-Forwarded-For', address)
          .send({ email, password: `wrong-${i}` })
          .expect(401);
      await http().post('/api/auth/login').set('X-Forwarded-For', address).send({ email, password: PASSWORD }).expect(200);
      for (let i = 0; i < 4; i += 1)
        await http()
          .post('/api/auth/login')
          .set('X-Forwarded-For', address)
          .send({ email, password: `wrong-${i}` })
          .expect(401);
      await http().post('/api/auth/login').set('X-Forwarded-For', address).send({ email, password: PASSWORD }).expect(200);
    }, 30000);
  });

  describe('per-address limit shared by every instance', () => {
    it(`allows ${ADDRESS_LIMIT} requests a minute from one address over two instances and all e-mails, then 429`, async () => {
      const address = newAddress();
      const total = ADDRESS_LIMIT + 10;
      const results = await Promise.all(
        Array.from({ length: total }, (_, i) =>
          request((i % 2 ? app : second).getHttpServer())
            .post('/api/auth/password-reset-requests')
            .set('X-Forwarded-For', address)
            .send({ email: `${unique('spray')}@bandwright.test` }),
        ),
      );
      const statuses = results.map((r) => r.status);
      expect(statuses.filter((s) => s === 202)).toHaveLength(ADDRESS_LIMIT);
      expect(statuses.filter((s) => s === 429)).toHaveLength(10);
      expect(new Set(results.filter((r) => r.status === 429).map((r) => r.body.code))).toEqual(new Set(['TOO_MANY_REQUESTS']));
      // Other routes from the same address are refused too; another address is not.
      expect(
        (await request(second.getHttpServer()).post('/api/auth/login').set('X-Forwarded-For', address).send({ email: DEMO.engineer, password: 'x' })).status,
      ).toBe(429);
      await request(second.getHttpServer())
        .post('/api/auth/password-reset-requests')
        .set('X-Forwarded-For', newAddress())
        .send({ email: 'someone@bandwright.test' })
        .expect(202);
    }, 60000);

    it('believes X-Forwarded-For only from a proxy on loopback', () => {
      const trusts = app.getHttpAdapter().getInstance().get('trust proxy fn') as (address: string, hop: number) => boolean;
      expect(trusts('127.0.0.1', 0)).toBe(true);
      expect(trusts('::1', 0)).toBe(true);
      expect(trusts('10.0.0.7', 0)).toBe(false);
      expect(trusts('203.0.113.9', 0)).toBe(false);
    });
  });

  describe('POST /api/auth/password-reset-requests: no difference between known and unknown e-mails', () => {
    it('answers the same, in the same time, even when the mail relay is slow', async () => {
      slowRelay(1500);
      const real = await activeUser();
      const address = newAddress();
      const timings: Record<'real' | 'unknown', number[]> = { real: [], unknown: [] };
      const bodies = new Set<string>();
      for (let i = 0; i < 6; i += 1) {
        for (const kind of ['real', 'unknown'] as const) {
          const started = performance.now();
          const res = await http()
            .post('/api/auth/password-reset-requests')
            .set('X-Forwarded-For', address)
            .send({ email: kind === 'real' ? real : `${unique('unknown')}@bandwright.test` });
          timings[kind].push(performance.now() - started);
          expect(res.status).toBe(202);
          bodies.add(JSON.stringify(res.body));
          await new Promise((r) => setTimeout(r, 150));
        }
      }
      expect(bodies.size).toBe(1);
      // Nothing slow happens inside the request: not the relay, not a difference in database work.
      expect(Math.max(...timings.real)).toBeLessThan(1000);
      // A password hash or a relay wait would add hundreds of ms; 100 ms leaves room for a busy machine's noise.
      const [realMedian, unknownMedian] = [median(timings.real), median(timings.unknown)];
      expect(Math.abs(realMedian - unknownMedian)).toBeLessThan(Math.max(100, Math.min(realMedian, unknownMedian)));
      // The link still arrives, through the outbox.
      await waitForMail(real, /reset/i, 15000);
    }, 60000);
  });

  describe('mail with a link is queued, sent by the poller, and its body removed once delivered', () => {
    it('POST /api/users/invitations answers without waiting for the relay; the delivered body leaves the outbox', async () => {
      slowRelay(3000);
      const email = `${unique('queued')}@bandwright.test`;
      const started = performance.now();
      await http()
        .post('/api/users/invitations')
        .set('Authorization', `Bearer ${tokens.admin}`)
        .send({ email, name: 'Quinn Queued', role: 'engineer' })
        .expect(201);
      expect(performance.now() - started).toBeLessThan(1500);

      const row = async () =>
        (await db.query('SELECT status, body FROM mail_outbox WHERE JSON_CONTAINS(to_addresses, JSON_QUOTE(?))', [email]))[0] as {
          status: string;
          body: string;
        };
      const mail = await waitForMail(email, /invited/i, 15000);
      const token = new URL(linkIn(mail, '/accept-invitation')).searchParams.get('token')!;
      const sent = await waitFor(async () => {
        const current = await row();
        return current.status === 'sent' ? current : undefined;
      }, 5000);
      expect(sent.body).toBe(REMOVED_BODY);
      expect(sent.body).not.toContain(token);
      // The link itself still works.
      await http().post('/api/auth/accept-invitation').set('X-Forwarded-For', newAddress()).send({ token, password: 'queued-password-1' }).expect(200);
    }, 30000);

    it('a reset link is removed from the outbox once delivered', async () => {
      const email = await activeUser();
      await http().post('/api/auth/password-reset-requests').set('X-Forwarded-For', newAddress()).send({ email }).expect(202);
      const mail = await waitForMail(email, /reset/i, 15000);
      const token = new URL(linkIn(mail, '/reset-password')).searchParams.get('token')!;
      const bodies = await waitFor(async () => {
        const rows: { status: string; body: string }[] = await db.query(
          'SELECT status, body FROM mail_outbox WHERE JSON_CONTAINS(to_addresses, JSON_QUOTE(?))',
          [email],
        );
        return rows.length > 0 && rows.every((r) => r.status === 'sent') ? rows.map((r) => r.body) : undefined;
      }, 5000);
      expect(bodies.join('\n')).not.toContain(token);
    }, 30000);
  });

  describe('POST /api/auth/logout', () => {
    it('answers 401 without a token', async () => {
      expect((await http().post('/api/auth/logout').expect(401)).body.code).toBe('AUTH_REQUIRED');
    });

    it('answers 204 and ends the token; signing in again gives a working one', async () => {
      const email = await activeUser('procurement');
      const address = newAddress();
      const signIn = async () =>
        (await http().post('/api/auth/login').set('X-Forwarded-For', address).send({ email, password: PASSWORD }).expect(200)).body.accessToken as string;
      const token = await signIn();
      await http().get('/api/auth/me').set('Authorization', `Bearer ${token}`).expect(200);
      await http().post('/api/auth/logout').set('Authorization', `Bearer ${token}`).expect(204);
      const after = await http().get('/api/auth/me').set('Authorization', `Bearer ${token}`).expect(401);
      expect(after.body.code).toBe('AUTH_TOKEN_REVOKED');
      await http().post('/api/auth/logout').set('Authorization', `Bearer ${token}`).expect(401);
      await http()
        .get('/api/auth/me')
        .set('Authorization', `Bearer ${await signIn()}`)
        .expect(200);
    }, 30000);
  });

  describe('history shown to every role names people without their e-mail addresses', () => {
    it("product and part history carry names only; the admins' audit log keeps e-mails", async () => {
      const product = await http()
        .post('/api/products')
        .set('Authorization', `Bearer ${tokens.engineer}`)
        .send({
          name: unique('History probe'),
          code: unique('HP').slice(0, 40),
          owner: 'Test Owner',
          groundPlaneLengthMm: 80,
          groundPlaneWidthMm: 40,
          targetRegions: ['EU'],
        })
        .expect(201);
      const part = await createDraft(app, tokens.engineer);
      for (const path of [
        `/api/products/${product.body.id}/history`,
        `/api/parts/${part.id}/history`,
        `/api/products/${product.body.id}/assignments/history`,
      ]) {
        const history = await http().get(path).set('Authorization', `Bearer ${tokens.procurement}`).expect(200);
        expect(JSON.stringify(history.body)).not.toMatch(/@bandwright\.test/);
      }
      const productHistory = await http().get(`/api/products/${product.body.id}/history`).set('Authorization', `Bearer ${tokens.procurement}`).expect(200);
      expect(productHistory.body.items[0].user).toEqual({ id: expect.any(Number), name: expect.any(String) });

      const audit = await http()
        .get('/api/audit')
        .query({ entityType: 'product', entityId: product.body.id })
        .set('Authorization', `Bearer ${tokens.admin}`)
        .expect(200);
      expect(audit.body.items[0].user).toEqual({ id: expect.any(Number), name: expect.any(String), email: DEMO.engineer });
    }, 30000);
  });
});
