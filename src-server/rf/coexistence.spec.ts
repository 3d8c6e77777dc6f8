import { adjacentProduct, findCoexistenceHits, harmonicProduct, intermodulationProducts, type RadioRange, requiredIsolationDb } from './coexistence';

const MHZ = 1e6;
const range = (radioId: number, bandId: number, designation: string, fromMhz: number, toMhz: number): RadioRange => ({
  radioId,
  bandId,
  designation,
  fromHz: fromMhz * MHZ,
  toHz: toMhz * MHZ,
});

// Band edges: 3GPP TS 36.101 Table 5.5-1 (B3, B7, B13, B40); GPS L1 C/A main lobe 1575.42 ± 1.023 MHz (IS-GPS-200);
// US915 902–928 MHz (47 CFR 15.247; LoRaWAN RP002 US902-928); 2.4 GHz ISM 2400–2483.5 MHz.
const B13_UPLINK = range(1, 13, 'B13 uplink', 777, 787);
const GPS_L1 = range(2, 101, 'GPS L1', 1574.397, 1576.443);
const GNSS_WIDE = range(2, 102, 'GNSS L1/E1/B1', 1559, 1610);
const US915 = range(3, 915, 'US915', 902, 928);
const B3_DOWNLINK = range(1, 3, 'B3 downlink', 1805, 1880);
const B7_UPLINK = range(1, 7, 'B7 uplink', 2500, 2570);
const WIFI_24 = range(4, 24, '2.4 GHz Wi-Fi', 2400, 2483.5);

const base = { guardHz: 10 * MHZ, maxHarmonicOrder: 5, intermodulationOrders: [3, 5], canTransmitTogether: () => true };

