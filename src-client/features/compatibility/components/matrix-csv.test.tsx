import { describe, expect, it } from 'vitest';
import type { Matrix } from '../types';
import { matrixToCsv } from './matrix-csv';

const matrix: Matrix = {
  productId: 1,
  productName: 'Tracker, "demo"',
  rows: [{ radioId: 13, radioName: 'BLE', technology: 'ble', bandId: 7, designation: 'BLE 2.4 GHz', ranges: [{ fromMhz: 2400, toMhz: 2483.5, role: 'tdd' }] }],
  columns: [{ partId: 1029, mpn: 'QF-CH2400L', title: 'chip', manufacturer: 'Quillfeather RF', reviewState: 'approved', lifecycle: 'active', assignments: [] }],
  cells: [{ row: 0, column: 0, status: 'fail', findings: [{ ruleId: 'efficiency-floor', severity: 'fail', code: 'EFFICIENCY_BELOW_FLOOR', message: 'total efficiency falls to 19.74 % at 2483.5 MHz; the floor for ble is 30 %' }] }],
  rules: 'efficiency-floor@1',
};

describe(matrixToCsv.name, () => {
  it('starts with the caution, then one line per cell, quoting fields with commas, quotes or semicolons', () => {
    const lines = matrixToCsv(matrix).trimEnd().split('\n');
    expect(lines[0]).toMatch(/^# Screening estimates .* accredited lab/);
    expect(lines[1]).toBe('product,radio,band,ranges MHz,part,manufacturer,status,findings');
    expect(lines[2]).toBe('"Tracker, ""demo""",BLE,BLE 2.4 GHz,2400-2483.5 tdd,QF-CH2400L,Quillfeather RF,fail,"fail EFFICIENCY_BELOW_FLOOR: total efficiency falls to 19.74 % at 2483.5 MHz; the floor for ble is 30 %"');
  });
});
