import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { execFileSync } from 'node:child_process';
import { DataSource } from 'typeorm';
import { getDataSourceToken } from '@nestjs/typeorm';
import { writeTouchstone } from '../../src-server/rf/touchstone-writer';
import { demoAssemblyFile } from '../../src-server/products/in-product/demo-assembly';
import { createApiApp, demoTokens, unique } from '../support/api-app';

type Role = 'admin' | 'engineer' | 'procurement';

/** A constant S-matrix over a sweep, written as an N-port Touchstone 1.0 RI file (invented test data). */
function constantNetwork(matrix: number[][], mhz: number[]): string {
  const ports = matrix.length;
  return writeTouchstone({
    version: 1,
    ports,
    frequencyUnit: 'MHz',
    format: 'RI',
    comments: ['test data, invented'],
    frequenciesHz: mhz.map((f) => f * 1e6),
    data: matrix.flat().map((value) => ({ re: mhz.map(() => value), im: mhz.map(() => 0) })),
  });
}

describe('in-product measurements (API)', () => {
  let app: INestApplication;
  let tokens: Record<Role, string>;
  const http = () => request(app.getHttpServer());
  const as = (role: Role) => ({ Authorization: `Bearer ${tokens[role]}` });
  const base = (productId: number) => `/api/products/${productId}/in-product-measurements`;
  const upload = (productId: number, role: Role, name: string, content: string | Buffer, note?: string) => {
    let req = http().post(base(productId)).set(as(role));
    if (note !== undefined) req = req.field('note', note);
    return req.attach('file', Buffer.isBuffer(content) ? content : Buffer.from(content), name);
  };
  const rowsOf = async (productId: number) => {
    const ds = app.get<DataSource>(getDataSourceToken());
    const [row] = await ds.query('SELECT COUNT(*) AS n FROM in_product_measurements WHERE product_id = ?', [productId]);
    return Number(row.n);
  };
  const createProduct = async () => {
    const body = {
      name: unique('In-product test'),
      code: unique('IP').slice(0, 40),
      owner: 'Test Owner',
      groundPlaneLengthMm: 80,
      groundPlaneWidthMm: 40,
      targetRegions: ['EU'],
    };
    return (await http().post('/api/products').set(as('engineer')).send(body).expect(201)).body as { id: number };
  };
  const createRadio = async (productId: number, name: string, bandIds: number[]) => {
    const body = {
      name,
      technology: 'lte',
      module: 'Test modem (invented)',
      transmitPowerDbm: 23,
      polarization: 'linear',
      connector: 'solder-pad',
      feedLossDb: 0,
      bands: bandIds.map((bandId) => ({ bandId, certifiedMaxGainDbi: 5 })),
    };
    return (await http().post(`/api/products/${productId}/radios`).set(as('engineer')).send(body).expect(201)).body as { id: number };
  };

  // Band 120 is LTE B20 (uplink 832–862, downlink 791–821 MHz, 3GPP TS 36.101 Table 5.5-1); band 103 is B3.
  const sweepMhz = [780, 800, 820, 840, 860, 880];

  beforeAll(async () => {
    app = await createApiApp();
    tokens = await demoTokens(app);
  });
  afterAll(() => app.close());

  it('stores an N-port file, lists it, serves the original byte for byte and deletes it', async () => {
    const product = await createProduct();
    const file = constantNetwork(
      [
        [0.2, 0.1, 0.05],
        [0.1, 0.3, 0.02],
        [0.05, 0.02, 0.1],
      ],
      sweepMhz,
    );
    expect((await upload(product.id, 'procurement', 'housing.s3p', file).expect(403)).body.code).toBe('FORBIDDEN_ROLE');
    const none = await http().post(base(product.id)).set(as('engineer')).expect(400);
    expect(none.body.fields[0].field).toBe('file');
    await upload(999999, 'engineer', 'housing.s3p', file).expect(404);

    const res = await upload(product.id, 'engineer', 'housing.s3p', file, 'prototype housing').expect(201);
    expect(res.body).toMatchObject({
      productId: product.id,
      ports: 3,
      pointCount: 6,
      fromMhz: 780,
      toMhz: 880,
      fileName: 'housing.s3p',
      note: 'prototype housing',
      portMapping: [],
    });
    expect(res.body.referenceOhms).toEqual([50, 50, 50]);

    const list = await http().get(base(product.id)).set(as('procurement')).expect(200);
    expect(list.body.map((m: { id: number }) => m.id)).toEqual([res.body.id]);
    const one = await http()
      .get(`${base(product.id)}/${res.body.id}`)
      .set(as('procurement'))
      .expect(200);
    expect(one.body.ports).toBe(3);
    const original = await http()
      .get(`${base(product.id)}/${res.body.id}/file`)
      .set(as('procurement'))
      .buffer(true)
      .parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      })
      .expect(200);
    expect((original.body as Buffer).equals(Buffer.from(file))).toBe(true);

    await http()
      .delete(`${base(product.id)}/${res.body.id}`)
      .set(as('procurement'))
      .expect(403);
    await http()
      .delete(`${base(product.id)}/${res.body.id}`)
      .set(as('engineer'))
      .expect(204);
    await http()
      .get(`${base(product.id)}/${res.body.id}`)
      .set(as('engineer'))
      .expect(404);
    await http()
      .get(`${base(product.id)}/${res.body.id}/file`)
      .set(as('engineer'))
      .expect(404);
    expect(await rowsOf(product.id)).toBe(0);
  });

  it('refuses bad files with the file line, and stores nothing', async () => {
    const product = await createProduct();
    // Line 4 holds a word where a number belongs.
    const badNumber = '! invented\n# MHz S RI R 50\n800 0.1 0 0.1 0 0.1 0 0.1 0\n820 0.1 x 0.1 0 0.1 0 0.1 0\n';
    const res = await upload(product.id, 'engineer', 'bad.s2p', badNumber).expect(422);
    expect(res.body.line).toBe(4);
    // |S22| = 1.2 on line 4: no passive antenna reflects more than it receives.
    const active = '! invented\n# MHz S RI R 50\n800 0.1 0 0.1 0 0.1 0 0.1 0\n820 0.1 0 0.1 0 0.1 0 1.2 0\n';
    const above = await upload(product.id, 'engineer', 'active.s2p', active).expect(422);
    expect(above.body).toMatchObject({ code: 'MEASUREMENT_REFLECTION_ABOVE_ONE', line: 4 });
    // A .s3p name on a 2-port file.
    await upload(product.id, 'engineer', 'wrong.s3p', '# MHz S RI R 50\n800 0.1 0 0.1 0 0.1 0 0.1 0\n820 0.1 0 0.1 0 0.1 0 0.1 0\n').expect(422);
    expect((await upload(product.id, 'engineer', 'binary.s2p', Buffer.from([0, 1, 2, 3])).expect(415)).body.code).toBe('IN_PRODUCT_FILE_TYPE_NOT_ALLOWED');
    expect(await rowsOf(product.id)).toBe(0);
  });

  it('refuses a file under the byte cap whose S-matrix would be too large to store (many ports × many points), and stores nothing', async () => {
    const product = await createProduct();
    // 8 ports × 20,000 points of zeros: about 5 MB of text, but 1,280,000 complex values (20 MB as doubles).
    const ports = 8;
    const points = 20_000;
    const frequenciesHz = Float64Array.from({ length: points }, (_, i) => 1e9 + i * 1e4);
    const data = Array.from({ length: ports * ports }, () => ({ re: new Float64Array(points), im: new Float64Array(points) }));
    const text = writeTouchstone({ version: 1, ports, frequenciesHz, data, format: 'RI', frequencyUnit: 'Hz' });
    expect(text.length).toBeLessThan(16 * 1024 * 1024);
    const res = await upload(product.id, 'engineer', 'huge.s8p', text).expect(413);
    expect(res.body).toMatchObject({ code: 'IN_PRODUCT_TOO_MANY_VALUES', field: 'file' });
    expect(await rowsOf(product.id)).toBe(0);
  }, 60_000);

  it('maps ports to radios and roles, naming the field of each bad entry', async () => {
    const product = await createProduct();
    const other = await createProduct();
    const radio = await createRadio(product.id, 'Cellular', [120]);
    const foreign = await createRadio(other.id, 'Foreign', [120]);
    const file = constantNetwork(
      [
        [0.2, 0.1],
        [0.1, 0.2],
      ],
      sweepMhz,
    );
    const stored = (await upload(product.id, 'engineer', 'pair.s2p', file).expect(201)).body;
    const ports = `${base(product.id)}/${stored.id}/ports`;
    const put = (role: Role, body: unknown) =>
      http()
        .put(ports)
        .set(as(role))
        .send(body as object);

    await put('procurement', [{ port: 1, radioId: radio.id, role: 'main' }]).expect(403);
    const beyond = await put('engineer', [{ port: 3, radioId: radio.id, role: 'main' }]).expect(400);
    expect(beyond.body.fields.map((f: { field: string }) => f.field)).toEqual(['[0].port']);
    const foreignRadio = await put('engineer', [{ port: 1, radioId: foreign.id, role: 'main' }]).expect(400);
    expect(foreignRadio.body.fields.map((f: { field: string }) => f.field)).toEqual(['[0].radioId']);
    const duplicate = await put('engineer', [
      { port: 1, radioId: radio.id, role: 'main' },
      { port: 1, radioId: radio.id, role: 'diversity' },
    ]).expect(400);
    expect(duplicate.body.fields.map((f: { field: string }) => f.field)).toEqual(['[1].port']);
    const badRole = await put('engineer', [{ port: 1, radioId: radio.id, role: 'spare' }]).expect(400);
    expect(badRole.body.fields.map((f: { field: string }) => f.field)).toEqual(['[0].role']);
    expect((await put('engineer', { port: 1 }).expect(400)).body.fields[0].field).toBe('body');

    const good = await put('engineer', [
      { port: 2, radioId: radio.id, role: 'diversity' },
      { port: 1, radioId: radio.id, role: 'main' },
    ]).expect(200);
    expect(good.body.portMapping).toEqual([
      { port: 1, radioId: radio.id, role: 'main', radioName: 'Cellular' },
      { port: 2, radioId: radio.id, role: 'diversity', radioName: 'Cellular' },
    ]);
    const read = await http()
      .get(`${base(product.id)}/${stored.id}`)
      .set(as('procurement'))
      .expect(200);
    expect(read.body.portMapping).toHaveLength(2);
  });

  it('isolation and envelope correlation of a constructed pair (Blanch, Romeu and Corbella, Electronics Letters 39(9), 2003)', async () => {
    const product = await createProduct();
    const radio = await createRadio(product.id, 'Cellular', [120]);
    // S11 = S22 = 0.2, S21 = S12 = 0.1 (real): isolation −20·log10(0.1) = 20 dB (Pozar 4th ed. §4.3);
    // ρe = |0.2·0.1 + 0.1·0.2|² / (1 − 0.04 − 0.01)² = 0.0016 / 0.9025 = 0.00177285 (worked by hand).
    const stored = (
      await upload(
        product.id,
        'engineer',
        'pair.s2p',
        constantNetwork(
          [
            [0.2, 0.1],
            [0.1, 0.2],
          ],
          sweepMhz,
        ),
      ).expect(201)
    ).body;
    await http()
      .put(`${base(product.id)}/${stored.id}/ports`)
      .set(as('engineer'))
      .send([
        { port: 1, radioId: radio.id, role: 'main' },
        { port: 2, radioId: radio.id, role: 'diversity' },
      ])
      .expect(200);
    const res = await http().get(`/api/products/${product.id}/isolation`).set(as('procurement')).expect(200);
    expect(res.body.antennas).toHaveLength(2);
    expect(res.body.isolation).toHaveLength(1);
    expect(res.body.isolation[0].worstIsolationDb).toBeCloseTo(20, 9);
    expect(res.body.isolation[0].bandPairs).toEqual([{ bandA: 'B20', bandB: 'B20', isolationDb: expect.any(Number) }]);
    expect(res.body.correlation).toHaveLength(1);
    expect(res.body.correlation[0]).toMatchObject({ radioId: radio.id, band: 'B20', threshold: 0.5, aboveThreshold: false });
    expect(res.body.correlation[0].worstEcc).toBeCloseTo(0.0016 / 0.9025, 12);
    expect(res.body.correlationAssumption.length).toBeGreaterThan(20);

    // Two uncoupled matched antennas: ρe = 0 (the numerator vanishes).
    const uncoupled = (
      await upload(
        product.id,
        'engineer',
        'uncoupled.s2p',
        constantNetwork(
          [
            [0, 0],
            [0, 0.1],
          ],
          sweepMhz,
        ),
      ).expect(201)
    ).body;
    await http()
      .delete(`${base(product.id)}/${stored.id}`)
      .set(as('engineer'))
      .expect(204);
    await http()
      .put(`${base(product.id)}/${uncoupled.id}/ports`)
      .set(as('engineer'))
      .send([
        { port: 1, radioId: radio.id, role: 'main' },
        { port: 2, radioId: radio.id, role: 'diversity' },
      ])
      .expect(200);
    const zero = await http().get(`/api/products/${product.id}/isolation`).set(as('engineer')).expect(200);
    expect(zero.body.correlation[0].worstEcc).toBe(0);
  });

  it("an antenna's in-product S11 replaces the evaluation-board S11, and the findings name the file and port", async () => {
    const product = await createProduct();
    const radio = await createRadio(product.id, 'Cellular', [120]);
    // Demo part 1002, an external LTE whip (invented demo data), chosen for the radio.
    await http().post(`/api/products/${product.id}/radios/${radio.id}/shortlist`).set(as('engineer')).send({ partId: 1002 }).expect(201);
    await http().put(`/api/products/${product.id}/radios/${radio.id}/choice`).set(as('engineer')).send({ partId: 1002 }).expect(200);
    const before = (await http().get(`/api/products/${product.id}/evaluation`).set(as('procurement')).expect(200)).body;
    expect(before.radios[0].chosen[0]).toMatchObject({ partId: 1002, role: 'main', s11Source: 'evaluation board' });
    const codesBefore = before.radios[0].bands[0].findings.map((f: { code: string }) => f.code);
    expect(codesBefore).not.toContain('S11_MEASURED_IN_PRODUCT');

    // Port 2 reflects |Γ| = 0.5 everywhere: VSWR (1 + 0.5)/(1 − 0.5) = 3.0 (Pozar 4th ed. §2.3).
    const stored = (
      await upload(
        product.id,
        'engineer',
        'enclosure.s2p',
        constantNetwork(
          [
            [0.1, 0.05],
            [0.05, 0.5],
          ],
          sweepMhz,
        ),
      ).expect(201)
    ).body;
    await http()
      .put(`${base(product.id)}/${stored.id}/ports`)
      .set(as('engineer'))
      .send([{ port: 2, radioId: radio.id, role: 'main' }])
      .expect(200);
    const after = (await http().get(`/api/products/${product.id}/evaluation`).set(as('procurement')).expect(200)).body;
    expect(after.radios[0].chosen[0].s11Source).toBe('measured in product, file enclosure.s2p, port 2');
    const band = after.radios[0].bands[0];
    expect(band.facts.worstVswr).toBeCloseTo(3, 6);
    const note = band.findings.find((f: { code: string }) => f.code === 'S11_MEASURED_IN_PRODUCT');
    expect(note.severity).toBe('info');
    expect(note.message).toContain('enclosure.s2p');
    expect(note.message).toContain('port 2');

    // Without the measurement the evaluation-board S11 is back.
    await http()
      .delete(`${base(product.id)}/${stored.id}`)
      .set(as('engineer'))
      .expect(204);
    const again = (await http().get(`/api/products/${product.id}/evaluation`).set(as('procurement')).expect(200)).body;
    expect(again.radios[0].chosen[0].s11Source).toBe('evaluation board');
    expect(again.radios[0].bands[0].facts.worstVswr).toBe(before.radios[0].bands[0].facts.worstVswr);
  });

  it('two antennas of one radio correlated above the rule limit: a finding on the band that counts into the verdict (rules/system/envelope-correlation.json)', async () => {
    const product = await createProduct();
    const radio = (
      await http()
        .post(`/api/products/${product.id}/radios`)
        .set(as('engineer'))
        .send({
          name: 'Cellular',
          technology: 'lte',
          module: 'Test modem (invented)',
          transmitPowerDbm: 23,
          polarization: 'linear',
          connector: 'solder-pad',
          feedLossDb: 0,
          antennaRoles: ['main', 'diversity'],
          bands: [{ bandId: 120, certifiedMaxGainDbi: 5 }],
        })
        .expect(201)
    ).body;
    for (const [partId, role] of [
      [1002, 'main'],
      [1004, 'diversity'],
    ] as const)
      await http().put(`/api/products/${product.id}/radios/${radio.id}/choice`).set(as('engineer')).send({ partId, role }).expect(200);
    const mapBoth = (id: number) =>
      http()
        .put(`${base(product.id)}/${id}/ports`)
        .set(as('engineer'))
        .send([
          { port: 1, radioId: radio.id, role: 'main' },
          { port: 2, radioId: radio.id, role: 'diversity' },
        ])
        .expect(200);
    const correlationFindings = async () =>
      (await http().get(`/api/products/${product.id}/evaluation`).set(as('procurement')).expect(200)).body.radios[0].bands[0].findings.filter(
        (f: { code: string }) => f.code === 'ENVELOPE_CORRELATION_HIGH',
      );

    // Nearly uncoupled: ρe = |0.2·0.01 + 0.01·0.2|² / (1 − 0.04 − 0.0001)² ≈ 1.7e-5 (Blanch, Romeu and Corbella 2003), under 0.5.
    const loose = (
      await upload(
        product.id,
        'engineer',
        'loose.s2p',
        constantNetwork(
          [
            [0.2, 0.01],
            [0.01, 0.2],
          ],
          sweepMhz,
        ),
      ).expect(201)
    ).body;
    await mapBoth(loose.id);
    expect(await correlationFindings()).toEqual([]);
    await http()
      .delete(`${base(product.id)}/${loose.id}`)
      .set(as('engineer'))
      .expect(204);

    // S11 = S12 = S21 = S22 = 0.5: |0.25 + 0.25|² / (1 − 0.25 − 0.25)² = 1, fully correlated (constructed from the formula).
    const tight = (
      await upload(
        product.id,
        'engineer',
        'tight.s2p',
        constantNetwork(
          [
            [0.5, 0.5],
            [0.5, 0.5],
          ],
          sweepMhz,
        ),
      ).expect(201)
    ).body;
    await mapBoth(tight.id);
    const isolation = (await http().get(`/api/products/${product.id}/isolation`).set(as('procurement')).expect(200)).body;
    expect(isolation.correlation[0]).toMatchObject({ band: 'B20', threshold: 0.5, aboveThreshold: true });
    expect(isolation.correlation[0].worstEcc).toBeCloseTo(1, 9);
    const [finding] = await correlationFindings();
    expect(finding).toMatchObject({ severity: 'marginal', ruleId: 'envelope-correlation' });
    expect(finding.message).toContain('1.00');
    const result = (await http().get(`/api/products/${product.id}/evaluation`).set(as('procurement')).expect(200)).body;
    expect(['marginal', 'fail']).toContain(result.radios[0].bands[0].verdict);
    expect(['marginal', 'fail']).toContain(result.verdict);
  });

  it('a radio with main and diversity antennas: one part chosen per role, each listed with its role in the evaluation', async () => {
    const product = await createProduct();
    const body = {
      name: 'Cellular',
      technology: 'lte',
      module: 'Test modem (invented)',
      transmitPowerDbm: 23,
      polarization: 'linear',
      connector: 'solder-pad',
      feedLossDb: 0,
      antennaRoles: ['main', 'diversity'],
      bands: [{ bandId: 120, certifiedMaxGainDbi: 5 }],
    };
    const radio = (await http().post(`/api/products/${product.id}/radios`).set(as('engineer')).send(body).expect(201)).body;
    expect(radio.antennaRoles).toEqual(['main', 'diversity']);
    const bad = await http()
      .post(`/api/products/${product.id}/radios`)
      .set(as('engineer'))
      .send({ ...body, antennaRoles: ['main', 'spare'] })
      .expect(400);
    expect(bad.body.fields[0].field).toContain('antennaRoles');
    const choose = (partId: number, role?: string) =>
      http()
        .put(`/api/products/${product.id}/radios/${radio.id}/choice`)
        .set(as('engineer'))
        .send(role ? { partId, role } : { partId });
    expect((await choose(1002, 'mimo-2').expect(400)).body.fields[0].field).toBe('role');
    await choose(1002).expect(200);
    const assignments = (await choose(1004, 'diversity').expect(200)).body as { partId: number; state: string; role: string }[];
    expect(assignments.filter((a) => a.state === 'chosen').map((a) => [a.partId, a.role])).toEqual(
      expect.arrayContaining([
        [1002, 'main'],
        [1004, 'diversity'],
      ]),
    );
    const result = (await http().get(`/api/products/${product.id}/evaluation`).set(as('procurement')).expect(200)).body;
    expect(result.radios[0].chosen.map((c: { partId: number; role: string }) => [c.partId, c.role])).toEqual([
      [1002, 'main'],
      [1004, 'diversity'],
    ]);
    // A radio without roles stated has one main antenna.
    const single = await createRadio(product.id, 'Single', [120]);
    expect((await http().get(`/api/products/${product.id}/radios/${single.id}`).set(as('procurement')).expect(200)).body.antennaRoles).toEqual(['main']);
  });

  it('the demo gateway: its LTE radio has a main and a diversity antenna, each judged with its in-product S11', async () => {
    const result = (await http().get('/api/products/2/evaluation').set(as('procurement')).expect(200)).body;
    const lte = result.radios.find((r: { radioId: number }) => r.radioId === 21);
    expect(lte.chosen.map((c: { partId: number; role: string; s11Source: string }) => [c.partId, c.role, c.s11Source])).toEqual([
      [1002, 'main', 'measured in product, file cold-chain-gateway-housing.s4p, port 1'],
      [1004, 'diversity', 'measured in product, file cold-chain-gateway-housing.s4p, port 2'],
    ]);
  });

  it('the demo gateway housing: ECC of LTE main and diversity per band matches numpy computing the formula independently', async () => {
    const res = await http().get('/api/products/2/isolation').set(as('procurement')).expect(200);
    const roles = res.body.antennas.map((a: { port: number; radioId: number; role: string }) => [a.port, a.radioId, a.role]);
    expect(roles).toEqual([
      [1, 21, 'main'],
      [2, 21, 'diversity'],
      [3, 22, 'main'],
      [4, 23, 'main'],
    ]);
    // Six pairs of four antennas.
    expect(res.body.isolation).toHaveLength(6);
    const rows = res.body.correlation as { band: string; worstEcc: number | null }[];
    const bands = await http().get('/api/bands').set(as('procurement')).expect(200);
    const rangesOf = (designation: string) =>
      (bands.body.items ?? bands.body)
        .find((b: { designation: string }) => b.designation === designation)
        .ranges.map((r: { fromMhz: number; toMhz: number }) => [r.fromMhz * 1e6, r.toMhz * 1e6]);
    const wanted = ['B1', 'B3', 'B8', 'B20'].map((band) => ({ band, ranges: rangesOf(band) }));
    // Debian's python3 with numpy: the file parsed again, ρe from Blanch, Romeu and Corbella (2003), worst per band
    // over the samples inside and the linearly interpolated edges.
    const script = `
import json, sys, numpy as np
text, wanted = sys.stdin.read().split('\\x00')
values = [float(v) for line in text.splitlines() if line.strip() and line[0] not in '!#' for v in line.split('!')[0].split()]
rows = np.array(values).reshape(-1, 33)
f = rows[:, 0] * 1e6
s = (rows[:, 1::2] + 1j * rows[:, 2::2]).reshape(-1, 4, 4)
s11, s12, s21, s22 = s[:, 0, 0], s[:, 0, 1], s[:, 1, 0], s[:, 1, 1]
ecc = abs(np.conj(s11) * s12 + np.conj(s21) * s22) ** 2 / ((1 - abs(s11) ** 2 - abs(s21) ** 2) * (1 - abs(s22) ** 2 - abs(s12) ** 2))
out = {}
for item in json.loads(wanted):
    worst = -1.0
    for lo, hi in item['ranges']:
        inside = ecc[(f > lo) & (f < hi)]
        worst = max([worst, float(np.interp(lo, f, ecc)), float(np.interp(hi, f, ecc))] + [float(v) for v in inside])
    out[item['band']] = worst
print(json.dumps(out))
`;
    const expected = JSON.parse(
      execFileSync('/usr/bin/python3', ['-c', script], { input: `${demoAssemblyFile()}\u0000${JSON.stringify(wanted)}`, encoding: 'utf8' }),
    );
    for (const { band } of wanted) {
      const row = rows.find((r) => r.band === band)!;
      expect(row.worstEcc).not.toBeNull();
      expect(Math.abs(row.worstEcc! - expected[band])).toBeLessThan(1e-9);
    }
  });
});
