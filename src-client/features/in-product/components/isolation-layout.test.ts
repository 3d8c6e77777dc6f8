import { describe, expect, it } from 'vitest';
import type { ProductIsolation } from '../types';
import { bandPairsWorstFirst, correlationGroups, isolationTables } from './isolation-layout';

const antenna = (measurementId: number, port: number, radioId: number, radioName: string, role: 'main' | 'diversity') => ({
  measurementId,
  port,
  radioId,
  radioName,
  role,
});

// Two files: file 1 maps three antennas (LTE main and diversity, Wi-Fi), file 2 only one (no table of its own).
const isolation: ProductIsolation = {
  antennas: [antenna(1, 1, 21, 'LTE', 'main'), antenna(1, 2, 21, 'LTE', 'diversity'), antenna(1, 4, 22, 'Wi-Fi', 'main'), antenna(2, 1, 23, 'LoRa', 'main')],
  isolation: [
    { a: 0, b: 1, worstIsolationDb: 10.8, bandPairs: [{ bandA: 'B20', bandB: 'B20', isolationDb: 10.8 }] },
    {
      a: 0,
      b: 2,
      worstIsolationDb: 19.5,
      bandPairs: [
        { bandA: 'B20', bandB: 'Wi-Fi 5 GHz', isolationDb: null },
        { bandA: 'B1', bandB: 'Wi-Fi 2.4 GHz', isolationDb: 19.5 },
        { bandA: 'B20', bandB: 'Wi-Fi 2.4 GHz', isolationDb: 30 },
      ],
    },
    { a: 1, b: 2, worstIsolationDb: 23.9, bandPairs: [] },
  ],
  correlation: [
    { radioId: 21, radioName: 'LTE', a: 0, b: 1, bandId: 120, band: 'B20', worstEcc: 0.02, threshold: 0.5, aboveThreshold: false },
    { radioId: 21, radioName: 'LTE', a: 0, b: 1, bandId: 101, band: 'B1', worstEcc: 0.6, threshold: 0.5, aboveThreshold: true },
  ],
  correlationAssumption: 'lossless antennas',
};
const files = [
  { id: 1, fileName: 'housing.s4p' },
  { id: 2, fileName: 'lora.s2p' },
];

describe(isolationTables.name, () => {
  it('lays the pairs of one file out as a square, symmetric table with an empty diagonal', () => {
    const tables = isolationTables(isolation, files);
    expect(tables).toHaveLength(1);
    const [table] = tables;
    expect(table.fileName).toBe('housing.s4p');
    expect(table.labels).toEqual(['LTE · main (port\u00a01)', 'LTE · diversity (port\u00a02)', 'Wi-Fi · main (port\u00a04)']);
    const db = table.grid.map((row) => row.map((cell) => cell?.worstIsolationDb ?? null));
    expect(db).toEqual([
      [null, 10.8, 19.5],
      [10.8, null, 23.9],
      [19.5, 23.9, null],
    ]);
  });
  it('gives no table for a file with a single mapped antenna, or none', () => {
    expect(isolationTables({ antennas: [isolation.antennas[3]], isolation: [] }, files)).toEqual([]);
    expect(isolationTables({ antennas: [], isolation: [] }, files)).toEqual([]);
  });
});

describe(bandPairsWorstFirst.name, () => {
  it('puts the least isolation first and pairs without points last, leaving the cell as it was', () => {
    const cell = isolation.isolation[1];
    expect(bandPairsWorstFirst(cell).map((p) => p.isolationDb)).toEqual([19.5, 30, null]);
    expect(cell.bandPairs[0].isolationDb).toBeNull();
  });
});

describe(correlationGroups.name, () => {
  it('groups the rows by pair of antennas, naming both in words', () => {
    const groups = correlationGroups(isolation);
    expect(groups).toHaveLength(1);
    expect(groups[0].radioName).toBe('LTE');
    expect(groups[0].antennas).toBe('main (port\u00a01) and diversity (port\u00a02)');
    expect(groups[0].rows.map((r) => r.band)).toEqual(['B20', 'B1']);
  });
});
