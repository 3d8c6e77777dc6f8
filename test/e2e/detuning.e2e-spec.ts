import { readFileSync } from 'node:fs';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { createApiApp, demoTokens } from '../support/api-app';

// Demo data: the tracker's cellular radio has the flex antenna 1001 chosen, with a measured S11 (catalog-seed/parts/curves).
const TRACKER = 1;
const TRACKER_LTE = 11;
const FLEX_S11 = 'catalog-seed/parts/curves/1001-KA-FX7027.s1p';

/** |Γ| per frequency of a one-port Touchstone file in MHz, real/imaginary (Touchstone 1.1). */
function gammaCurve(file: string): { mhz: number[]; gamma: number[] } {
  const mhz: number[] = [];
  const gamma: number[] = [];
  for (const line of readFileSync(file, 'utf8').split('\n')) {
    const text = line.trim();
    if (!text || text.startsWith('!') || text.startsWith('#')) continue;
    const [f, re, im] = text.split(/\s+/).map(Number);
    mhz.push(f);
    gamma.push(Math.hypot(re, im));
  }
  return { mhz, gamma };
}

/** Where |Γ| ≤ limit, edges interpolated linearly in |Γ| between samples. */
function matchedRuns(curve: { mhz: number[]; gamma: number[] }, limit: number): [number, number][] {
  const runs: [number, number][] = [];
  const crossing = (i: number) => curve.mhz[i - 1] + ((limit - curve.gamma[i - 1]) / (curve.gamma[i] - curve.gamma[i - 1])) * (curve.mhz[i] - curve.mhz[i - 1]);
  let start: number | null = curve.gamma[0] <= limit ? curve.mhz[0] : null;
  for (let i = 1; i < curve.mhz.length; i++) {
    const inside = curve.gamma[i] <= limit;
    if (inside && start === null) start = crossing(i);
    if (!inside && start !== null) {
      runs.push([start, crossing(i)]);
      start = null;
    }
  }
  if (start !== null) runs.push([start, curve.mhz[curve.mhz.length - 1]]);
  return runs;
}

describe('detuning margin (API)', () => {
  let app: INestApplication;
  let tokens: Awaited<ReturnType<typeof demoTokens>>;
  const http = () => request(app.getHttpServer());
  const as = (role: keyof typeof tokens) => ({ Authorization: `Bearer ${tokens[role]}` });

  beforeAll(async () => {
    app = await createApiApp();
    tokens = await demoTokens(app);
  });
  afterAll(() => app.close());

  describe('GET /api/products/:id/evaluation detuning facts', () => {
    it("the tracker's flex antenna: margins down and up per band, from its S11 at VSWR 3:1, checked by hand", async () => {
      const evaluation = (await http().get(`/api/products/${TRACKER}/evaluation`).set(as('engineer')).expect(200)).body;
      const lte = evaluation.radios.find((r: { radioId: number }) => r.radioId === TRACKER_LTE);
      // VSWR 3:1 is |Γ| = (3 − 1)/(3 + 1) = 0.5 (Pozar, Microwave Engineering 4th ed. §2.3).
      const runs = matchedRuns(gammaCurve(FLEX_S11), 0.5);
      let known = 0;
      for (const band of lte.bands) {
        const ranges = (await http().get(`/api/bands/${band.bandId}`).set(as('engineer')).expect(200)).body.ranges as { fromMhz: number; toMhz: number }[];
        // A shift down by δ keeps [f1, f2] matched while f2 ≤ (1 − δ)·run end; up while f1 ≥ (1 + δ)·run start.
        let down = Infinity;
        let up = Infinity;
        let held = true;
        for (const r of ranges) {
          const run = runs.find(([from, to]) => from <= r.fromMhz && to >= r.toMhz);
          if (!run) held = false;
          else {
            down = Math.min(down, (1 - r.toMhz / run[1]) * 100);
            up = Math.min(up, (r.fromMhz / run[0] - 1) * 100);
          }
        }
        if (!held) {
          expect(band.facts.detuningMarginDownPct).toBeNull();
          expect(band.facts.detuningMarginUpPct).toBeNull();
          continue;
        }
        known++;
        expect(band.facts.detuningMarginDownPct).toBeCloseTo(down, 4);
        expect(band.facts.detuningMarginUpPct).toBeCloseTo(up, 4);
        // The rule (rules/detuning-margin.json, 2 % by common practice) marks the band below it.
        const marked = band.findings.some((f: { code: string }) => f.code === 'DETUNING_MARGIN_LOW');
        expect(marked).toBe(down < 2 || up < 2);
      }
      expect(known).toBeGreaterThan(0);
    });
  });
});
