import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';

/**
 * The seeded band library (catalog-seed/bands.json) against values typed from the published tables,
 * as the 3GPP, IEEE, Bluetooth, LoRa Alliance and GNSS documents publish them.
 */
interface SeedRange {
  role: string;
  fromMhz: number;
  toMhz: number;
}
interface SeedBand {
  id: number;
  technology: string;
  designation: string;
  duplex: string;
  ranges: SeedRange[];
  centreMhz?: number;
  bandwidthMhz?: number;
  source: { document: string; table: string; note?: string };
}

const bands: SeedBand[] = JSON.parse(readFileSync(resolve(__dirname, '../../catalog-seed/bands.json'), 'utf8'));
const band = (designation: string): SeedBand => {
  const found = bands.find((b) => b.designation === designation);
  if (!found) throw new Error(`${designation} is not in catalog-seed/bands.json`);
  return found;
};
const range = (designation: string, role: string): [number, number] => {
  const r = band(designation).ranges.find((x) => x.role === role);
  if (!r) throw new Error(`${designation} has no ${role} range`);
  return [r.fromMhz, r.toMhz];
};
/** Whether [from, to] lies inside some range of a band (a channel inside its band). */
const inside = (designation: string, from: number, to: number) => band(designation).ranges.some((r) => r.fromMhz <= from && to <= r.toMhz);

