/** Form text to an API number: empty → null, numeric → number, anything else as typed so the server names the field. */
export const numberOrNull = (text: string): number | string | null => {
  const trimmed = text.trim();
  if (trimmed === '') return null;
  const value = Number(trimmed);
  return Number.isFinite(value) ? value : trimmed;
};

export const textOf = (value: number | null | undefined): string => (value === null || value === undefined ? '' : String(value));
