import { describe, expect, it } from 'vitest';
import { BUILT_IN_BANDS, overlayFromLibrary } from './get-overlay-bands';

describe(overlayFromLibrary.name, () => {
  it('spans a duplex band from its lowest to its highest edge', () => {
    // 3GPP TS 36.101 Table 5.5-1: B20 UL 832–862, DL 791–821 MHz (UL above DL), span 791–862 MHz.
    const overlay = overlayFromLibrary({
      id: 7,
      designation: 'B20',
      ranges: [
        { fromMhz: 832, toMhz: 862 },
        { fromMhz: 791, toMhz: 821 },
      ],
    });
    expect(overlay).toEqual({ key: 'band-7', label: 'B20', fromHz: 791e6, toHz: 862e6 });
  });

  it('skips a band without ranges', () => {
    expect(overlayFromLibrary({ id: 1, designation: 'X', ranges: [] })).toBeNull();
  });
});

describe('BUILT_IN_BANDS', () => {
  it('agrees with the published band tables for the edges it names', () => {
    const byKey = Object.fromEntries(BUILT_IN_BANDS.map((b) => [b.key, b]));
    expect([byKey.b8.fromHz, byKey.b8.toHz]).toEqual([880e6, 960e6]); // TS 36.101 T5.5-1, span
    expect([byKey.b3.fromHz, byKey.b3.toHz]).toEqual([1710e6, 1880e6]); // TS 36.101 T5.5-1, span
    expect([byKey['ism-2g4'].fromHz, byKey['ism-2g4'].toHz]).toEqual([2400e6, 2483.5e6]); // 47 CFR 15.247
    expect([byKey.eu868.fromHz, byKey.us915.toHz]).toEqual([863e6, 928e6]); // LoRa Alliance RP002
    // IS-GPS-200: L1 1575.42 MHz, 20.46 MHz band (centre ± 10.23 MHz).
    expect((byKey['gnss-l1'].fromHz + byKey['gnss-l1'].toHz) / 2).toBeCloseTo(1575.42e6, 0);
  });
});
