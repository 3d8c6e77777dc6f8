/** The page URL's parameter for the build quantity of the bill of materials. */
export const QUANTITY_PARAM = 'quantity';

/** The build quantity in the URL, or 1 when it is missing or not a whole number from 1 to 100 000 000. */
export function quantityFromUrl(value: string | null): number {
  if (value === null || !/^\d{1,9}$/.test(value)) return 1;
  const n = Number(value);
  return n >= 1 && n <= 100_000_000 ? n : 1;
}
