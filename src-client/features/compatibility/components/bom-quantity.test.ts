import { describe, expect, it } from 'vitest';
import { quantityFromUrl } from './bom-quantity';

describe(quantityFromUrl.name, () => {
  it('reads a whole build quantity from the URL', () => {
    expect(quantityFromUrl('500')).toBe(500);
  });
  it('falls back to 1 for a missing, zero, fractional or oversized quantity', () => {
    for (const value of [null, '', '0', '2.5', '-3', 'abc', '999999999']) expect(quantityFromUrl(value)).toBe(1);
  });
});
