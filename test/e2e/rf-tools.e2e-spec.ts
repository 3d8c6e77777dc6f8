import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { createApiApp, type DemoRole, demoTokens } from '../support/api-app';
import { writeTouchstone } from '../../src-server/rf/touchstone-writer';
import { TOUCHSTONE_MAX_BYTES } from '../../src-server/rf/touchstone';

// Example A: invented 1-port data, Touchstone v1, RI.
const EXAMPLE_A = `! Example A - invented data
# MHz S RI R 50
820   0.5000   0.0000
868   0.2000   0.0000
915   0.0000  -0.3333
`;

// Example B: invented 2-port data, Touchstone v1, MA; S21 before S12 (Touchstone 2.0, [Two-Port Data Order]).
const EXAMPLE_B = `! Example B - invented data; columns S11 S21 S12 S22
# GHz S MA R 50
2.40  0.333 -30  0.90 -60  0.05 10  0.20 45
2.45  0.100  15  0.91 -75  0.05  5  0.18 40
`;

// Example C: invented 2-port data, Touchstone v2, DB, row-major order 12_21 (Touchstone 2.0, [Two-Port Data Order]).
const EXAMPLE_C = `[Version] 2.0
# MHz S DB R 50
[Number of Ports] 2
[Two-Port Data Order] 12_21
[Number of Frequencies] 2
[Network Data]
! f  S11 S12 S21 S22 (dB, deg)
868  -9.54 120  -30.0 10  -0.5 -80  -14.0 60
915  -20.0  90  -30.5  5  -0.6 -95  -12.0 50
[End]
`;

const ROLES: DemoRole[] = ['admin', 'engineer', 'procurement'];
/** The distinct fields a 400 names (one field can fail several constraints). */
const fieldsOf = (body: { fields?: Array<{ field: string }> }) => [...new Set((body.fields ?? []).map((f) => f.field))];

