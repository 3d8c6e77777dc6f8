import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { createApiApp, demoTokens, unique } from '../support/api-app';

// Demo data (catalog-seed/products.json, assignments.json): stable ids.
const TRACKER = 1;
const GATEWAY = 2;
const TRACKER_LTE = 11;
const TRACKER_GNSS = 12;
const TRACKER_BLE = 13;
const GATEWAY_WIFI = 22;
const GATEWAY_LORA = 23;
const LOW_EFFICIENCY_CHIP = 1029;
const GOOD_BLE_CHIP = 1025;
const RHCP_PATCH = 1022;
const N_PANEL = 1007;

type Verdict = 'pass' | 'marginal' | 'fail' | 'no-data';
interface Finding {
  ruleId: string;
  severity: string;
  code: string;
  title: string;
  message: string;
}
interface Facts {
  coverageFraction: number | null;
  coverageVswr: number;
  worstVswr: number | null;
  minTotalEfficiencyPct: number | null;
  avgTotalEfficiencyPct: number | null;
  minSystemEfficiencyPct: number | null;
  feedLossDb: number;
  peakGainDbi: number | null;
  eirpDbm: number | null;
}
interface Band {
  bandId: number;
  designation: string;
  verdict: Verdict;
  decidingFinding: Finding | null;
  partId: number | null;
  findings: Finding[];
  facts: Facts;
}
interface Radio {
  radioId: number;
  name: string;
  technology: string;
  verdict: Verdict;
  decidingFinding: Finding | null;
  reason: string;
  chosen: { partId: number; mpn: string; role: string; s11Source: string }[];
  bands: Band[];
}
interface Evaluation {
  productId: number;
  verdict: Verdict;
  reason: string;
  radios: Radio[];
  findings: (Finding & { radioId: number | null })[];
}
interface SpecBand {
  fromMhz: number;
  toMhz: number;
  maxVswr: number | null;
  efficiencyPct: number | null;
  peakGainDbi: number | null;
  efficiencyBasis?: string;
}

/** The documented order: fail, then no-data (what was not checked cannot pass), then marginal, then pass. */
const ORDER: Record<Verdict, number> = { pass: 0, marginal: 1, 'no-data': 2, fail: 3 };
const worst = (verdicts: Verdict[]) => verdicts.reduce<Verdict>((w, v) => (ORDER[v] > ORDER[w] ? v : w), 'pass');

// Pozar, Microwave Engineering 4th ed. §2.3: |Γ| = (VSWR − 1)/(VSWR + 1), VSWR = (1 + |Γ|)/(1 − |Γ|).
const gammaOfVswr = (vswr: number) => (vswr - 1) / (vswr + 1);
const vswrOfGamma = (gamma: number) => (1 + gamma) / (1 - gamma);
// IEEE Std 145 / Balanis §2.14 (from memory): total efficiency = radiation efficiency × (1 − |Γ|²).
const totalEfficiencyPct = (radiationPct: number, vswr: number) => radiationPct * (1 - gammaOfVswr(vswr) ** 2);
// System efficiency at the radio port for a feed loss L dB: η_tot × 10^(−L/10) (rf-reference §6, definition).
const systemEfficiencyPct = (totalPct: number, feedLossDb: number) => totalPct * 10 ** (-feedLossDb / 10);
// EIRP = P + G − L (transmit power, peak antenna gain, feed loss), all in dB units.
const eirp = (powerDbm: number, gainDbi: number, lossDb: number) => powerDbm + gainDbi - lossDb;

