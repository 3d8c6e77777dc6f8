import { describe, expect, it } from 'vitest';
import type { Matrix } from '../types';
import { matrixByRadio } from './matrix-layout';

const row = (radioId: number, bandId: number) => ({
  radioId,
  radioName: `radio ${radioId}`,
  technology: 'lte' as const,
  bandId,
  designation: `B${bandId}`,
  ranges: [],
  findings: [],
});
const column = (partId: number) => ({
  partId,
  mpn: `P${partId}`,
  title: '',
  manufacturer: '',
  reviewState: 'approved' as const,
  lifecycle: 'active' as const,
  assignments: [],
});
const cell = (r: number, c: number) => ({ row: r, column: c, status: 'pass' as const, findings: [], decidingFinding: null });

describe(matrixByRadio.name, () => {
  it("gives each radio only the parts it has cells for, so another radio's part is not shown on its rows", () => {
    const matrix: Matrix = {
      productId: 1,
      productName: 'x',
      view: 'assigned',
      rows: [row(10, 1), row(10, 3), row(20, 7)],
      columns: [column(100), column(200)],
      cells: [cell(0, 0), cell(1, 0), cell(2, 1)],
      radios: [],
      rules: '',
    };
    const radios = matrixByRadio(matrix);
    expect(radios.map((r) => r.radioId)).toEqual([10, 20]);
    expect(radios[0].rows.map((r) => r.index)).toEqual([0, 1]);
    expect(radios[0].columns.map((c) => c.column.partId)).toEqual([100]);
    expect(radios[1].columns.map((c) => c.column.partId)).toEqual([200]);
    expect(radios[1].cellAt(2, 1)?.status).toBe('pass');
    expect(radios[1].cellAt(2, 0)).toBeUndefined();
  });

  it('keeps a radio with no parts, with no columns', () => {
    const radios = matrixByRadio({ productId: 1, productName: 'x', view: 'chosen', rows: [row(10, 1)], columns: [], cells: [], radios: [], rules: '' });
    expect(radios).toHaveLength(1);
    expect(radios[0].columns).toEqual([]);
  });
});