describe('coexistence between the radios of a product', () => {
  it('the 2nd harmonic of the B13 uplink is 1554–1574 MHz (rf-reference §6), on the wide GNSS band and within 10 MHz of GPS L1', () => {
    const second = harmonicProduct(B13_UPLINK, 2);
    expect([second.fromHz / MHZ, second.toHz / MHZ]).toEqual([1554, 1574]);
    const hits = findCoexistenceHits({ ...base, transmit: [B13_UPLINK], receive: [GPS_L1, GNSS_WIDE] });
    const onWide = hits.find((h) => h.victim === GNSS_WIDE && h.product.order === 2)!;
    expect(onWide.overlapHz / MHZ).toBeCloseTo(15, 9); // 1559–1574 MHz
    const nearL1 = hits.find((h) => h.victim === GPS_L1 && h.product.order === 2)!;
    expect(nearL1.overlapHz).toBe(0);
    expect(nearL1.distanceHz / MHZ).toBeCloseTo(0.397, 9);
    // With a guard below that gap the near miss is not a finding; at exactly the gap it is.
    expect(findCoexistenceHits({ ...base, guardHz: 0.396 * MHZ, transmit: [B13_UPLINK], receive: [GPS_L1] }).filter((h) => h.product.order === 2)).toHaveLength(
      0,
    );
    expect(
      findCoexistenceHits({ ...base, guardHz: 0.397 * MHZ + 1, transmit: [B13_UPLINK], receive: [GPS_L1] }).filter((h) => h.product.order === 2),
    ).toHaveLength(1);
  });

  it('the 2nd harmonic of US915 (1804–1856 MHz) falls inside the B3 downlink (rf-reference §6)', () => {
    const hits = findCoexistenceHits({ ...base, transmit: [US915], receive: [B3_DOWNLINK] });
    const second = hits.find((h) => h.product.mechanism === 'harmonic' && h.product.order === 2)!;
    expect([second.product.fromHz / MHZ, second.product.toHz / MHZ]).toEqual([1804, 1856]);
    expect(second.overlapHz / MHZ).toBeCloseTo(51, 9); // 1805–1856 MHz
  });

  it('harmonics widen with their number: the n-th of [f1, f2] is [n·f1, n·f2] for n = 2…5, and nothing above the maximum order', () => {
    for (const n of [2, 3, 4, 5]) {
      const product = harmonicProduct(US915, n);
      expect([product.fromHz / MHZ, product.toHz / MHZ]).toEqual([902 * n, 928 * n]);
    }
    const third = range(9, 1, 'victim at 3 × US915', 2706, 2784);
    expect(findCoexistenceHits({ ...base, maxHarmonicOrder: 2, transmit: [US915], receive: [third] })).toHaveLength(0);
    expect(findCoexistenceHits({ ...base, maxHarmonicOrder: 3, transmit: [US915], receive: [third] }).map((h) => h.product.order)).toEqual([3]);
  });

  it('intermodulation over ranges takes the extremes of each expression (IMD3 and IMD5)', () => {
    const a = range(1, 1, 'A', 100, 110);
    const b = range(2, 2, 'B', 130, 150);
    const third = intermodulationProducts(a, b, 3).map((p) => [p.fromHz / MHZ, p.toHz / MHZ]);
    // 2a − b: 2·100 − 150 = 50 to 2·110 − 130 = 90; 2b − a: 260 − 110 = 150 to 300 − 100 = 200; sums 330–370, 360–410.
    expect(third).toEqual([
      [50, 90],
      [150, 200],
      [330, 370],
      [360, 410],
    ]);
    const fifth = intermodulationProducts(a, b, 5).map((p) => [p.fromHz / MHZ, p.toHz / MHZ]);
    // 3a − 2b: 300 − 300 = 0 to 330 − 260 = 70; 3b − 2a: 390 − 220 = 170 to 450 − 200 = 250.
    expect(fifth.slice(0, 2)).toEqual([
      [0, 70],
      [170, 250],
    ]);
    expect(() => intermodulationProducts(a, b, 4)).toThrow(RangeError);
  });

  it('intermodulation needs two radios on the air together, and neither aggressor is its own victim', () => {
    const a = range(1, 1, 'A', 100, 110);
    const b = range(2, 2, 'B', 130, 150);
    const victim = range(3, 3, 'C receive', 60, 70); // inside 2a − b = 50–90 MHz
    const ownReceive = range(1, 4, 'A receive', 60, 70);
    const together = findCoexistenceHits({ ...base, maxHarmonicOrder: 1, transmit: [a, b], receive: [victim, ownReceive] });
    // 2a − b (50–90 MHz) and 3a − 2b (0–70 MHz) both reach C; A's own receive range is never listed.
    expect(together.filter((h) => h.product.mechanism === 'intermodulation').map((h) => [h.victim.designation, h.product.order])).toEqual([
      ['C receive', 3],
      ['C receive', 5],
    ]);
    const apart = findCoexistenceHits({ ...base, maxHarmonicOrder: 1, canTransmitTogether: () => false, transmit: [a, b], receive: [victim] });
    expect(apart.filter((h) => h.product.mechanism === 'intermodulation')).toHaveLength(0);
  });

  it('a transmit band next to another radio receive band is an adjacency finding (B7 uplink beside 2.4 GHz Wi-Fi: 16.5 MHz apart)', () => {
    expect(adjacentProduct(B7_UPLINK).order).toBe(1);
    const near = findCoexistenceHits({ ...base, guardHz: 20 * MHZ, maxHarmonicOrder: 1, transmit: [B7_UPLINK], receive: [WIFI_24] });
    expect(near.map((h) => [h.product.mechanism, h.distanceHz / MHZ])).toEqual([['adjacent', 16.5]]);
    expect(findCoexistenceHits({ ...base, guardHz: 10 * MHZ, maxHarmonicOrder: 1, transmit: [B7_UPLINK], receive: [WIFI_24] })).toHaveLength(0);
  });

  it('a receive-only radio is never an aggressor', () => {
    const hits = findCoexistenceHits({ ...base, transmit: [US915], receive: [GPS_L1, GNSS_WIDE, B3_DOWNLINK] });
    expect(hits.every((h) => h.product.aggressors.every((a) => a.radioId !== GPS_L1.radioId))).toBe(true);
  });

  it('required isolation is (P_tx + emission level) − tolerable level: 23 dBm, −60 dBc, −120 dBm tolerable → 83 dB (hand computation)', () => {
    expect(requiredIsolationDb({ aggressorPowerDbm: 23, emissionDbc: -60, victimTolerableDbm: -120 })).toBe(83);
  });
});
