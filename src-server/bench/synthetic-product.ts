import type { BandRange, RadioBandRequirement, Technology } from '../compatibility/engine/types';

/** An invented 30-band product for the matrix benchmark. */

const MHZ = 1e6;
const fdd = (ul: [number, number], dl: [number, number]): BandRange[] => [
  { fromHz: ul[0] * MHZ, toHz: ul[1] * MHZ, role: 'uplink' },
  { fromHz: dl[0] * MHZ, toHz: dl[1] * MHZ, role: 'downlink' },
];
const single = (from: number, to: number, role: BandRange['role']): BandRange[] => [{ fromHz: from * MHZ, toHz: to * MHZ, role }];

// Band edges from 3GPP TS 36.101 Table 5.5-1, TS 38.101-1 Table 5.2-1, IS-GPS-200/705, IEEE 802.11, LoRaWAN RP002 and IEEE 802.15.4z.
const LTE: [string, BandRange[]][] = [
  ['B1', fdd([1920, 1980], [2110, 2170])],
  ['B2', fdd([1850, 1910], [1930, 1990])],
  ['B3', fdd([1710, 1785], [1805, 1880])],
  ['B4', fdd([1710, 1755], [2110, 2155])],
  ['B5', fdd([824, 849], [869, 894])],
  ['B7', fdd([2500, 2570], [2620, 2690])],
  ['B8', fdd([880, 915], [925, 960])],
  ['B12', fdd([699, 716], [729, 746])],
  ['B13', fdd([777, 787], [746, 756])],
  ['B14', fdd([788, 798], [758, 768])],
  ['B17', fdd([704, 716], [734, 746])],
  ['B18', fdd([815, 830], [860, 875])],
  ['B19', fdd([830, 845], [875, 890])],
  ['B20', fdd([832, 862], [791, 821])],
  ['B25', fdd([1850, 1915], [1930, 1995])],
  ['B26', fdd([814, 849], [859, 894])],
  ['B28', fdd([703, 748], [758, 803])],
  ['B66', fdd([1710, 1780], [2110, 2200])],
  ['B71', fdd([663, 698], [617, 652])],
  ['B85', fdd([698, 716], [728, 746])],
];

/** 8 radios, 30 bands: the benchmark's product. */
export function benchmarkProductRequirements(): RadioBandRequirement[] {
  const radios: {
    name: string;
    technology: Technology;
    tx: number | null;
    bands: [string, BandRange[]][];
    polarization?: 'RHCP';
    limits?: RadioBandRequirement['regulatoryLimits'];
  }[] = [
    { name: 'cellular A', technology: 'lte', tx: 23, bands: LTE.slice(0, 9) },
    { name: 'cellular B', technology: 'lte', tx: 23, bands: LTE.slice(9) },
    {
      name: 'NR',
      technology: 'nr',
      tx: 23,
      bands: [
        ['n77', single(3300, 4200, 'tdd')],
        ['n78', single(3300, 3800, 'tdd')],
      ],
    },
    {
      name: 'GNSS',
      technology: 'gnss',
      tx: null,
      polarization: 'RHCP',
      bands: [
        ['GPS L1', single(1574.397, 1576.443, 'receive')],
        ['GPS L5', single(1164.45, 1188.45, 'receive')],
      ],
    },
    {
      name: 'Wi-Fi',
      technology: 'wifi',
      tx: 18,
      limits: [
        { region: 'US', fromHz: 2400 * MHZ, toHz: 2483.5 * MHZ, kind: 'eirp', valueDbm: 36, source: '47 CFR 15.247(b)(4)' },
        { region: 'EU', fromHz: 2400 * MHZ, toHz: 2483.5 * MHZ, kind: 'eirp', valueDbm: 20, source: 'ETSI EN 300 328' },
      ],
      bands: [
        ['2.4 GHz', single(2400, 2483.5, 'tdd')],
        ['5 GHz', single(5150, 5850, 'tdd')],
      ],
    },
    { name: 'BLE', technology: 'ble', tx: 8, bands: [['BLE', single(2400, 2483.5, 'tdd')]] },
    {
      name: 'LoRa',
      technology: 'ism',
      tx: 14,
      limits: [{ region: 'EU', fromHz: 868 * MHZ, toHz: 868.6 * MHZ, kind: 'erp', valueDbm: 10 * Math.log10(25), source: 'ETSI EN 300 220-2' }],
      bands: [
        ['EU868', single(863, 870, 'tdd')],
        ['US915', single(902, 928, 'tdd')],
      ],
    },
    { name: 'UWB', technology: 'uwb', tx: -10, bands: [['UWB ch5', single(6240, 6739.2, 'tdd')]] },
  ];
  const requirements: RadioBandRequirement[] = [];
  radios.forEach((radio, r) => {
    radio.bands.forEach(([designation, ranges], b) => {
      requirements.push({
        radioId: r + 1,
        radioName: radio.name,
        technology: radio.technology,
        bandId: r * 100 + b + 1,
        designation,
        ranges,
        txPowerDbm: radio.tx,
        certifiedMaxGainDbi: radio.tx === null ? null : 3,
        feedLossDb: 0.5,
        requiredPolarization: radio.polarization ?? null,
        productGroundPlane: { lengthMm: 110, widthMm: 60 },
        regulatoryLimits: radio.limits ?? [],
      });
    });
  });
  return requirements;
}
