import { VERDICT_LOOK } from '../../../components/verdict-look';
import type { MatrixCell } from '../types';

/** The shared look per state (components/verdict-look.ts), under the name the matrix and candidates use. */
export const STATUS_LOOK = VERDICT_LOOK;

/** The finding that decides the cell's state: the server's choice, or the first of the cell's own severity. */
export function decidingFinding(cell: MatrixCell) {
  if (cell.decidingFinding !== undefined) return cell.decidingFinding;
  const wanted = cell.status === 'pass' ? null : cell.status;
  return wanted ? (cell.findings.find((f) => f.severity === wanted) ?? null) : null;
}
