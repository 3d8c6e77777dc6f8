import { statusRank } from './rule-binding';
import type { CellStatus, Finding } from './types';

/**
 * Short human titles of finding codes, for screens and the evaluation; exports keep the code beside it.
 * A code not listed here (an admin's rule) falls back to its rule's title.
 */
export const FINDING_TITLES: Readonly<Record<string, string>> = {
  BAND_NOT_COVERED: 'Band not covered',
  POLARIZATION_OPPOSITE: 'Opposite polarization',
  EFFICIENCY_BELOW_FLOOR: 'Efficiency below floor',
  OVER_REGIONAL_LIMIT: 'Over the regional power limit',
  GAIN_OVER_CERTIFIED: 'Gain over certified maximum',
  PART_RETIRED: 'Part retired',
  PART_END_OF_LIFE: 'Part at end of life',
  VSWR_ABOVE_TARGET: 'VSWR above target',
  EFFICIENCY_BELOW_TARGET: 'Efficiency below target',
  POLARIZATION_LOSS: 'Polarization loss',
  GROUND_PLANE_BELOW_QUARTER_WAVE: 'Ground plane below λ/4',
  GROUND_PLANE_BELOW_EVAL_BOARD: 'Ground plane below evaluation board',
  PART_NOT_APPROVED: 'Part not approved',
  PART_NRND: 'Part not recommended for new designs',
  DATASHEET_FIGURES: 'Datasheet figures only',
  EVAL_BOARD_UNKNOWN: 'Evaluation board not stated',
  RULE_BROKEN: 'Rule broken, not checked',
  NO_PART_CHOSEN: 'No part chosen',
  PRODUCT_WITHOUT_RADIOS: 'No radios',
  REGULATORY_LIMIT_NOT_ON_FILE: 'No regulatory limit on file',
  CERTIFIED_GAIN_NOT_ENTERED: 'Certified gain not entered',
  BAND_OUTSIDE_MARKETS: 'Band not used in the markets',
  MARKET_WITHOUT_BANDS: 'Market without a band',
  DETUNING_MARGIN_LOW: 'Little detuning margin',
  S11_MEASURED_IN_PRODUCT: 'S11 measured in the product',
  ENVELOPE_CORRELATION_HIGH: 'Antennas too correlated',
};

/** Within one severity, which finding names the reason first: the band's match before what follows from it. */
const PRECEDENCE: readonly string[] = [
  'NO_PART_CHOSEN',
  'BAND_NOT_COVERED',
  'POLARIZATION_OPPOSITE',
  'EFFICIENCY_BELOW_FLOOR',
  'OVER_REGIONAL_LIMIT',
  'GAIN_OVER_CERTIFIED',
  'PART_RETIRED',
  'PART_END_OF_LIFE',
  'VSWR_ABOVE_TARGET',
  'EFFICIENCY_BELOW_TARGET',
  'POLARIZATION_LOSS',
  'GROUND_PLANE_BELOW_QUARTER_WAVE',
  'GROUND_PLANE_BELOW_EVAL_BOARD',
  'PART_NOT_APPROVED',
  'PART_NRND',
];

const NO_DATA_SUFFIX = '_NO_DATA';

/** The code a "not checked" finding stands for (BAND_NOT_COVERED_NO_DATA → BAND_NOT_COVERED). */
export function baseCode(code: string): string {
  return code.endsWith(NO_DATA_SUFFIX) ? code.slice(0, -NO_DATA_SUFFIX.length) : code;
}

/** The short title of a finding: listed codes first, then the rule's own title, then the code in words. */
export function findingTitle(code: string, ruleTitle?: string): string {
  const base = baseCode(code);
  const title = FINDING_TITLES[base] ?? ruleTitle ?? base.replace(/_/g, ' ').toLowerCase();
  if (base !== code) return `Not checked: ${title.charAt(0).toLowerCase()}${title.slice(1)}`;
  return title;
}

function precedenceOf(code: string): number {
  const index = PRECEDENCE.indexOf(baseCode(code));
  return index === -1 ? PRECEDENCE.length : index;
}

/** The severity a finding must have to decide a cell of this status; a pass is decided by none. */
function decidingSeverity(status: CellStatus): Finding['severity'] | null {
  return status === 'pass' ? null : status;
}

/**
 * The finding that decides a cell's status: of the status' own severity, the first by precedence
 * (then in rule order). Null for a pass: a passing cell is never headed by a finding.
 */
export function decidingFindingOf(status: CellStatus, findings: readonly Finding[]): Finding | null {
  const severity = decidingSeverity(status);
  if (severity === null) return null;
  let best: Finding | null = null;
  for (const f of findings) {
    if (f.severity !== severity) continue;
    if (best === null || precedenceOf(f.code) < precedenceOf(best.code)) best = f;
  }
  return best;
}

export interface DecidedCell<T> {
  readonly status: CellStatus;
  readonly deciding: Finding | null;
  /** dB by which the deciding finding's condition holds (more negative: further over); null when no number decides it. */
  readonly overByDb: number | null;
  readonly item: T;
}

/**
 * The cell that decides a set of cells (the bands of a radio, the radios of a product): the worst status,
 * then the deciding finding's precedence, then the one furthest over its limit, then the first.
 */
export function decidingCellOf<T>(cells: readonly DecidedCell<T>[]): DecidedCell<T> | null {
  let best: DecidedCell<T> | null = null;
  for (const cell of cells) {
    if (best === null) {
      best = cell;
      continue;
    }
    const byStatus = statusRank(cell.status) - statusRank(best.status);
    if (byStatus !== 0) {
      if (byStatus > 0) best = cell;
      continue;
    }
    if (!cell.deciding || !best.deciding) continue;
    const byPrecedence = precedenceOf(cell.deciding.code) - precedenceOf(best.deciding.code);
    if (byPrecedence !== 0) {
      if (byPrecedence < 0) best = cell;
      continue;
    }
    if (cell.overByDb !== null && (best.overByDb === null || cell.overByDb < best.overByDb)) best = cell;
  }
  return best;
}
