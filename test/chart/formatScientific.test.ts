import { describe, expect, it } from 'vitest';
import { formatScientific, superscript } from '../../src/chart/formatScientific';

describe('formatScientific', () => {
  it('writes small and large values with a power of ten', () => {
    expect(formatScientific(2.4e-24)).toBe('2.4 × 10⁻²⁴');
    expect(formatScientific(1e-14)).toBe('1 × 10⁻¹⁴');
    expect(formatScientific(3.2e6)).toBe('3.2 × 10⁶');
    // Rounding to 3 figures carries 9.9996 up to 10: shown as 1 × 10⁻⁴, not 10 × 10⁻⁵.
    expect(formatScientific(9.9996e-5)).toBe('1 × 10⁻⁴');
  });

  it('writes everyday values as plain decimals', () => {
    expect(formatScientific(50)).toBe('50');
    expect(formatScientific(0.007)).toBe('0.007');
    expect(formatScientific(2830, 4)).toBe('2830');
    expect(formatScientific(0)).toBe('0');
    expect(formatScientific(-2)).toBe('−2');
  });

  it('superscripts integers and spells out other exponents', () => {
    expect(superscript(-3)).toBe('⁻³');
    expect(superscript(10)).toBe('¹⁰');
    expect(superscript(2.5)).toBe('^2.5');
  });
});
