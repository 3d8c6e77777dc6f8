import type { INestApplication } from '@nestjs/common';
import { execFileSync } from 'node:child_process';
import { resolve } from 'node:path';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { createApiApp, demoTokens, unique } from '../support/api-app';
import { draftBody } from '../support/parts';

const dbScript = (command: 'start' | 'stop') => execFileSync('bash', [resolve(__dirname, '../../scripts/db.sh'), command], { stdio: 'pipe', timeout: 60000 });

const SPEC_BANDS = [
  { fromMhz: 824, toMhz: 960, maxVswr: 2, minReturnLossDb: null, efficiencyPct: 50, peakGainDbi: 1, averageGainDbi: null },
  { fromMhz: 1710, toMhz: 2170, maxVswr: 2.5, minReturnLossDb: null, efficiencyPct: 55, peakGainDbi: 2, averageGainDbi: null },
];

describe('MariaDB stopped during a burst of writes', () => {
  let app: INestApplication;

  beforeAll(async () => {
    app = await createApiApp();
  });
  afterAll(async () => {
    dbScript('start');
    await app.close();
  });

  it('POST /api/parts answers 201 or 503 meanwhile, recovers without a restart, and leaves no part half-written', async () => {
    const { engineer } = await demoTokens(app);
    const batch = unique('OUT');
    const created: { status: number; code?: string }[] = [];
    let stopped = false;
    const writer = async (i: number) => {
      for (let n = 0; n < 12; n += 1) {
        const res = await request(app.getHttpServer())
          .post('/api/parts')
          .set('Authorization', `Bearer ${engineer}`)
          .send(draftBody({ mpn: `${batch}-${i}-${n}`, specBands: SPEC_BANDS }));
        created.push({ status: res.status, code: res.body?.code });
        if (stopped && res.status === 503) await new Promise((r) => setTimeout(r, 100));
      }
    };
    const burst = Promise.all(Array.from({ length: 6 }, (_, i) => writer(i)));
    await new Promise((r) => setTimeout(r, 150));
    dbScript('stop');
    stopped = true;
    await burst;
    dbScript('start');

    // Recovers by itself: the same app instance writes again once MariaDB is back.
    const deadline = Date.now() + 30000;
    let after = 0;
    while (Date.now() < deadline) {
      after = (
        await request(app.getHttpServer())
          .post('/api/parts')
          .set('Authorization', `Bearer ${engineer}`)
          .send(draftBody({ mpn: `${batch}-after`, specBands: SPEC_BANDS }))
      ).status;
      if (after === 201) break;
      await new Promise((r) => setTimeout(r, 300));
    }
    expect(after).toBe(201);

    expect(created.filter((c) => c.status !== 201 && !(c.status === 503 && c.code === 'DATABASE_UNAVAILABLE'))).toEqual([]);
    expect(created.some((c) => c.status === 503)).toBe(true);

    // Every part that exists has both of its spec bands: the part and its bands were one transaction.
    const db = app.get(DataSource);
    const rows: { mpn: string; bands: string }[] = await db.query(
      'SELECT p.mpn, COUNT(b.id) AS bands FROM parts p LEFT JOIN part_spec_bands b ON b.part_id = p.id WHERE p.mpn LIKE ? GROUP BY p.id',
      [`${batch}-%`],
    );
    expect(rows.length).toBeGreaterThan(0);
    expect(rows.filter((r) => Number(r.bands) !== 2)).toEqual([]);
  }, 120000);
});