/** The largest value of a sampled curve over [fromHz, toHz], band edges interpolated linearly. */
function maxOver(frequenciesHz: number[], values: number[], fromHz: number, toHz: number): number {
  const at = (f: number) => {
    const i = frequenciesHz.findIndex((x) => x >= f);
    if (frequenciesHz[i] === f || i === 0) return values[i];
    const t = (f - frequenciesHz[i - 1]) / (frequenciesHz[i] - frequenciesHz[i - 1]);
    return values[i - 1] + t * (values[i] - values[i - 1]);
  };
  const inside = values.filter((_, i) => frequenciesHz[i] > fromHz && frequenciesHz[i] < toHz);
  return Math.max(at(fromHz), at(toHz), ...inside);
}

describe('product evaluation (API)', () => {
  let app: INestApplication;
  let tokens: Awaited<ReturnType<typeof demoTokens>>;
  const http = () => request(app.getHttpServer());
  const as = (role: keyof typeof tokens) => ({ Authorization: `Bearer ${tokens[role]}` });
  const evaluation = async (productId: number): Promise<Evaluation> =>
    (await http().get(`/api/products/${productId}/evaluation`).set(as('engineer')).expect(200)).body;

  beforeAll(async () => {
    app = await createApiApp();
    tokens = await demoTokens(app);
  });
  afterAll(() => app.close());

  let bleBandId: number;
  /** A product of our own with the given radios (BLE only), so choices never touch the demo products. */
  async function ownProduct(radioCount: number): Promise<{ productId: number; radioIds: number[] }> {
    bleBandId ??= (await http().get('/api/bands').query({ designation: 'BLE 2.4 GHz' }).set(as('engineer')).expect(200)).body[0].id;
    const product = await http()
      .post('/api/products')
      .set(as('engineer'))
      .send({
        name: unique('evaluation test'),
        code: unique('EV').slice(0, 40),
        owner: 'e2e',
        groundPlaneLengthMm: 62,
        groundPlaneWidthMm: 28,
        targetRegions: ['EU'],
      })
      .expect(201);
    const radioIds: number[] = [];
    for (let i = 0; i < radioCount; i++) {
      const radio = await http()
        .post(`/api/products/${product.body.id}/radios`)
        .set(as('engineer'))
        .send({
          name: `BLE ${i + 1}`,
          technology: 'ble',
          module: 'test module',
          transmitPowerDbm: 8,
          polarization: 'linear',
          connector: 'solder-pad',
          feedLossDb: 0.2,
          bands: [{ bandId: bleBandId, certifiedMaxGainDbi: 2.5 }],
        })
        .expect(201);
      radioIds.push(radio.body.id);
    }
    return { productId: product.body.id, radioIds };
  }

  describe('GET /api/products/:id/evaluation', () => {
    it('answers 401 without a token and to every role', async () => {
      await http().get(`/api/products/${TRACKER}/evaluation`).expect(401);
      for (const role of ['procurement', 'engineer', 'admin'] as const) await http().get(`/api/products/${TRACKER}/evaluation`).set(as(role)).expect(200);
    });

    it('answers 400 for a bad id and 404 PRODUCT_NOT_FOUND for an unknown product', async () => {
      await http().get('/api/products/abc/evaluation').set(as('engineer')).expect(400);
      expect((await http().get('/api/products/999999/evaluation').set(as('engineer')).expect(404)).body.code).toBe('PRODUCT_NOT_FOUND');
    });

    it('the demo tracker fails on its BLE chip; each verdict is the worst of its parts; BLE figures checked by hand from the curves', async () => {
      const result = await evaluation(TRACKER);
      expect(result.productId).toBe(TRACKER);
      expect(result.radios.map((r) => r.radioId)).toEqual([TRACKER_LTE, TRACKER_GNSS, TRACKER_BLE]);
      for (const radio of result.radios) {
        expect(radio.chosen).toHaveLength(1);
        expect(radio.verdict).toBe(worst(radio.bands.map((b) => b.verdict)));
        for (const band of radio.bands) {
          expect(band.partId).toBe(radio.chosen[0].partId);
          if (band.verdict === 'pass') expect(band.decidingFinding).toBeNull();
          else expect(band.decidingFinding!.severity).toBe(band.verdict);
        }
      }
      expect(result.verdict).toBe(worst(result.radios.map((r) => r.verdict)));
      expect(result.verdict).toBe('fail');

      const ble = result.radios.find((r) => r.radioId === TRACKER_BLE)!;
      expect(ble.chosen[0].partId).toBe(LOW_EFFICIENCY_CHIP);
      expect(ble.verdict).toBe('fail');
      expect(ble.decidingFinding).toMatchObject({ code: 'EFFICIENCY_BELOW_FLOOR', severity: 'fail', title: 'Efficiency below floor' });
      expect(ble.reason).toContain('BLE 2.4 GHz');

      // By hand from the part's measured curves, BLE band 2400–2483.5 MHz (Bluetooth Core Spec Vol 6 Part A §2; transmit and receive).
      const part = (await http().get(`/api/parts/${LOW_EFFICIENCY_CHIP}`).set(as('engineer')).expect(200)).body;
      const points = async (kind: string) => {
        const m = part.measurements.find((x: { kind: string; current: boolean }) => x.kind === kind && x.current);
        return (await http().get(`/api/parts/${LOW_EFFICIENCY_CHIP}/measurements/${m.id}/points`).set(as('engineer')).expect(200)).body;
      };
      const s11 = await points('s11');
      const gain = await points('peak-gain');
      const [fromHz, toHz] = [2400e6, 2483.5e6];
      const facts = ble.bands[0].facts;
      expect(facts.worstVswr!).toBeCloseTo(vswrOfGamma(maxOver(s11.frequenciesHz, s11.values, fromHz, toHz)), 6);
      const peak = maxOver(gain.frequenciesHz, gain.values, fromHz, toHz);
      expect(facts.peakGainDbi!).toBeCloseTo(peak, 6);
      expect(facts.eirpDbm!).toBeCloseTo(eirp(8, peak, 0.2), 6); // BLE radio: 8 dBm, 0.2 dB feed loss (catalog-seed/products.json)
      expect(facts.minSystemEfficiencyPct!).toBeCloseTo(systemEfficiencyPct(facts.minTotalEfficiencyPct!, 0.2), 6);
      // The floor for BLE is 30 % (rules/efficiency-floor.json): the deciding figure is below it.
      expect(facts.minTotalEfficiencyPct!).toBeLessThan(30);

      // A receive-only GNSS radio has no EIRP; the linear chip loses 3.01 dB on the RHCP signal: −10·log10(0.5) (Balanis §2.12).
      const gnss = result.radios.find((r) => r.radioId === TRACKER_GNSS)!;
      for (const band of gnss.bands) expect(band.facts.eirpDbm).toBeNull();
      const loss = gnss.bands[0].findings.find((f) => f.code === 'POLARIZATION_LOSS')!;
      expect(loss.title).toBe('Polarization loss');
      expect(loss.message).toContain(`${Math.round(-10 * Math.log10(0.5) * 100) / 100} dB`);
    });

    it('the demo gateway: datasheet figures of its Wi-Fi and LoRa parts checked by hand (mismatch, feed loss, EIRP)', async () => {
      const result = await evaluation(GATEWAY);
      expect(result.verdict).toBe(worst(result.radios.map((r) => r.verdict)));
      const check = async (radioId: number, powerDbm: number, feedLossDb: number) => {
        const radio = result.radios.find((r) => r.radioId === radioId)!;
        const part = (await http().get(`/api/parts/${radio.chosen[0].partId}`).set(as('engineer')).expect(200)).body;
        expect(part.measurements).toEqual([]); // judged from the datasheet lines alone
        for (const band of radio.bands) {
          const bandRanges = (await http().get(`/api/bands/${band.bandId}`).set(as('engineer')).expect(200)).body.ranges as {
            fromMhz: number;
            toMhz: number;
          }[];
          const lines = (part.specBands as SpecBand[]).filter((s) => bandRanges.some((r) => s.fromMhz < r.toMhz && s.toMhz > r.fromMhz));
          expect(lines.length).toBeGreaterThan(0);
          // Where two datasheet lines overlap a band, the worse figure counts.
          const vswr = Math.max(...lines.map((s) => s.maxVswr!));
          const total = Math.min(
            ...lines.map((s) => ((s.efficiencyBasis ?? 'radiation') === 'total' ? s.efficiencyPct! : totalEfficiencyPct(s.efficiencyPct!, s.maxVswr!))),
          );
          const gain = Math.max(...lines.map((s) => s.peakGainDbi!));
          expect(band.facts.peakGainDbi).toBeCloseTo(gain, 6);
          expect(band.facts.eirpDbm).toBeCloseTo(eirp(powerDbm, gain, feedLossDb), 6);
          // The demo housing measurement gives these antennas an in-product S11, which replaces the datasheet VSWR.
          if (radio.chosen[0].s11Source !== 'evaluation board') continue;
          expect(band.facts.worstVswr).toBeCloseTo(vswr, 6);
          // Matched everywhere at VSWR ≤ 3:1 (the band-coverage rule's criterion): the whole band is covered.
          if (vswr <= band.facts.coverageVswr) expect(band.facts.coverageFraction).toBe(1);
          expect(band.facts.minTotalEfficiencyPct).toBeCloseTo(total, 6);
          expect(band.facts.minSystemEfficiencyPct).toBeCloseTo(systemEfficiencyPct(total, feedLossDb), 6);
        }
        return radio;
      };
      // LoRa: 14 dBm, 0.5 dB feed loss; Wi-Fi: 18 dBm, 0.6 dB (catalog-seed/products.json).
      const lora = await check(GATEWAY_LORA, 14, 0.5);
      expect(lora.chosen[0].s11Source).toBe('measured in product, file cold-chain-gateway-housing.s4p, port 4');
      const wifi = await check(GATEWAY_WIFI, 18, 0.6);
      expect(wifi.chosen[0].s11Source).toBe('measured in product, file cold-chain-gateway-housing.s4p, port 3');
    });

    it('a radio with no chosen part is not checked and says so; an unchecked radio keeps the product from passing, a failing one fails it', async () => {
      const { productId, radioIds } = await ownProduct(2);
      const [first, second] = radioIds;
      let result = await evaluation(productId);
      expect(result.verdict).toBe('no-data');
      for (const radio of result.radios) {
        expect(radio).toMatchObject({
          verdict: 'no-data',
          chosen: [],
          decidingFinding: { code: 'NO_PART_CHOSEN', severity: 'no-data', title: 'No part chosen' },
        });
        for (const band of radio.bands) {
          expect(band).toMatchObject({ verdict: 'no-data', partId: null, decidingFinding: { code: 'NO_PART_CHOSEN' } });
          expect(band.facts).toMatchObject({ coverageFraction: null, worstVswr: null, minTotalEfficiencyPct: null, eirpDbm: null });
        }
      }
      expect(result.findings.map((f) => [f.radioId, f.code])).toEqual([
        [first, 'NO_PART_CHOSEN'],
        [second, 'NO_PART_CHOSEN'],
      ]);

      // A shortlisted part is not a choice.
      await http().post(`/api/products/${productId}/radios/${first}/shortlist`).set(as('engineer')).send({ partId: GOOD_BLE_CHIP }).expect(201);
      expect((await evaluation(productId)).radios[0].verdict).toBe('no-data');

      await http().put(`/api/products/${productId}/radios/${first}/choice`).set(as('engineer')).send({ partId: GOOD_BLE_CHIP }).expect(200);
      result = await evaluation(productId);
      expect(result.radios.map((r) => r.verdict)).toEqual(['pass', 'no-data']);
      expect(result.verdict).toBe('no-data');
      expect(result.reason).toContain('BLE 2');

      await http().put(`/api/products/${productId}/radios/${second}/choice`).set(as('engineer')).send({ partId: GOOD_BLE_CHIP }).expect(200);
      result = await evaluation(productId);
      expect(result.verdict).toBe('pass');
      expect(result.findings).toEqual([]);

      await http().put(`/api/products/${productId}/radios/${second}/choice`).set(as('engineer')).send({ partId: LOW_EFFICIENCY_CHIP }).expect(200);
      await http().delete(`/api/products/${productId}/radios/${first}/choice`).set(as('engineer')).expect(200);
      result = await evaluation(productId);
      expect(result.radios.map((r) => r.verdict)).toEqual(['no-data', 'fail']);
      expect(result.verdict).toBe('fail');
    });

    it('a product without radios is not checked', async () => {
      const { productId } = await ownProduct(0);
      const result = await evaluation(productId);
      expect(result).toMatchObject({ verdict: 'no-data', radios: [] });
      expect(result.findings.map((f) => [f.radioId, f.code])).toEqual([[null, 'PRODUCT_WITHOUT_RADIOS']]);
    });
  });

  describe('GET /api/products/:id/matrix per radio', () => {
    interface Matrix {
      view: string;
      rows: { radioId: number; designation: string }[];
      columns: { partId: number; assignments: { radioId: number; state: string }[] }[];
      cells: { row: number; column: number; status: string; findings: Finding[]; decidingFinding: Finding | null }[];
    }
    const matrixOf = async (query: Record<string, string> = {}): Promise<Matrix> =>
      (await http().get(`/api/products/${TRACKER}/matrix`).query(query).set(as('engineer')).expect(200)).body;

    it("evaluates each radio's rows against that radio's own parts only: no BLE chip on LTE rows", async () => {
      const matrix = await matrixOf();
      expect(matrix.view).toBe('assigned');
      const ble = matrix.columns.findIndex((c) => c.partId === LOW_EFFICIENCY_CHIP);
      expect(ble).toBeGreaterThanOrEqual(0);
      const bleRows = new Set(matrix.cells.filter((c) => c.column === ble).map((c) => matrix.rows[c.row].radioId));
      expect([...bleRows]).toEqual([TRACKER_BLE]);
      for (const cell of matrix.cells) {
        const radioId = matrix.rows[cell.row].radioId;
        expect(matrix.columns[cell.column].assignments.map((a) => a.radioId)).toContain(radioId);
        for (const f of cell.findings) expect(f.title.length).toBeGreaterThan(0);
        if (cell.status === 'pass') expect(cell.decidingFinding).toBeNull();
        else expect(cell.decidingFinding!.severity).toBe(cell.status);
      }
      const expected = matrix.rows.reduce((n, row) => n + matrix.columns.filter((c) => c.assignments.some((a) => a.radioId === row.radioId)).length, 0);
      expect(matrix.cells).toHaveLength(expected);
    });

    it('shows only the chosen parts on request, and refuses chosenOnly with parts', async () => {
      const chosen = await matrixOf({ chosenOnly: 'true' });
      expect(chosen.view).toBe('chosen');
      expect(chosen.columns.map((c) => c.partId).sort()).toEqual([1001, 1019, LOW_EFFICIENCY_CHIP]);
      expect(chosen.cells).toHaveLength(chosen.rows.length);
      const bad = await http().get(`/api/products/${TRACKER}/matrix`).query({ chosenOnly: 'true', parts: '1001' }).set(as('engineer')).expect(400);
      expect(bad.body.fields[0].field).toBe('chosenOnly');
      await http().get(`/api/products/${TRACKER}/matrix`).query({ chosenOnly: 'maybe' }).set(as('engineer')).expect(400);
      // Asked parts are still compared on every row.
      const asked = await matrixOf({ parts: String(LOW_EFFICIENCY_CHIP) });
      expect(asked.view).toBe('parts');
      expect(asked.cells).toHaveLength(asked.rows.length);
    });

    it('the CSV follows the per-radio view and keeps the finding codes beside their titles', async () => {
      const matrix = await matrixOf({ chosenOnly: 'true' });
      const csv = await http().get(`/api/products/${TRACKER}/matrix.csv`).query({ chosenOnly: 'true' }).set(as('engineer')).expect(200);
      const lines = csv.text.trim().split('\n');
      expect(lines).toHaveLength(2 + matrix.cells.length);
      expect(csv.text).toContain('Efficiency below floor [EFFICIENCY_BELOW_FLOOR]');
    });
  });

  describe('GET /api/products/:id/radios/:radioId/candidates explained and fitted', () => {
    interface Candidate {
      partId: number;
      connector: string;
      formFactor: string;
      status: Verdict;
      fit: { feed: string; polarization: string; rank: number };
      explanation: { status: Verdict; title: string; text: string; finding: Finding | null; designation: string | null };
      price: { currency: string; unitPrice: string; breakQuantity: number; leadTimeDays: number | null } | null;
    }
    const candidatesOf = async (radioId: number, query: Record<string, string | number> = {}): Promise<Candidate[]> =>
      (
        await http()
          .get(`/api/products/${TRACKER}/radios/${radioId}/candidates`)
          .query({ limit: 200, ...query })
          .set(as('engineer'))
          .expect(200)
      ).body.candidates;

    it('heads each candidate with the finding that decides its rank, never a failing title on a pass', async () => {
      const candidates = await candidatesOf(TRACKER_LTE);
      const failingTitles = new Set(['Band not covered', 'Efficiency below floor', 'Efficiency below target', 'VSWR above target']);
      for (const c of candidates) {
        expect(c.explanation.status).toBe(c.status);
        if (c.status === 'pass') {
          expect(c.explanation.finding).toBeNull();
          expect(['Nearest limit', 'Passes']).toContain(c.explanation.title);
          expect(failingTitles.has(c.explanation.title)).toBe(false);
        } else {
          expect(c.explanation.finding!.severity).toBe(c.status);
          expect(c.explanation.title).toBe(c.explanation.finding!.title);
        }
      }
      // A 2.4 GHz chip on the LTE radio: not covered at all, said with the band and the 0 %.
      const chip = candidates.find((c) => c.partId === LOW_EFFICIENCY_CHIP)!;
      expect(chip.status).toBe('fail');
      expect(chip.explanation.finding!.code).toBe('BAND_NOT_COVERED');
      expect(chip.explanation.title).toBe('Band not covered');
      expect(chip.explanation.finding!.message).toMatch(new RegExp(`covers only 0 % of ${chip.explanation.designation}`));
    });

    it("ranks by fit to the radio's feed and polarization within a status: the solder-pad RHCP patch before linear and connectorized parts", async () => {
      const candidates = await candidatesOf(TRACKER_GNSS);
      const ranks = { pass: 0, marginal: 1, 'no-data': 2, fail: 3 } as const;
      for (let i = 1; i < candidates.length; i++) {
        const [a, b] = [candidates[i - 1], candidates[i]];
        expect(ranks[b.status]).toBeGreaterThanOrEqual(ranks[a.status]);
        if (a.status === b.status) expect(b.fit.rank).toBeGreaterThanOrEqual(a.fit.rank);
      }
      expect(candidates[0]).toMatchObject({ partId: RHCP_PATCH, connector: 'solder-pad', fit: { feed: 'direct', polarization: 'matched', rank: 0 } });
      const panel = candidates.findIndex((c) => c.partId === N_PANEL);
      expect(candidates[panel].fit).toEqual({ feed: 'board-change', polarization: 'loss', rank: 3 });
      const sameStatusSolderPad = candidates.filter((c) => c.status === candidates[panel].status && c.connector === 'solder-pad');
      for (const c of sameStatusSolderPad) expect(candidates.indexOf(c)).toBeLessThan(panel);
    });

    it('filters by form factor, feed, price at the build quantity and lead time, and shows price and lead time', async () => {
      const patches = await candidatesOf(TRACKER_GNSS, { formFactor: 'patch' });
      expect(patches.length).toBeGreaterThan(0);
      for (const c of patches) expect(c.formFactor).toBe('patch');
      const boardFed = await candidatesOf(TRACKER_GNSS, { feed: 'solder-pad,micro-coax' });
      for (const c of boardFed) expect(['solder-pad', 'micro-coax']).toContain(c.connector);
      const cheap = await candidatesOf(TRACKER_LTE, { maxPrice: '1.00', maxLeadTimeDays: 40, quantity: 1000, currency: 'USD' });
      expect(cheap.length).toBeGreaterThan(0);
      for (const c of cheap) {
        expect(c.price!.currency).toBe('USD');
        expect(Number(c.price!.unitPrice)).toBeLessThanOrEqual(1);
        expect(c.price!.breakQuantity).toBeLessThanOrEqual(1000);
        expect(c.price!.leadTimeDays!).toBeLessThanOrEqual(40);
      }
      const all = await candidatesOf(TRACKER_LTE, { quantity: 1000 });
      expect(cheap.length).toBeLessThan(all.length);
      for (const query of [{ feed: 'bnc' }, { formFactor: 'rod' }, { maxPrice: 'abc' }, { maxLeadTimeDays: -1 }, { quantity: 0 }, { currency: 'usd' }]) {
        const res = await http().get(`/api/products/${TRACKER}/radios/${TRACKER_LTE}/candidates`).query(query).set(as('engineer')).expect(400);
        expect(res.body.fields[0].field).toBe(Object.keys(query)[0]);
      }
    });
  });

  describe('GET /api/products/:id/bill-of-materials', () => {
    /** A draft part of our own with offers we know: the price breaks are ours to check. */
    async function partWithOffers(offers: { currency: string; breaks: [number, string][]; moq: number; leadTimeDays: number }[]): Promise<number> {
      const part = await http()
        .post('/api/parts')
        .set(as('engineer'))
        .send({
          manufacturer: 'E2E Test Antennas',
          mpn: unique('BOM'),
          title: 'priced test part',
          formFactor: 'chip',
          connector: 'solder-pad',
          polarization: 'linear',
        })
        .expect(201);
      for (const [k, o] of offers.entries()) {
        await http()
          .post(`/api/parts/${part.body.id}/offers`)
          .set(as('procurement'))
          .send({
            supplier: `Supplier ${k}`,
            currency: o.currency,
            priceBreaks: o.breaks.map(([quantity, unitPrice]) => ({ quantity, unitPrice })),
            moq: o.moq,
            leadTimeDays: o.leadTimeDays,
          })
          .expect(201);
      }
      return part.body.id;
    }

    it('answers 401 without a token, 400 for a bad id or quantity, 404 for an unknown product', async () => {
      await http().get(`/api/products/${TRACKER}/bill-of-materials`).expect(401);
      await http().get('/api/products/x/bill-of-materials').set(as('procurement')).expect(400);
      for (const quantity of ['0', '-3', '1.5', 'many']) {
        const res = await http().get(`/api/products/${TRACKER}/bill-of-materials`).query({ quantity }).set(as('procurement')).expect(400);
        expect(res.body.fields[0].field).toBe('quantity');
      }
      expect((await http().get('/api/products/999999/bill-of-materials').set(as('procurement')).expect(404)).body.code).toBe('PRODUCT_NOT_FOUND');
    });

    it('prices each chosen part at the build quantity from its price breaks, totals per currency, and names radios without a part', async () => {
      const { productId, radioIds } = await ownProduct(3);
      const usd = await partWithOffers([
        {
          currency: 'USD',
          breaks: [
            [1, '1.0000'],
            [100, '0.8000'],
            [1000, '0.5000'],
          ],
          moq: 1,
          leadTimeDays: 20,
        },
        // Cheaper, but only from 500 pieces.
        { currency: 'USD', breaks: [[1, '0.7000']], moq: 500, leadTimeDays: 5 },
        { currency: 'EUR', breaks: [[1, '0.3000']], moq: 1, leadTimeDays: 60 },
      ]);
      const eur = await partWithOffers([
        {
          currency: 'EUR',
          breaks: [
            [10, '0.2500'],
            [100, '0.2000'],
          ],
          moq: 10,
          leadTimeDays: 30,
        },
      ]);
      await http().put(`/api/products/${productId}/radios/${radioIds[0]}/choice`).set(as('engineer')).send({ partId: usd }).expect(200);
      await http().put(`/api/products/${productId}/radios/${radioIds[1]}/choice`).set(as('engineer')).send({ partId: eur }).expect(200);
      const bom = async (query: Record<string, string | number>) =>
        (await http().get(`/api/products/${productId}/bill-of-materials`).query(query).set(as('procurement')).expect(200)).body;

      // At, inside and outside each break of the USD part (the EUR part needs at least 10).
      const expected: [number, string, number, number][] = [
        [1, '1.0000', 1, 20],
        [99, '1.0000', 1, 20],
        [100, '0.8000', 100, 20],
        [499, '0.8000', 100, 20],
        [500, '0.7000', 1, 5],
        [999, '0.7000', 1, 5],
        [1000, '0.5000', 1000, 20],
        [50000, '0.5000', 1000, 20],
      ];
      for (const [quantity, unitPrice, breakQuantity, leadTimeDays] of expected) {
        const result = await bom({ quantity });
        const line = result.lines.find((l: { partId: number }) => l.partId === usd);
        expect([quantity, line.offer.unitPrice, line.offer.breakQuantity, line.offer.leadTimeDays]).toEqual([quantity, unitPrice, breakQuantity, leadTimeDays]);
        expect(line.buyQuantity).toBe(quantity);
      }

      let result = await bom({ quantity: 5 });
      expect(result.lines.find((l: { partId: number }) => l.partId === eur).offer).toBeNull();
      expect(result.complete).toBe(false);
      expect(result.totalPerUnit).toEqual([{ currency: 'USD', total: '1.0000' }]);
      expect(result.radiosWithoutPart.map((r: { radioId: number }) => r.radioId)).toEqual([radioIds[2]]);

      result = await bom({ quantity: 100 });
      expect(result.totalPerUnit).toEqual([
        { currency: 'EUR', total: '0.2000' },
        { currency: 'USD', total: '0.8000' },
      ]);
      expect(result.longestLeadTimeDays).toBe(30);

      // In euros by choice: the EUR offer of the first part is taken.
      result = await bom({ quantity: 100, currency: 'EUR' });
      expect(result.totalPerUnit).toEqual([{ currency: 'EUR', total: '0.5000' }]);

      // The same part on two radios: two pieces per product, priced at twice the build quantity.
      await http().put(`/api/products/${productId}/radios/${radioIds[2]}/choice`).set(as('engineer')).send({ partId: usd }).expect(200);
      result = await bom({ quantity: 50 });
      const line = result.lines.find((l: { partId: number }) => l.partId === usd);
      expect(line).toMatchObject({ quantityPerUnit: 2, buyQuantity: 100, costPerUnit: '1.6000', offer: { unitPrice: '0.8000' } });
      // The EUR part at 50 pieces: inside its 10-piece break.
      expect(result.totalPerUnit).toEqual([
        { currency: 'EUR', total: '0.2500' },
        { currency: 'USD', total: '1.6000' },
      ]);
      expect(result.complete).toBe(true);
    });
  });
});