describe('RF tools (API)', () => {
  let app: INestApplication;
  let tokens: Awaited<ReturnType<typeof demoTokens>>;
  const http = () => request(app.getHttpServer());
  const auth = (role: DemoRole = 'engineer') => ({ Authorization: `Bearer ${tokens[role]}` });
  const analyze = (text: string | Buffer, name: string, fields: Record<string, string> = {}, role: DemoRole = 'engineer') => {
    let req = http().post('/api/rf/touchstone/analyze').set(auth(role));
    for (const [key, value] of Object.entries(fields)) req = req.field(key, value);
    return req.attach('file', Buffer.isBuffer(text) ? text : Buffer.from(text), name);
  };

  beforeAll(async () => {
    app = await createApiApp();
    tokens = await demoTokens(app);
  });
  afterAll(() => app.close());

  describe('POST /api/rf/touchstone/analyze', () => {
    it('answers 401 without a token', async () => {
      const res = await http().post('/api/rf/touchstone/analyze').attach('file', Buffer.from(EXAMPLE_A), 'a.s1p').expect(401);
      expect(res.body.code).toBe('AUTH_REQUIRED');
    });

    it.each(ROLES)('lets the %s analyse a file', async (role) => {
      await analyze(EXAMPLE_A, 'a.s1p', {}, role).expect(200);
    });

    it('answers 400 naming file when no file is sent', async () => {
      const res = await http().post('/api/rf/touchstone/analyze').set(auth()).field('vswrMax', '2').expect(400);
      expect(res.body.code).toBe('VALIDATION_FAILED');
      expect(fieldsOf(res.body)).toEqual(['file']);
    });

    it('answers 400 naming the form field for a bad option', async () => {
      expect(fieldsOf((await analyze(EXAMPLE_A, 'a.s1p', { vswrMax: '0.5' }).expect(400)).body)).toEqual(['vswrMax']);
      expect(fieldsOf((await analyze(EXAMPLE_A, 'a.s1p', { port: '3' }).expect(400)).body)).toEqual(['port']);
      expect(fieldsOf((await analyze(EXAMPLE_A, 'a.s1p', { criterion: 'loose' }).expect(400)).body)).toEqual(['criterion']);
      // Port 2 is a valid number but this file has one port.
      expect(fieldsOf((await analyze(EXAMPLE_A, 'a.s1p', { port: '2' }).expect(400)).body)).toEqual(['port']);
    });

    it('analyses any port of a multi-port file (the reflection Spp of port 3 of a version-1 .s4p) and refuses port 65', async () => {
      // Touchstone 1.1: above 2 ports each matrix row starts a new line; S33 is the third pair of the third row.
      const fourPort = `# MHz S MA R 50
868 0.9 0  0.1 0  0.1 0  0.1 0
    0.1 0  0.9 0  0.1 0  0.1 0
    0.1 0  0.1 0  0.2 0  0.1 0
    0.1 0  0.1 0  0.1 0  0.9 0
915 0.9 0  0.1 0  0.1 0  0.1 0
    0.1 0  0.9 0  0.1 0  0.1 0
    0.1 0  0.1 0  0.5 0  0.1 0
    0.1 0  0.1 0  0.1 0  0.9 0
`;
      const res = await analyze(fourPort, 'assembly.s4p', { port: '3' }).expect(200);
      expect(res.body.ports).toBe(4);
      expect(res.body.port).toBe(3);
      // |Γ| = 0.2 → VSWR = (1 + 0.2) / (1 − 0.2) = 1.5 (Pozar, Microwave Engineering §2.3).
      expect(res.body.curve[0].gammaMagnitude).toBeCloseTo(0.2, 12);
      expect(res.body.curve[0].vswr).toBeCloseTo(1.5, 12);
      expect(fieldsOf((await analyze(fourPort, 'assembly.s4p', { port: '65' }).expect(400)).body)).toEqual(['port']);
      expect(fieldsOf((await analyze(fourPort, 'assembly.s4p', { port: '5' }).expect(400)).body)).toEqual(['port']);
    });

    it('answers 422 with the line number and the reason for a broken data line', async () => {
      const broken = EXAMPLE_A.replace('868   0.2000   0.0000', '868   0.2000');
      const res = await analyze(broken, 'broken.s1p').expect(422);
      expect(res.body).toMatchObject({ code: 'TOUCHSTONE_DATA_LINE_LENGTH', line: 4 });
      expect(res.body.message).toMatch(/^line 4: /);
    });

    it('answers 422 for a number that does not parse and for frequencies that do not increase, each with its line', async () => {
      const badNumber = await analyze(EXAMPLE_A.replace('0.2000   0.0000', '0.2O00   0.0000'), 'x.s1p').expect(422);
      expect(badNumber.body).toMatchObject({ code: 'TOUCHSTONE_BAD_NUMBER', line: 4 });
      const notIncreasing = await analyze(EXAMPLE_A.replace('915 ', '860 '), 'x.s1p').expect(422);
      expect(notIncreasing.body).toMatchObject({ code: 'TOUCHSTONE_FREQUENCY_NOT_INCREASING', line: 5 });
    });

    it('answers 422 when the file name promises another port count', async () => {
      const res = await analyze(EXAMPLE_A, 'antenna.s2p').expect(422);
      expect(res.body.code).toBe('TOUCHSTONE_WRONG_PORT_COUNT');
    });

    it('answers 422 for an empty file', async () => {
      const res = await analyze(Buffer.alloc(0), 'empty.s1p').expect(422);
      expect(res.body.code).toBe('TOUCHSTONE_EMPTY');
    });

    it('answers 413 TOUCHSTONE_TOO_LARGE for a real upload over 32 MiB', async () => {
      const line = '868 0.2 0.0\n';
      const big = Buffer.from(`# MHz S RI R 50\n${line.repeat(Math.ceil((TOUCHSTONE_MAX_BYTES + 1024) / line.length))}`);
      expect(big.length).toBeGreaterThan(TOUCHSTONE_MAX_BYTES);
      const res = await analyze(big, 'big.s1p').expect(413);
      expect(res.body).toMatchObject({ code: 'TOUCHSTONE_TOO_LARGE' });
    });

    it('reads Example A: VSWR 3.0 / 1.5 / 2.0 at 820 / 868 / 915 MHz', async () => {
      const res = await analyze(EXAMPLE_A, 'example-a.s1p').expect(200);
      expect(res.body).toMatchObject({
        version: '1.0',
        ports: 1,
        parameter: 'S',
        format: 'RI',
        referenceOhms: [50],
        points: 3,
        port: 1,
        criterion: 'vswr',
        resampled: false,
      });
      expect(res.body.minFrequencyHz).toBe(820e6);
      expect(res.body.maxFrequencyHz).toBe(915e6);
      // Example A expected values (Pozar 4th ed. §2.3 formulas)
      const [a, b, c] = res.body.curve;
      expect(a.vswr).toBeCloseTo(3.0, 6);
      expect(a.returnLossDb).toBeCloseTo(6.02, 2);
      expect(b.vswr).toBeCloseTo(1.5, 6);
      expect(b.returnLossDb).toBeCloseTo(13.98, 2);
      expect(c.gammaMagnitude).toBeCloseTo(0.3333, 4);
      expect(c.vswr).toBeCloseTo(2.0, 3);
      expect(c.returnLossDb).toBeCloseTo(9.54, 2);
      expect(res.body.bestMatch).toMatchObject({ frequencyHz: 868e6 });
      expect(res.body.bestMatch.vswr).toBeCloseTo(1.5, 6);
      // VSWR 2 ⇔ |Γ| 1/3 (Pozar 4th ed. §2.3); 915 MHz holds |Γ| 0.3333 < 1/3, so the range reaches the last point.
      // The lower edge: |Γ| falls linearly from 0.5 (820) to 0.2 (868) and crosses 1/3 at 820 + 48 × (1/6)/0.3 = 846.67 MHz.
      expect(res.body.matchedRanges).toHaveLength(1);
      expect(res.body.matchedRanges[0].fromHz / 1e6).toBeCloseTo(846.667, 2);
      expect(res.body.matchedRanges[0].toHz).toBe(915e6);
      expect(res.body.thresholdVswr).toBeCloseTo(2, 9);
      expect(res.body.thresholdReturnLossDb).toBeCloseTo(9.54, 2);
    });

    it('narrows the ranges for the −10 dB criterion (VSWR 1.925) and widens them for VSWR 3', async () => {
      // Pozar 4th ed. §2.3: −10 dB is |Γ| 0.3162, stricter than VSWR 2; 915 MHz (|Γ| 0.3333) drops out.
      const strict = await analyze(EXAMPLE_A, 'a.s1p', { criterion: 'return-loss-10db' }).expect(200);
      expect(strict.body.thresholdVswr).toBeCloseTo(1.925, 3);
      expect(strict.body.matchedRanges).toHaveLength(1);
      expect(strict.body.matchedRanges[0].toHz).toBeLessThan(915e6);
      expect(strict.body.matchedRanges[0].fromHz).toBeGreaterThan(846.67e6);
      // VSWR 3 ⇔ |Γ| 0.5, met at every point of Example A.
      const loose = await analyze(EXAMPLE_A, 'a.s1p', { vswrMax: '3' }).expect(200);
      expect(loose.body.matchedRanges).toEqual([{ fromHz: 820e6, toHz: 915e6 }]);
    });

    it('analyses either port of a version 1 two-port file (Example B)', async () => {
      // Example B: S11 0.333 ∠−30°, S22 0.20 ∠45° at 2.40 GHz.
      const port1 = await analyze(EXAMPLE_B, 'example-b.s2p').expect(200);
      expect(port1.body.ports).toBe(2);
      expect(port1.body.curve[0].gammaMagnitude).toBeCloseTo(0.333, 9);
      const port2 = await analyze(EXAMPLE_B, 'example-b.s2p', { port: '2' }).expect(200);
      expect(port2.body.port).toBe(2);
      expect(port2.body.curve[0].gammaMagnitude).toBeCloseTo(0.2, 9);
      expect(port2.body.curve[1].gammaMagnitude).toBeCloseTo(0.18, 9);
    });

    it('reads a version 2 file (Example C) uploaded as .ts', async () => {
      const res = await analyze(EXAMPLE_C, 'example-c.ts').expect(200);
      expect(res.body).toMatchObject({ version: '2.0', ports: 2, format: 'DB' });
      // S11 −9.54 dB ⇒ RL 9.54 dB, VSWR ≈ 2 (Pozar 4th ed. §2.3).
      expect(res.body.curve[0].returnLossDb).toBeCloseTo(9.54, 9);
      expect(res.body.curve[0].vswr).toBeCloseTo(2.0, 2);
    });

    it('resamples a long file to 2000 plot points but computes the ranges on every point', async () => {
      // A 5001-point resonance whose |Γ| is linear in frequency on each side: edges are known exactly.
      const count = 5001;
      const frequenciesHz = Array.from({ length: count }, (_, i) => 800e6 + i * 40e3);
      const gamma = frequenciesHz.map((f) => Math.min(0.9, 0.1 + Math.abs(f - 900e6) / 50e6));
      const text = writeTouchstone({ version: 1, ports: 1, frequenciesHz, data: [{ re: gamma, im: gamma.map(() => 0) }], frequencyUnit: 'MHz' });
      const res = await analyze(text, 'long.s1p').expect(200);
      expect(res.body.points).toBe(count);
      expect(res.body.resampled).toBe(true);
      expect(res.body.curve).toHaveLength(2000);
      expect(res.body.curve[0].frequencyHz).toBe(800e6);
      expect(res.body.curve[1999].frequencyHz).toBe(1000e6);
      // |Γ| = 1/3 where |f − 900 MHz| = (1/3 − 0.1) × 50 MHz = 11.667 MHz.
      expect(res.body.matchedRanges).toHaveLength(1);
      expect(res.body.matchedRanges[0].fromHz / 1e6).toBeCloseTo(888.333, 3);
      expect(res.body.matchedRanges[0].toHz / 1e6).toBeCloseTo(911.667, 3);
      expect(res.body.bestMatch.frequencyHz).toBe(900e6);
    });
  });

  describe('POST /api/rf/matching', () => {
    // Pozar, Microwave Engineering 4th ed., Example 5.1 (from memory): Z0 = 100 Ω, Z_L = 200 − j100 Ω, 500 MHz.
    const pozar = { frequencyHz: 500e6, loadOhms: { re: 200, im: -100 }, z0Ohms: 100, series: 'E24' };

    it('answers 401 without a token', async () => {
      await http().post('/api/rf/matching').send(pozar).expect(401);
    });

    it.each(ROLES)('lets the %s design a match', async (role) => {
      await http().post('/api/rf/matching').set(auth(role)).send(pozar).expect(200);
    });

    it('answers 400 naming the nested fields', async () => {
      const missing = await http()
        .post('/api/rf/matching')
        .set(auth())
        .send({ ...pozar, loadOhms: { im: -100 } })
        .expect(400);
      expect(fieldsOf(missing.body)).toContain('loadOhms.re');
      const noLoad = await http()
        .post('/api/rf/matching')
        .set(auth())
        .send({ ...pozar, loadOhms: undefined })
        .expect(400);
      expect(fieldsOf(noLoad.body)).toContain('loadOhms');
      const lossless = await http()
        .post('/api/rf/matching')
        .set(auth())
        .send({ ...pozar, loadOhms: { re: 0, im: 10 } })
        .expect(400);
      expect(fieldsOf(lossless.body)).toEqual(['loadOhms.re']);
      const sweep = await http()
        .post('/api/rf/matching')
        .set(auth())
        .send({ ...pozar, sweep: { fromHz: 600e6, toHz: 400e6 } })
        .expect(400);
      expect(fieldsOf(sweep.body)).toEqual(['sweep.toHz']);
      const zero = await http()
        .post('/api/rf/matching')
        .set(auth())
        .send({ ...pozar, frequencyHz: 0 })
        .expect(400);
      expect(fieldsOf(zero.body)).toEqual(['frequencyHz']);
      const tooHigh = await http()
        .post('/api/rf/matching')
        .set(auth())
        .send({ ...pozar, frequencyHz: 301e9 })
        .expect(400);
      expect(fieldsOf(tooHigh.body)).toEqual(['frequencyHz']);
      const z0 = await http()
        .post('/api/rf/matching')
        .set(auth())
        .send({ ...pozar, z0Ohms: -50 })
        .expect(400);
      expect(fieldsOf(z0.body)).toContain('z0Ohms');
      const series = await http()
        .post('/api/rf/matching')
        .set(auth())
        .send({ ...pozar, series: 'E96' })
        .expect(400);
      expect(fieldsOf(series.body)).toEqual(['series']);
    });

    it('gives Pozar Example 5.1: 0.923 pF shunt + 38.98 nH series, and 46.1 nH shunt + 2.60 pF series', async () => {
      const res = await http()
        .post('/api/rf/matching')
        .set(auth())
        .send({ ...pozar, sweep: { fromHz: 400e6, toHz: 600e6, points: 201 } })
        .expect(200);
      const shuntAtLoad = res.body.solutions.filter((s: { topology: string }) => s.topology === 'shunt-at-load');
      expect(shuntAtLoad).toHaveLength(2);
      const [first, second] = shuntAtLoad;
      // Solution 1: shunt C next to the load, series L towards the source (Pozar's rounding: 3 significant figures).
      expect(first.exact.elements[0]).toMatchObject({ connection: 'shunt', position: 'load-side', kind: 'capacitor' });
      expect(first.exact.elements[0].capacitancePf).toBeCloseTo(0.923, 3);
      expect(first.exact.elements[1]).toMatchObject({ connection: 'series', position: 'source-side', kind: 'inductor' });
      expect(first.exact.elements[1].inductanceNh).toBeCloseTo(38.98, 1);
      // Solution 2: shunt L at the load, series C.
      expect(second.exact.elements[0]).toMatchObject({ connection: 'shunt', kind: 'inductor' });
      expect(second.exact.elements[0].inductanceNh).toBeCloseTo(46.1, 1);
      expect(second.exact.elements[1]).toMatchObject({ connection: 'series', kind: 'capacitor' });
      expect(second.exact.elements[1].capacitancePf).toBeCloseTo(2.6, 2);
      // IEC 60063:2015 E24: 0.923 pF → 0.91 pF, 38.98 nH → 39 nH.
      expect(first.snapped.elements[0].capacitancePf).toBe(0.91);
      expect(first.snapped.elements[1].inductanceNh).toBe(39);
      expect(first.snappedReturnLossDb).toBeGreaterThan(20);
      // The exact network matches at 500 MHz (point 100 of 201) and the return loss falls away from it.
      expect(first.exact.sweep).toHaveLength(201);
      const centre = first.exact.sweep[100];
      expect(centre.frequencyHz).toBe(500e6);
      expect(centre.returnLossDb === null || centre.returnLossDb > 60).toBe(true);
      expect(first.exact.sweep[0].returnLossDb).toBeLessThan(40);
      expect(first.snapped.sweep).toHaveLength(201);
    });

    it('snaps to E12 when asked: 0.923 pF → 1.0 pF', async () => {
      const res = await http()
        .post('/api/rf/matching')
        .set(auth())
        .send({ ...pozar, series: 'E12' })
        .expect(200);
      // IEC 60063:2015: 0.923 pF → E12 1.0 pF
      expect(res.body.solutions[0].snapped.elements[0].capacitancePf).toBe(1);
      expect(res.body.solutions[0].exact.sweep).toEqual([]);
    });
  });

  describe('POST /api/rf/link-budget', () => {
    const base = { frequencyHz: 2.4e9, distanceM: 10, txPowerDbm: 0, txGainDbi: 0, rxGainDbi: 0, lossesDb: 0, rxSensitivityDbm: -100.05 };

    it('answers 401 without a token', async () => {
      await http().post('/api/rf/link-budget').send(base).expect(401);
    });

    it.each(ROLES)('lets the %s compute a budget', async (role) => {
      await http().post('/api/rf/link-budget').set(auth(role)).send(base).expect(200);
    });

    it('answers 400 naming missing and out-of-range fields', async () => {
      const { distanceM: _omit, ...noDistance } = base;
      expect(fieldsOf((await http().post('/api/rf/link-budget').set(auth()).send(noDistance).expect(400)).body)).toContain('distanceM');
      expect(
        fieldsOf(
          (
            await http()
              .post('/api/rf/link-budget')
              .set(auth())
              .send({ ...base, frequencyHz: -1 })
              .expect(400)
          ).body,
        ),
      ).toContain('frequencyHz');
      expect(
        fieldsOf(
          (
            await http()
              .post('/api/rf/link-budget')
              .set(auth())
              .send({ ...base, txPowerDbm: 'high' })
              .expect(400)
          ).body,
        ),
      ).toContain('txPowerDbm');
    });

    it('matches the FSPL table: 2.4 GHz is 60.05 dB at 10 m and 100.05 dB at 1 km', async () => {
      // Friis, Proc. IRE 34 (1946): with a −100.05 dBm receiver, 40 dB of margin at 10 m reaches 0 dB at 1 km.
      const res = await http().post('/api/rf/link-budget').set(auth()).send(base).expect(200);
      expect(res.body.pathLossDb).toBeCloseTo(60.05, 2);
      expect(res.body.receivedDbm).toBeCloseTo(-60.05, 2);
      expect(res.body.marginDb).toBeCloseTo(40, 2);
      expect(res.body.maxRangeM).toBeGreaterThan(995);
      expect(res.body.maxRangeM).toBeLessThan(1005);
      // Range ratio for −6 dB is 10^(−6/20) = 0.501 (common practice: "6 dB halves the range").
      expect(res.body.rangeRatioFor6DbLess).toBeCloseTo(0.501, 3);
    });

    it('gives EIRP and ERP: 25 mW (13.98 dBm) into a λ/2 dipole is 16.13 dBm EIRP, 13.98 dBm ERP; 868 MHz at 1 km loses 91.22 dB', async () => {
      // EIRP = ERP + 2.15 dB (ITU RR Art. 1); free-space loss at 868 MHz over 1 km: 91.22 dB (Friis, Proc. IRE 34 (1946)).
      const res = await http()
        .post('/api/rf/link-budget')
        .set(auth())
        .send({ frequencyHz: 868e6, distanceM: 1000, txPowerDbm: 13.979, txGainDbi: 2.15, rxGainDbi: 2.15, lossesDb: 3, rxSensitivityDbm: -120 })
        .expect(200);
      expect(res.body.eirpDbm).toBeCloseTo(16.13, 2);
      expect(res.body.erpDbm).toBeCloseTo(13.98, 2);
      expect(res.body.pathLossDb).toBeCloseTo(91.22, 2);
      expect(res.body.receivedDbm).toBeCloseTo(16.129 - 91.22 - 3 + 2.15, 1);
      expect(res.body.marginDb).toBeCloseTo(res.body.receivedDbm + 120, 9);
    });
  });

  describe('POST /api/rf/conversions', () => {
    it('answers 401 without a token', async () => {
      await http().post('/api/rf/conversions').send({ vswr: 2 }).expect(401);
    });

    it.each(ROLES)('lets the %s convert', async (role) => {
      await http().post('/api/rf/conversions').set(auth(role)).send({ vswr: 2 }).expect(200);
    });

    it('answers 400 for no quantity, two quantities, and out-of-range values, naming the fields', async () => {
      expect(fieldsOf((await http().post('/api/rf/conversions').set(auth()).send({}).expect(400)).body)).toEqual(['body']);
      expect(fieldsOf((await http().post('/api/rf/conversions').set(auth()).send({ vswr: 2, dbm: 3 }).expect(400)).body)).toEqual(['vswr, dbm']);
      expect(fieldsOf((await http().post('/api/rf/conversions').set(auth()).send({ vswr: 0.5 }).expect(400)).body)).toEqual(['vswr']);
      expect(fieldsOf((await http().post('/api/rf/conversions').set(auth()).send({ gammaMagnitude: 1.2 }).expect(400)).body)).toEqual(['gammaMagnitude']);
      expect(fieldsOf((await http().post('/api/rf/conversions').set(auth()).send({ efficiencyPct: 120 }).expect(400)).body)).toEqual(['efficiencyPct']);
      expect(
        fieldsOf(
          (
            await http()
              .post('/api/rf/conversions')
              .set(auth())
              .send({ impedanceOhms: { re: 50 } })
              .expect(400)
          ).body,
        ),
      ).toEqual(['impedanceOhms.im']);
      expect(fieldsOf((await http().post('/api/rf/conversions').set(auth()).send({ vswr: 2, z0Ohms: 75 }).expect(400)).body)).toEqual(['z0Ohms']);
    });

    // Pozar 4th ed. §2.3: VSWR, |Γ|, RL, reflected %, transmitted %, ML.
    it.each([
      [1.5, 0.2, 13.98, 4.0, 96.0, 0.177],
      [2, 0.3333, 9.54, 11.11, 88.89, 0.512],
      [3, 0.5, 6.02, 25.0, 75.0, 1.249],
      [10, 0.8182, 1.74, 66.94, 33.06, 4.807],
    ])('converts VSWR %s to |Γ| %s, RL %s dB, %s %% reflected, %s %% transmitted, ML %s dB', async (vswr, gamma, rl, reflected, transmitted, ml) => {
      const res = await http().post('/api/rf/conversions').set(auth()).send({ vswr }).expect(200);
      expect(res.body.input).toBe('vswr');
      expect(res.body.reflection.gammaMagnitude).toBeCloseTo(gamma, 4);
      expect(res.body.reflection.returnLossDb).toBeCloseTo(rl, 2);
      expect(res.body.reflection.reflectedPercent).toBeCloseTo(reflected, 2);
      expect(res.body.reflection.transmittedPercent).toBeCloseTo(transmitted, 2);
      expect(res.body.reflection.mismatchLossDb).toBeCloseTo(ml, 3);
    });

    it('converts return loss 10 dB to |Γ| 0.3162, VSWR 1.925, ML 0.458 dB', async () => {
      // Pozar 4th ed. §2.3, the inverse direction
      const res = await http().post('/api/rf/conversions').set(auth()).send({ returnLossDb: 10 }).expect(200);
      expect(res.body.reflection.gammaMagnitude).toBeCloseTo(0.3162, 4);
      expect(res.body.reflection.vswr).toBeCloseTo(1.925, 3);
      expect(res.body.reflection.mismatchLossDb).toBeCloseTo(0.458, 3);
    });

    it('converts |Γ| 0 to VSWR 1 with an infinite return loss sent as null', async () => {
      const res = await http().post('/api/rf/conversions').set(auth()).send({ gammaMagnitude: 0 }).expect(200);
      expect(res.body.reflection).toMatchObject({ vswr: 1, returnLossDb: null, mismatchLossDb: 0, transmittedPercent: 100 });
    });

    it('converts 50 + j50 Ω on 50 Ω to Γ 0.2 + j0.4, |Γ| 0.4472 ∠63.43°, VSWR 2.618', async () => {
      // Γ = (Z − Z0)/(Z + Z0), Pozar 4th ed. §2.3
      const res = await http()
        .post('/api/rf/conversions')
        .set(auth())
        .send({ impedanceOhms: { re: 50, im: 50 } })
        .expect(200);
      expect(res.body.gamma.re).toBeCloseTo(0.2, 9);
      expect(res.body.gamma.im).toBeCloseTo(0.4, 9);
      expect(res.body.gamma.angleDeg).toBeCloseTo(63.43, 2);
      expect(res.body.reflection.vswr).toBeCloseTo(2.618, 3);
      expect(res.body.reflection.transmittedPercent).toBeCloseTo(80, 6);
    });

    it('converts 40 + j70 Ω on 100 Ω to |Γ| 0.589 ∠104.04°, SWR 3.87, RL 4.60 dB', async () => {
      // Pozar 4th ed. Example 2.2
      const res = await http()
        .post('/api/rf/conversions')
        .set(auth())
        .send({ impedanceOhms: { re: 40, im: 70 }, z0Ohms: 100 })
        .expect(200);
      expect(res.body.gamma.magnitude).toBeCloseTo(0.589, 3);
      expect(res.body.gamma.angleDeg).toBeCloseTo(104.04, 2);
      expect(res.body.reflection.vswr).toBeCloseTo(3.87, 2);
      expect(res.body.reflection.returnLossDb).toBeCloseTo(4.6, 2);
    });

    it.each([
      [900e6, 333.1, 166.55, 83.28],
      [1575.42e6, 190.29, 95.15, 47.57],
      [2.45e9, 122.36, 61.18, 30.59],
    ])('gives λ, λ/2, λ/4 at %s Hz as %s / %s / %s mm', async (frequencyHz, full, half, quarter) => {
      // λ = c/f with c exact (BIPM SI Brochure 9th ed.)
      const res = await http().post('/api/rf/conversions').set(auth()).send({ frequencyHz }).expect(200);
      expect(res.body.wavelength.wavelengthMm).toBeCloseTo(full, 1);
      expect(res.body.wavelength.halfWaveMm).toBeCloseTo(half, 1);
      expect(res.body.wavelength.quarterWaveMm).toBeCloseTo(quarter, 1);
    });

    it('converts 25 mW to 13.979 dBm and back (regulators quote mW; kept unrounded)', async () => {
      const toDbm = await http().post('/api/rf/conversions').set(auth()).send({ mw: 25 }).expect(200);
      expect(toDbm.body.power.dbm).toBeCloseTo(13.979, 3);
      expect(toDbm.body.power.watts).toBeCloseTo(0.025, 9);
      const toMw = await http().post('/api/rf/conversions').set(auth()).send({ dbm: 30 }).expect(200);
      expect(toMw.body.power.mw).toBeCloseTo(1000, 9);
    });

    it('converts efficiency 50 % to −3.01 dB and −6 dB to 25.1 %', async () => {
      // the definition of the decibel
      const pct = await http().post('/api/rf/conversions').set(auth()).send({ efficiencyPct: 50 }).expect(200);
      expect(pct.body.efficiency.db).toBeCloseTo(-3.01, 2);
      const db = await http().post('/api/rf/conversions').set(auth()).send({ efficiencyDb: -6 }).expect(200);
      expect(db.body.efficiency.percent).toBeCloseTo(25.1, 1);
    });
  });
});
