import { Intent } from '@blueprintjs/core';
import type { IconName } from '@blueprintjs/icons';
import type { CellStatus, MatrixCell } from '../types';

/** One look per state, used by the matrix, the candidates and the report alike. */
export const STATUS_LOOK: Record<CellStatus, { intent: Intent; icon: IconName; label: string }> = {
  pass: { intent: Intent.SUCCESS, icon: 'tick-circle', label: 'PASS' },
  marginal: { intent: Intent.WARNING, icon: 'warning-sign', label: 'MARGINAL' },
  fail: { intent: Intent.DANGER, icon: 'error', label: 'FAIL' },
  'no-data': { intent: Intent.NONE, icon: 'help', label: 'NO DATA' },
};

/** The finding that decides the cell's state, for the short code shown in the cell. */
export function decidingFinding(cell: MatrixCell) {
  const wanted = cell.status === 'pass' ? null : cell.status;
  return wanted ? (cell.findings.find((f) => f.severity === wanted) ?? null) : null;
}

/** "EFFICIENCY_BELOW_FLOOR" → "EFFICIENCY BELOW FLOOR", short enough for a cell. */
export function shortCode(code: string): string {
  return code.replace(/_NO_DATA$/, '').replace(/_/g, ' ');
}