describe('catalog-seed/bands.json', () => {
  it('holds every band and signal the issue lists, once each', () => {
    const lte = [1, 2, 3, 4, 5, 7, 8, 12, 13, 14, 17, 18, 19, 20, 25, 26, 28, 66, 71, 85].map((n) => `B${n}`);
    const nr = [1, 3, 5, 7, 8, 28, 41, 66, 71, 77, 78, 79].map((n) => `n${n}`);
    const gnss = [
      'GPS L1',
      'GPS L2C',
      'GPS L5',
      'Galileo E1',
      'Galileo E5a',
      'Galileo E5b',
      'Galileo E6',
      'GLONASS G1',
      'GLONASS G2',
      'BeiDou B1I',
      'BeiDou B1C',
      'BeiDou B2a',
    ];
    const lora = ['EU863-870', 'US902-928', 'AU915-928', 'AS923', 'IN865-867', 'KR920-923'];
    for (const d of [...lte, ...nr, ...gnss, ...lora, 'Wi-Fi 2.4 GHz', 'Wi-Fi 6 GHz', 'BLE 2.4 GHz', 'UWB ch5', 'UWB ch9']) expect(band(d)).toBeDefined();
    const designations = bands.map((b) => b.designation);
    expect(new Set(designations).size).toBe(designations.length);
    expect(new Set(bands.map((b) => b.id)).size).toBe(bands.length);
  });

  it('gives every band a source document and table, and every range a positive width', () => {
    for (const b of bands) {
      expect(b.source.document.length).toBeGreaterThan(3);
      expect(b.source.table.length).toBeGreaterThan(1);
      for (const r of b.ranges) expect(r.toMhz).toBeGreaterThan(r.fromMhz);
    }
  });

  describe('E-UTRA band edges', () => {
    it.each([
      // [band, UL from, UL to, DL from, DL to] — 3GPP TS 36.101 Table 5.5-1
      ['B1', 1920, 1980, 2110, 2170], // 3GPP TS 36.101 Table 5.5-1
      ['B2', 1850, 1910, 1930, 1990], // 3GPP TS 36.101 Table 5.5-1
      ['B3', 1710, 1785, 1805, 1880], // 3GPP TS 36.101 Table 5.5-1
      ['B4', 1710, 1755, 2110, 2155], // 3GPP TS 36.101 Table 5.5-1
      ['B5', 824, 849, 869, 894], // 3GPP TS 36.101 Table 5.5-1
      ['B7', 2500, 2570, 2620, 2690], // 3GPP TS 36.101 Table 5.5-1
      ['B8', 880, 915, 925, 960], // 3GPP TS 36.101 Table 5.5-1
      ['B12', 699, 716, 729, 746], // 3GPP TS 36.101 Table 5.5-1 (current release; early releases 698–716/728–746)
      ['B13', 777, 787, 746, 756], // 3GPP TS 36.101 Table 5.5-1 (uplink above downlink)
      ['B14', 788, 798, 758, 768], // 3GPP TS 36.101 Table 5.5-1 (uplink above downlink)
      ['B17', 704, 716, 734, 746], // 3GPP TS 36.101 Table 5.5-1
      ['B18', 815, 830, 860, 875], // 3GPP TS 36.101 Table 5.5-1
      ['B19', 830, 845, 875, 890], // 3GPP TS 36.101 Table 5.5-1
      ['B20', 832, 862, 791, 821], // 3GPP TS 36.101 Table 5.5-1 (uplink above downlink)
      ['B25', 1850, 1915, 1930, 1995], // 3GPP TS 36.101 Table 5.5-1
      ['B26', 814, 849, 859, 894], // 3GPP TS 36.101 Table 5.5-1
      ['B28', 703, 748, 758, 803], // 3GPP TS 36.101 Table 5.5-1
      ['B66', 1710, 1780, 2110, 2200], // 3GPP TS 36.101 Table 5.5-1 (DL 2180–2200 CA-only, from memory)
      ['B71', 663, 698, 617, 652], // 3GPP TS 36.101 Table 5.5-1 (uplink above downlink)
      ['B85', 698, 716, 728, 746], // 3GPP TS 36.101 Table 5.5-1
    ] as const)('%s: UL %d–%d MHz, DL %d–%d MHz, FDD', (designation, ulFrom, ulTo, dlFrom, dlTo) => {
      expect(range(designation, 'uplink')).toEqual([ulFrom, ulTo]);
      expect(range(designation, 'downlink')).toEqual([dlFrom, dlTo]);
      expect(band(designation)).toMatchObject({ technology: 'lte', duplex: 'FDD', source: { document: '3GPP TS 36.101' } });
    });

    it('stores the spec-release note for band 12 (early releases 698–716 / 728–746 MHz, current 699–716 / 729–746 MHz)', () => {
      // 3GPP TS 36.101 T5.5-1 current vs early-release TS 36.106 T5.5-1: 698–716/728–746
      expect(band('B12').source.note).toMatch(/698–716 \/ 728–746/);
      expect(band('B12').source.note).toMatch(/release/i);
    });
  });

  describe('NR FR1 band edges', () => {
    it.each([
      ['n1', 'uplink', 1920, 1980], // 3GPP TS 38.101-1 Table 5.2-1
      ['n3', 'downlink', 1805, 1880], // 3GPP TS 38.101-1 Table 5.2-1
      ['n5', 'uplink', 824, 849], // 3GPP TS 38.101-1 Table 5.2-1
      ['n7', 'downlink', 2620, 2690], // 3GPP TS 38.101-1 Table 5.2-1
      ['n8', 'uplink', 880, 915], // 3GPP TS 38.101-1 Table 5.2-1
      ['n28', 'downlink', 758, 803], // 3GPP TS 38.101-1 Table 5.2-1
      ['n66', 'downlink', 2110, 2200], // 3GPP TS 38.101-1 Table 5.2-1
      ['n71', 'uplink', 663, 698], // 3GPP TS 38.101-1 Table 5.2-1
      ['n41', 'tdd', 2496, 2690], // 3GPP TS 38.101-1 Table 5.2-1 (TDD)
      ['n77', 'tdd', 3300, 4200], // 3GPP TS 38.101-1 Table 5.2-1 (TDD)
      ['n78', 'tdd', 3300, 3800], // 3GPP TS 38.101-1 Table 5.2-1 (TDD)
      ['n79', 'tdd', 4400, 5000], // 3GPP TS 38.101-1 Table 5.2-1 (TDD)
    ] as const)('%s %s %d–%d MHz', (designation, role, from, to) => {
      expect(range(designation, role)).toEqual([from, to]);
      expect(band(designation).duplex).toBe(role === 'tdd' ? 'TDD' : 'FDD');
    });
  });

  describe('GNSS signals (receive only)', () => {
    it.each([
      ['GPS L1', 1575.42, 20.46], // IS-GPS-200 §3.3.1.1 (centre 154 f0; band from memory)
      ['GPS L2C', 1227.6, 20.46], // IS-GPS-200 §3.3.1.1 (centre 120 f0; band from memory)
      ['GPS L5', 1176.45, 24.0], // IS-GPS-705 §3.3.1.1: 1164.45–1188.45 MHz
      ['Galileo E1', 1575.42, 24.552], // Galileo OS SIS ICD, receiver reference bandwidths
      ['Galileo E5a', 1176.45, 20.46], // Galileo OS SIS ICD
      ['Galileo E5b', 1207.14, 20.46], // Galileo OS SIS ICD
      ['Galileo E6', 1278.75, 40.92], // Galileo OS SIS ICD
      ['BeiDou B1I', 1561.098, 4.092], // BDS-SIS-ICD-B1I-3.0 §4
      ['BeiDou B1C', 1575.42, 32.736], // BDS-SIS-ICD-B1C-1.0 §4 (from memory)
      ['BeiDou B2a', 1176.45, 20.46], // BDS-SIS-ICD-B2a-1.0 §4 (from memory; centre corroborated)
    ] as const)('%s: centre %d MHz, %d MHz wide', (designation, centre, bandwidth) => {
      const [from, to] = range(designation, 'receive');
      expect((from + to) / 2).toBeCloseTo(centre, 6);
      expect(to - from).toBeCloseTo(bandwidth, 6);
      expect(band(designation)).toMatchObject({ technology: 'gnss', duplex: 'receive-only', centreMhz: centre, bandwidthMhz: bandwidth });
    });

    it('GPS centres are integer multiples of f0 = 10.23 MHz', () => {
      // IS-GPS-200 §3.3.1.1: L1 = 154 f0, L2 = 120 f0; IS-GPS-705: L5 = 115 f0
      expect(band('GPS L1').centreMhz).toBeCloseTo(154 * 10.23, 9);
      expect(band('GPS L2C').centreMhz).toBeCloseTo(120 * 10.23, 9);
      expect(band('GPS L5').centreMhz).toBeCloseTo(115 * 10.23, 9);
      expect(range('GPS L5', 'receive')).toEqual([1164.45, 1188.45]); // IS-GPS-705 §3.3.1.1
    });

    it('GLONASS FDMA ranges span channels k = −7…+6 plus ±0.511 MHz', () => {
      // GLONASS ICD Ed. 5.1 §3.3.1: G1 1602 + 0.5625k, G2 1246 + 0.4375k
      const [g1From, g1To] = range('GLONASS G1', 'receive');
      expect(g1From).toBeCloseTo(1602 + 0.5625 * -7 - 0.511, 6);
      expect(g1To).toBeCloseTo(1602 + 0.5625 * 6 + 0.511, 6);
      expect(g1From).toBeCloseTo(1597.55, 2); // GLONASS ICD: FDMA G1 channels k = −7…+6 span ≈1597.55–1605.89 MHz
      expect(g1To).toBeCloseTo(1605.89, 2);
      const [g2From, g2To] = range('GLONASS G2', 'receive');
      expect(g2From).toBeCloseTo(1242.43, 2);
      expect(g2To).toBeCloseTo(1249.14, 2);
    });

    it('upper L-band signals sit in RNSS 1559–1610 MHz; lower-band carriers in 1164–1215 MHz', () => {
      // ITU Radio Regulations Art. 5 (from memory); 1164–1215 corroborated in the Galileo OS SIS ICD
      for (const d of ['GPS L1', 'Galileo E1', 'BeiDou B1I', 'BeiDou B1C', 'GLONASS G1']) {
        expect(band(d).ranges.every((r) => r.fromMhz >= 1559 - 1e-9 && r.toMhz <= 1610)).toBe(true);
      }
      for (const d of ['GPS L5', 'Galileo E5a', 'Galileo E5b', 'BeiDou B2a']) {
        const c = band(d).centreMhz!;
        expect(c > 1164 && c < 1215).toBe(true);
      }
      // E5b's 20.46 MHz reference band (1207.14 ± 10.23) reaches 1217.37 MHz, past the 1215 MHz edge:
      // an antenna sized to the allocation alone would miss its top.
      expect(range('Galileo E5b', 'receive')[1]).toBeCloseTo(1217.37, 6);
    });
  });

  describe('Wi-Fi, derived from the IEEE 802.11 channel formulas', () => {
    const wifi24 = (n: number) => (n === 14 ? 2484 : 2407 + 5 * n); // IEEE 802.11-2020 Annex E: 2407 + 5n
    const wifi5 = (n: number) => 5000 + 5 * n; // IEEE 802.11-2020 Annex E: 5000 + 5n
    const wifi6 = (n: number) => (n === 2 ? 5935 : 5950 + 5 * n); // IEEE 802.11ax-2021 §27.3.23.2

    it('the formulas reproduce the reference channel centres', () => {
      expect([1, 6, 11, 13, 14].map(wifi24)).toEqual([2412, 2437, 2462, 2472, 2484]); // IEEE 802.11-2020 channel centres
      expect([36, 48, 52, 64, 100, 144, 149, 165, 177].map(wifi5)).toEqual([5180, 5240, 5260, 5320, 5500, 5720, 5745, 5825, 5885]);
      expect([1, 2, 5, 93, 233].map(wifi6)).toEqual([5955, 5935, 5975, 6415, 7115]);
    });

    it('2.4 GHz: 2400–2483.5 MHz holds 20 MHz channels 1–13', () => {
      expect(range('Wi-Fi 2.4 GHz', 'transmit-receive')).toEqual([2400, 2483.5]); // 47 CFR 15.247; EN 300 328 scope
      for (let n = 1; n <= 13; n++) expect(inside('Wi-Fi 2.4 GHz', wifi24(n) - 10, wifi24(n) + 10)).toBe(true);
      expect(inside('Wi-Fi 2.4 GHz', wifi24(14) - 10, wifi24(14) + 10)).toBe(false); // channel 14 is Japan DSSS only
    });

    it.each([
      ['Wi-Fi 5 GHz UNII-1', [36, 40, 44, 48]],
      ['Wi-Fi 5 GHz UNII-2A', [52, 56, 60, 64]],
      ['Wi-Fi 5 GHz UNII-2C', [100, 104, 108, 112, 116, 120, 124, 128, 132, 136, 140]],
      ['Wi-Fi 5 GHz UNII-3', [149, 153, 157, 161, 165]],
    ] as const)('%s holds the 20 MHz channels %j', (designation, channels) => {
      for (const n of channels) expect(inside(designation, wifi5(n) - 10, wifi5(n) + 10)).toBe(true);
    });

    it('channel 144 (5710–5730 MHz) straddles the 5725 MHz edge between UNII-2C and UNII-3', () => {
      const [from, to] = [wifi5(144) - 10, wifi5(144) + 10];
      expect(inside('Wi-Fi 5 GHz UNII-2C', from, to)).toBe(false);
      expect(inside('Wi-Fi 5 GHz UNII-3', from, to)).toBe(false);
      expect(range('Wi-Fi 5 GHz UNII-2C', 'transmit-receive')[1]).toBe(range('Wi-Fi 5 GHz UNII-3', 'transmit-receive')[0]);
      expect(from).toBeGreaterThan(range('Wi-Fi 5 GHz UNII-2C', 'transmit-receive')[0]);
      expect(to).toBeLessThan(range('Wi-Fi 5 GHz UNII-3', 'transmit-receive')[1]);
    });

    it('6 GHz: 5925–7125 MHz holds 20 MHz channels 1…233', () => {
      expect(range('Wi-Fi 6 GHz', 'transmit-receive')).toEqual([5925, 7125]); // IEEE 802.11ax-2021 §27.3.23.2
      for (let n = 1; n <= 233; n += 4) expect(inside('Wi-Fi 6 GHz', wifi6(n) - 10, wifi6(n) + 10)).toBe(true);
    });
  });

  describe('Bluetooth LE, derived from the channel formula', () => {
    const ble = (k: number) => 2402 + 2 * k; // Bluetooth Core Spec v5.x Vol 6 Part A §2: fc = 2402 + 2k, k = 0…39

    it('all 40 channels (2 MHz wide) sit inside the band, advertising channels at 2402/2426/2480 MHz', () => {
      expect(range('BLE 2.4 GHz', 'transmit-receive')).toEqual([2400, 2483.5]);
      for (let k = 0; k < 40; k++) expect(inside('BLE 2.4 GHz', ble(k) - 1, ble(k) + 1)).toBe(true);
      expect([0, 12, 39].map(ble)).toEqual([2402, 2426, 2480]); // advertising indices 37/38/39 = RF 0/12/39
    });
  });

  describe('LoRaWAN regional plans', () => {
    it.each([
      ['EU863-870', 863, 870], // LoRa Alliance RP002-1.0.x
      ['US902-928', 902, 928], // LoRa Alliance RP002-1.0.x
      ['AU915-928', 915, 928], // LoRa Alliance RP002-1.0.x
      ['AS923', 915, 928], // LoRa Alliance RP002-1.0.x
      ['IN865-867', 865, 867], // LoRa Alliance RP002-1.0.x
      ['KR920-923', 920.9, 923.3], // LoRa Alliance RP002-1.0.x
    ] as const)('%s spans %d–%d MHz', (designation, from, to) => {
      expect(range(designation, 'transmit-receive')).toEqual([from, to]);
      expect(band(designation).technology).toBe('ism');
    });

    it('the default and plan channels fall inside their plan', () => {
      // RP002-1.0.x channel plans (LoRa Alliance)
      for (const f of [868.1, 868.3, 868.5, 869.525]) expect(inside('EU863-870', f, f)).toBe(true);
      for (let n = 0; n < 64; n++) expect(inside('US902-928', 902.3 + 0.2 * n - 0.0625, 902.3 + 0.2 * n + 0.0625)).toBe(true);
      for (let n = 0; n < 8; n++) expect(inside('US902-928', 923.3 + 0.6 * n - 0.25, 923.3 + 0.6 * n + 0.25)).toBe(true);
      for (let n = 0; n < 64; n++) expect(inside('AU915-928', 915.2 + 0.2 * n, 915.2 + 0.2 * n)).toBe(true);
      for (const f of [865.0625, 865.4025, 865.985, 866.55]) expect(inside('IN865-867', f, f)).toBe(true);
      for (const f of [922.1, 922.3, 922.5, 921.9]) expect(inside('KR920-923', f, f)).toBe(true);
      for (const f of [923.2, 923.4, 921.4, 916.6, 917.3]) expect(inside('AS923', f, f)).toBe(true);
    });
  });

  describe('UWB HRP channels', () => {
    it.each([
      ['UWB ch5', 13, 6240.0, 6739.2], // IEEE 802.15.4-2020 HRP UWB channel table: fc = 13 × 499.2 MHz
      ['UWB ch9', 16, 7737.6, 8236.8], // IEEE 802.15.4-2020 HRP UWB channel table: fc = 16 × 499.2 MHz
    ] as const)('%s: %d × 499.2 MHz, %d–%d MHz', (designation, m, from, to) => {
      const [f, t] = range(designation, 'transmit-receive');
      expect(f).toBeCloseTo(from, 6);
      expect(t).toBeCloseTo(to, 6);
      expect(band(designation).centreMhz).toBeCloseTo(m * 499.2, 6);
    });
  });
});
