/** Display helpers for the Tools page; they round for reading only, the numbers come from the API. */

export function fixed(value: number | null | undefined, digits = 2, unit = ''): string {
  if (value === null || value === undefined) return '∞';
  if (!Number.isFinite(value)) return '∞';
  return `${value.toFixed(digits)}${unit ? `\u202f${unit}` : ''}`;
}

export function significant(value: number, digits = 4): string {
  if (!Number.isFinite(value)) return '∞';
  return Number(value.toPrecision(digits)).toString();
}

export const mhz = (hz: number) => `${significant(hz / 1e6, 6)}\u202fMHz`;

export function metres(m: number): string {
  if (!Number.isFinite(m)) return '∞';
  return m >= 1000 ? `${significant(m / 1000, 4)}\u202fkm` : `${significant(m, 4)}\u202fm`;
}

/** A number typed in a field; null when empty or not a finite number. */
export function parseNumber(text: string): number | null {
  if (text.trim() === '') return null;
  const value = Number(text.replace(',', '.'));
  return Number.isFinite(value) ? value : null;
}
