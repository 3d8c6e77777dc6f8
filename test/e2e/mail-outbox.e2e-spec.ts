import type { INestApplication } from '@nestjs/common';
import { createServer } from 'node:net';
import { SMTPServer } from 'smtp-server';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { createApiApp, demoTokens, unique } from '../support/api-app';

const freePort = () =>
  new Promise<number>((resolve) => {
    const probe = createServer().listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as { port: number };
      probe.close(() => resolve(port));
    });
  });

async function waitFor<T>(check: () => Promise<T | undefined>, timeoutMs: number): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const value = await check();
    if (value !== undefined) return value;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error('timed out');
}

describe('mail outbox: SMTP relay down, then back', () => {
  let app: INestApplication;
  let smtpPort: number;
  let relay: SMTPServer | undefined;
  const received: { to: string; body: string }[] = [];
  const originalPort = process.env.SMTP_PORT;

  beforeAll(async () => {
    smtpPort = await freePort();
    process.env.SMTP_PORT = String(smtpPort);
    app = await createApiApp();
  });
  afterAll(async () => {
    process.env.SMTP_PORT = originalPort;
    await app.close();
    await new Promise<void>((r) => (relay ? relay.close(() => r()) : r()));
  });

  it('POST /api/users/invitations succeeds while the relay is down, keeps the mail, and delivers it when the relay returns', async () => {
    const tokens = await demoTokens(app);
    const email = `${unique('patient')}@bandwright.test`;
    await request(app.getHttpServer())
      .post('/api/users/invitations')
      .set('Authorization', `Bearer ${tokens.admin}`)
      .send({ email, name: 'Pat Patient', role: 'engineer' })
      .expect(201);

    const db = app.get(DataSource);
    const row = async () =>
      (await db.query('SELECT status, attempts, last_error FROM mail_outbox WHERE JSON_CONTAINS(to_addresses, JSON_QUOTE(?))', [email]))[0];
    // The request only queues the mail; the poller makes the first attempt.
    const pending = await waitFor(async () => {
      const current = await row();
      return current.attempts >= 1 ? current : undefined;
    }, 10000);
    expect(pending).toMatchObject({ status: 'pending' });
    expect(pending.attempts).toBeGreaterThanOrEqual(1);
    expect(pending.last_error).toMatch(/ECONNREFUSED|connect/i);

    relay = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS'],
      onData(stream, session, callback) {
        let body = '';
        stream.on('data', (chunk: Buffer) => (body += chunk.toString()));
        stream.on('end', () => {
          received.push({ to: session.envelope.rcptTo.map((r) => r.address).join(','), body });
          callback();
        });
      },
    });
    await new Promise<void>((r) => relay!.listen(smtpPort, '127.0.0.1', () => r()));

    const delivered = await waitFor(async () => received.find((m) => m.to === email), 20000);
    expect(delivered.body).toContain('/accept-invitation?token=');
    await waitFor(async () => ((await row()).status === 'sent' ? true : undefined), 5000);
  }, 40000);
});
