import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { type LimitOnFile, limitsFor, marketFindings, marketsUsingBand } from './markets';

const SEED_LIMITS: (LimitOnFile & { id: number })[] = JSON.parse(readFileSync(resolve('catalog-seed/regulatory-limits.json'), 'utf8'));
const sources = (limits: { source: string }[]) => limits.map((l) => l.source);

describe('limitsFor', () => {
  it('does not judge a licensed LTE uplink (B8 880–915 MHz) by the licence-exempt 902–928 MHz rule; an ISM radio there still is', () => {
    // 47 CFR 15.247 governs licence-exempt devices; 3GPP TS 36.101 Table 5.5-1: B8 uplink 880–915 MHz, inside which 902–915 MHz lies.
    const lte = limitsFor('lte', ['US'], SEED_LIMITS).filter((l) => l.fromHz < 915e6 && l.toHz > 880e6);
    expect(sources(lte).some((s) => s.startsWith('47 CFR 15.247'))).toBe(false);
    const ism = limitsFor('ism', ['US'], SEED_LIMITS).filter((l) => l.fromHz < 928e6 && l.toHz > 902e6);
    expect(sources(ism)).toEqual(['47 CFR 15.247(b)(3), (b)(4)']);
    expect(ism[0].markets).toEqual(['US']);
  });

  it('judges a licensed B8 uplink in the EU by the UE power class, 23 dBm conducted', () => {
    // 3GPP TS 36.101 §6.2.2 Table 6.2.2-1: power class 3 = 23 dBm (from memory).
    const eu = limitsFor('lte', ['EU', 'US'], SEED_LIMITS).filter((l) => l.fromHz < 915e6 && l.toHz > 880e6);
    expect(eu).toHaveLength(1);
    expect(eu[0]).toMatchObject({ region: 'EU', kind: 'conducted', valueDbm: 23, markets: ['EU'] });
  });

  it('gives an EU limit to a German market but not to the whole of CEPT', () => {
    expect(limitsFor('ism', ['DE'], SEED_LIMITS).every((l) => l.region === 'EU')).toBe(true);
    expect(limitsFor('ism', ['DE'], SEED_LIMITS).length).toBeGreaterThan(0);
    expect(limitsFor('ism', ['CEPT'], SEED_LIMITS)).toEqual([]);
  });
});

describe('marketsUsingBand', () => {
  it('keeps the markets a band is used in, and every market when the band states none', () => {
    expect(marketsUsingBand(['EU'], ['EU', 'US'])).toEqual(['EU']);
    expect(marketsUsingBand(['US', 'CA'], ['DE'])).toEqual([]);
    expect(marketsUsingBand([], ['EU', 'US'])).toEqual(['EU', 'US']);
    expect(marketsUsingBand(['global'], ['JP'])).toEqual(['JP']);
  });
});

describe('marketFindings', () => {
  const band = (id: number, designation: string, regions: string[]) => ({ band: { id, designation, regions } });

  it('flags a band no target market uses (info on the row) and a market the radio has no band for (on the radio)', () => {
    const found = marketFindings(['US'], [{ id: 1, name: 'LTE', bands: [band(120, 'B20', ['EU']), band(108, 'B8', ['EU', 'ASIA'])] }]);
    expect(found.rows.map((r) => r.findings.map((f) => [f.severity, f.code]))).toEqual([
      [['info', 'BAND_OUTSIDE_MARKETS']],
      [['info', 'BAND_OUTSIDE_MARKETS']],
    ]);
    expect(found.radios[0].findings.map((f) => [f.severity, f.code])).toEqual([['marginal', 'MARKET_WITHOUT_BANDS']]);
  });

  it('says nothing where a band serves a market, and nothing about a radio with a band of unknown markets', () => {
    const found = marketFindings(['EU', 'US'], [{ id: 1, name: 'LTE', bands: [band(120, 'B20', ['EU']), band(999, 'X', [])] }]);
    expect(found.rows.flatMap((r) => r.findings)).toEqual([]);
    expect(found.radios[0].findings).toEqual([]);
    const ble = marketFindings(['AS'], [{ id: 2, name: 'BLE', bands: [band(701, 'BLE 2.4 GHz', ['global'])] }]);
    expect(ble.rows[0].findings).toEqual([]);
    expect(ble.radios[0].findings).toEqual([]);
  });
});
