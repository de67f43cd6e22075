import { describe, expect, it } from 'vitest';
import { readFormNumbers } from '../../../src/ui/edit/readFormNumbers';

describe('readFormNumbers', () => {
  it('refuses a value out of range in the unit the field shows, bounds written as the app writes numbers', () => {
    const read = readFormNumbers({
      year: { label: 'By year', unit: 'a', text: '2000000', min: 0, above: true, max: 1_000_000 },
      length: { label: 'Valley length', unit: 'km', text: '0', min: 0, above: true, max: 1000 },
      concavity: { label: 'Concavity exponent', unit: '–', text: '9', min: 0.3, max: 5 },
      ok: { label: 'Head elevation', unit: 'm a.s.l.', text: '3000', min: -1000, max: 9000 },
    });
    expect(read).toEqual({
      ok: false,
      errors: [
        'By year: 2000000 is not allowed; it must be greater than 0 and at most 1,000,000 a',
        'Valley length: 0 is not allowed; it must be greater than 0 and at most 1000 km',
        'Concavity exponent: 9 is not allowed; it must be from 0.3 to 5',
      ],
    });
  });
});
