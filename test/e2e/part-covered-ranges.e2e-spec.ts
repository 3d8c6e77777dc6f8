import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { createApiApp, demoTokens } from '../support/api-app';
import { createDraft } from '../support/parts';

// Invented example: 1-port, v1, RI; |Γ| = 0.5 / 0.2 / 0.3333 at 820 / 868 / 915 MHz.
const EXAMPLE_A = `! Example A - invented data
# MHz S RI R 50
820   0.5000   0.0000
868   0.2000   0.0000
915   0.0000  -0.3333
`;

describe('GET /api/parts/:id coveredRanges (drawn on the band library strip)', () => {
  let app: INestApplication;
  let engineer: string;

  beforeAll(async () => {
    app = await createApiApp();
    engineer = (await demoTokens(app)).engineer;
  });
  afterAll(() => app.close());

  it('gives the VSWR ≤ 2 intervals of the measured S11 with interpolated edges', async () => {
    const draft = await createDraft(app, engineer);
    await request(app.getHttpServer())
      .post(`/api/parts/${draft.id}/measurements`)
      .set('Authorization', `Bearer ${engineer}`)
      .field('kind', 's11')
      .attach('file', Buffer.from(EXAMPLE_A), 'example-a.s1p')
      .expect(201);
    const part = (await request(app.getHttpServer()).get(`/api/parts/${draft.id}`).set('Authorization', `Bearer ${engineer}`).expect(200)).body;
    expect(part.coveredRanges).toHaveLength(1);
    const [range] = part.coveredRanges;
    expect(range.source).toBe('measured');
    // |Γ| linear in frequency: 1/3 is crossed at 820 + 48·(0.5 − 1/3)/0.3 = 846.67 MHz (Pozar §2.3: VSWR 2 ↔ |Γ| = 1/3);
    // at 915 MHz |Γ| = 0.3333 < 1/3, so the interval runs to the last point.
    expect(range.fromMhz).toBeCloseTo(846.67, 1);
    expect(range.toMhz).toBeCloseTo(915, 6);
  });

  it('falls back to the spec bands that claim VSWR ≤ 2 when no S11 is measured', async () => {
    const draft = await createDraft(app, engineer, {
      specBands: [
        { fromMhz: 824, toMhz: 960, maxVswr: 2, minReturnLossDb: null, efficiencyPct: 50, peakGainDbi: 1, averageGainDbi: null },
        { fromMhz: 1710, toMhz: 2170, maxVswr: 3, minReturnLossDb: null, efficiencyPct: 50, peakGainDbi: 2, averageGainDbi: null },
      ],
    });
    const part = (await request(app.getHttpServer()).get(`/api/parts/${draft.id}`).set('Authorization', `Bearer ${engineer}`).expect(200)).body;
    expect(part.coveredRanges).toEqual([{ fromMhz: 824, toMhz: 960, source: 'spec' }]);
  });
});
