import type { Matrix, MatrixCell, MatrixColumn, MatrixRow } from '../types';

export interface RadioMatrix {
  radioId: number;
  radioName: string;
  /** The radio's band rows, with their index into the matrix's rows. */
  rows: { index: number; row: MatrixRow }[];
  /** Only the parts evaluated against this radio (its chosen and shortlisted ones), with their index into columns. */
  columns: { index: number; column: MatrixColumn }[];
  cellAt: (row: number, column: number) => MatrixCell | undefined;
}

/** Splits the sparse matrix per radio: each radio's rows against the parts it has cells for, nothing from other radios. */
export function matrixByRadio(matrix: Matrix): RadioMatrix[] {
  const index = new Map<string, MatrixCell>();
  for (const cell of matrix.cells) index.set(`${cell.row}:${cell.column}`, cell);
  const cellAt = (row: number, column: number) => index.get(`${row}:${column}`);
  const radios = new Map<number, RadioMatrix>();
  matrix.rows.forEach((row, i) => {
    let radio = radios.get(row.radioId);
    if (!radio) {
      radio = { radioId: row.radioId, radioName: row.radioName, rows: [], columns: [], cellAt };
      radios.set(row.radioId, radio);
    }
    radio.rows.push({ index: i, row });
  });
  for (const radio of radios.values()) {
    const used = new Set<number>();
    for (const { index: r } of radio.rows) for (let c = 0; c < matrix.columns.length; c++) if (index.has(`${r}:${c}`)) used.add(c);
    radio.columns = [...used].sort((a, b) => a - b).map((c) => ({ index: c, column: matrix.columns[c] }));
  }
  return [...radios.values()];
}
