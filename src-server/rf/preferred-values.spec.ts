import { preferredMantissas, snapToPreferredValue } from './preferred-values';

describe(preferredMantissas.name, () => {
  // IEC 60063:2015.
  it('E12 is the fixed table', () => {
    expect(preferredMantissas('E12')).toEqual([1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2]);
  });
  it('E24 is the fixed table', () => {
    expect(preferredMantissas('E24')).toEqual([
      1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1,
    ]);
  });
  it('is not round(10^(n/24)): 2.61, 3.16 and 8.25 are not in E24', () => {
    const e24 = preferredMantissas('E24');
    for (let n = 0; n < 24; n++) {
      const computed = Math.round(10 ** (n / 24) * 10) / 10;
      if ([10, 11, 12, 22].includes(n)) expect(e24[n]).not.toBe(computed);
    }
  });
});

describe(snapToPreferredValue.name, () => {
  it('38.98 nH → 39 nH in both series; 0.923 pF → E24 0.91 pF, E12 1.0 pF', () => {
    expect(snapToPreferredValue(38.98, 'E12')).toBe(39);
    expect(snapToPreferredValue(38.98, 'E24')).toBe(39);
    expect(snapToPreferredValue(0.923, 'E24')).toBe(0.91);
    expect(snapToPreferredValue(0.923, 'E12')).toBe(1);
  });
  it('snaps the trap-7 values to the table, not to rounded powers of ten (IEC 60063:2015)', () => {
    expect(snapToPreferredValue(2.61, 'E24')).toBe(2.7);
    expect(snapToPreferredValue(3.16, 'E24')).toBe(3.3);
    expect(snapToPreferredValue(8.25, 'E24')).toBe(8.2);
  });
  it('crosses decades and keeps exact decimals', () => {
    expect(snapToPreferredValue(9.8, 'E12')).toBe(10);
    expect(snapToPreferredValue(0.0047, 'E12')).toBe(0.0047);
    expect(snapToPreferredValue(4700, 'E24')).toBe(4700);
    expect(snapToPreferredValue(0.95, 'E24')).toBe(0.91);
  });
  it('refuses non-positive values', () => {
    expect(() => snapToPreferredValue(0, 'E12')).toThrow(RangeError);
  });
});
