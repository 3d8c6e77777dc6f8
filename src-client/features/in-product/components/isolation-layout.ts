import type { CorrelationRow, InProductMeasurement, IsolationCell, ProductIsolation } from '../types';
import { antennaLabel, roleAndPortText } from './in-product-words';

/** One square table: the mapped antennas of one file, each pair's cell (the diagonal is null). */
export interface IsolationTable {
  measurementId: number;
  fileName: string;
  /** "Radio name · role (port n)" of each antenna, in the table's order. */
  labels: string[];
  /** grid[i][j]: the cell of antennas i and j of this table (the same cell both ways); null on the diagonal or without data. */
  grid: (IsolationCell | null)[][];
}

/**
 * The isolation cells of the API (pairs a < b of antennas measured in the same file) laid out as one square, symmetric
 * table per file, in the API's antenna order; a file with fewer than two mapped antennas has no table.
 */
export function isolationTables(
  isolation: Pick<ProductIsolation, 'antennas' | 'isolation'>,
  files: Pick<InProductMeasurement, 'id' | 'fileName'>[],
): IsolationTable[] {
  const byFile = new Map<number, number[]>();
  isolation.antennas.forEach((antenna, index) => byFile.set(antenna.measurementId, [...(byFile.get(antenna.measurementId) ?? []), index]));
  const tables: IsolationTable[] = [];
  for (const [measurementId, indices] of byFile) {
    if (indices.length < 2) continue;
    const position = new Map(indices.map((antennaIndex, i) => [antennaIndex, i]));
    const grid = indices.map(() => indices.map((): IsolationCell | null => null));
    for (const cell of isolation.isolation) {
      const i = position.get(cell.a);
      const j = position.get(cell.b);
      if (i === undefined || j === undefined || i === j) continue;
      grid[i][j] = cell;
      grid[j][i] = cell;
    }
    tables.push({
      measurementId,
      fileName: files.find((f) => f.id === measurementId)?.fileName ?? `file ${measurementId}`,
      labels: indices.map((i) => antennaLabel(isolation.antennas[i])),
      grid,
    });
  }
  return tables;
}

/** A cell's band pairs, least isolation first (the pair that decides the cell on top); pairs without points last. */
export const bandPairsWorstFirst = (cell: IsolationCell): IsolationCell['bandPairs'] =>
  [...cell.bandPairs].sort((x, y) => (x.isolationDb ?? Infinity) - (y.isolationDb ?? Infinity));

/** The correlation rows of one pair of antennas of one radio, band by band. */
export interface CorrelationGroup {
  key: string;
  radioName: string;
  /** "main (port 1) and diversity (port 2)" */
  antennas: string;
  rows: CorrelationRow[];
}

/** The API's correlation rows grouped by antenna pair, in the API's order. */
export function correlationGroups(isolation: Pick<ProductIsolation, 'antennas' | 'correlation'>): CorrelationGroup[] {
  const groups = new Map<string, CorrelationGroup>();
  for (const row of isolation.correlation) {
    const key = `${row.a}-${row.b}`;
    let group = groups.get(key);
    if (!group) {
      const a = isolation.antennas[row.a];
      const b = isolation.antennas[row.b];
      group = { key, radioName: row.radioName, antennas: a && b ? `${roleAndPortText(a)} and ${roleAndPortText(b)}` : '', rows: [] };
      groups.set(key, group);
    }
    group.rows.push(row);
  }
  return [...groups.values()];
}
