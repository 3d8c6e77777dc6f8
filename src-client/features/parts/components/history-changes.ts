/** An audit entry's changes in words: "Lead time (days): 28 → 42", not only the field names. */

/** Actions whose changes are recorded as { field: [before, after] }. */
const CHANGE_ACTIONS = new Set(['updated', 'offer-updated', 'seeded-state', 'submitted', 'approved', 'rejected', 'restricted', 'reinstated', 'retired']);

const FIELD_LABEL: Record<string, string> = {
  offerId: 'Offer',
  measurementId: 'Measurement',
  documentId: 'Document',
  alternatePartId: 'Alternate part',
  supplier: 'Supplier',
  sku: 'SKU',
  currency: 'Currency',
  priceBreaks: 'Price breaks',
  moq: 'MOQ',
  stock: 'Stock (pieces)',
  leadTimeDays: 'Lead time (days)',
  lastCheckedOn: 'Last checked',
  reviewState: 'Review state',
  comment: 'Comment',
  mpn: 'MPN',
  specBands: 'Datasheet bands',
  nominalImpedanceOhms: 'Nominal impedance (Ω)',
  tempMinC: 'Lowest temperature (°C)',
  tempMaxC: 'Highest temperature (°C)',
};

const UNIT_SUFFIXES: [string, string][] = [
  ['Mm', 'mm'],
  ['Mhz', 'MHz'],
  ['Dbi', 'dBi'],
  ['Db', 'dB'],
  ['Pct', '%'],
  ['Days', 'days'],
];

/** "evalGroundLengthMm" → "Eval ground length (mm)". */
export function fieldLabel(field: string): string {
  if (FIELD_LABEL[field]) return FIELD_LABEL[field];
  let name = field;
  let unit = '';
  for (const [suffix, text] of UNIT_SUFFIXES) {
    if (name.endsWith(suffix) && name.length > suffix.length) {
      name = name.slice(0, -suffix.length);
      unit = ` (${text})`;
      break;
    }
  }
  const words = name.replace(/([a-z0-9])([A-Z])/g, '$1 $2').toLowerCase();
  return words.charAt(0).toUpperCase() + words.slice(1) + unit;
}

const isPriceBreak = (v: unknown): v is { quantity: number; unitPrice: string } => typeof v === 'object' && v !== null && 'quantity' in v && 'unitPrice' in v;

/** One value as a person reads it. */
export function valueText(value: unknown): string {
  if (value === null || value === undefined || value === '') return '—';
  if (Array.isArray(value)) {
    if (value.length > 0 && value.every(isPriceBreak)) return value.map((b) => `${b.quantity}+ at ${b.unitPrice}`).join(', ');
    if (value.every((v) => typeof v !== 'object' || v === null)) return value.map(valueText).join(', ');
    return `${value.length} ${value.length === 1 ? 'entry' : 'entries'}`;
  }
  if (typeof value === 'object') return JSON.stringify(value);
  return String(value);
}

export interface ChangeLine {
  readonly field: string;
  readonly text: string;
}

/** Each changed field with its old and new value where the action records both, else its value. */
export function describeChanges(action: string, changes: Record<string, unknown>): ChangeLine[] {
  const pairs = CHANGE_ACTIONS.has(action);
  return Object.entries(changes)
    .filter(([, v]) => v !== undefined)
    .map(([field, v]) => {
      const label = fieldLabel(field);
      if (pairs && Array.isArray(v) && v.length === 2 && field !== 'offerId') {
        const [before, after] = v;
        return { field, text: `${label}: ${valueText(before)} → ${valueText(after)}` };
      }
      return { field, text: `${label}: ${valueText(v)}` };
    });
}
