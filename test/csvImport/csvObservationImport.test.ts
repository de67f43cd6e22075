/**
 * Observation points from CSV (x, value, uncertainty): header optional, distances in km or m as
 * the header says or guessed, and every unreadable row listed with its line and reason.
 */
import { describe, expect, it } from 'vitest';
import { parseObservationCsv } from '../../src/csvImport/csvObservationImport';

const THICKNESS = { what: 'thickness', unit: 'm', max: 5000 };

describe('parseObservationCsv', () => {
  it('reads a header with the unit of x, and converts km to metres', () => {
    const r = parseObservationCsv('x (km),thickness,uncertainty\n1.5,140,15\n3,195,15\n', THICKNESS);
    if (!r.ok) throw new Error(r.error);
    expect(r.points).toEqual([
      [1500, 140, 15],
      [3000, 195, 15],
    ]);
    expect(r.unitReason).toBe('as the header states');
    expect(r.problems).toEqual([]);
  });

  it('reads rows without a header, guessing metres from large distances; semicolons with decimal commas', () => {
    const r = parseObservationCsv('1500;140,5;15\n3000;195;12,5\n', THICKNESS);
    if (!r.ok) throw new Error(r.error);
    expect(r.unit).toBe('m');
    expect(r.points).toEqual([
      [1500, 140.5, 15],
      [3000, 195, 12.5],
    ]);
  });

  it('lists every bad row with its line number and reason, and keeps the good ones', () => {
    const text = [
      'x_km,thickness_m,sigma_m', // 1
      '1,100,10', // 2
      '2,abc,10', // 3
      '3,120,0', // 4
      '2.5,110,10', // 5: after the last good row (line 2, x 1): read
      '2.4,90,5', // 6: not greater than 2.5
      '4,-5,5', // 7
      '5,100', // 8
      '# a comment', // 9
      '6,6000,10', // 10
    ].join('\n');
    const r = parseObservationCsv(text, THICKNESS);
    if (!r.ok) throw new Error(r.error);
    console.info(r.problems.map((p) => `line ${p.line}: ${p.message}`).join('\n'));
    expect(r.points).toEqual([
      [1000, 100, 10],
      [2500, 110, 10],
    ]);
    expect(r.lines).toEqual([2, 5]);
    expect(r.problems).toEqual([
      { line: 3, message: 'thickness "abc" is not a number' },
      { line: 4, message: 'uncertainty 0 m must be greater than 0 (a zero uncertainty cannot weight a fit)' },
      { line: 6, message: 'x 2.4 is not greater than 2.5 on line 5; positions must increase down the valley (combine measurements at one place first)' },
      { line: 7, message: 'thickness -5 m is outside 0 to 5,000 m' },
      {
        line: 8,
        message: '2 values, expected 3 (columns: x (distance down-valley, km or m), thickness (m), uncertainty (m, one sigma, greater than 0))',
      },
      { line: 10, message: 'thickness 6000 m is outside 0 to 5,000 m' },
    ]);
  });

  it('refuses an empty file, a header alone and binary data, saying what is expected', () => {
    const empty = parseObservationCsv('\n# nothing\n', { what: 'surface speed', unit: 'm a^-1', max: 1e5 });
    expect(empty).toEqual({
      ok: false,
      error: 'the file is empty; it needs a row for each point: x (distance down-valley, km or m), surface speed (m a^-1), uncertainty (m a^-1, one sigma, greater than 0)',
    });
    expect(parseObservationCsv('x,speed,sigma\n', THICKNESS)).toEqual({ ok: false, error: 'the file has a header but no rows of numbers' });
    expect(parseObservationCsv('\u0000\u0001abc', THICKNESS).ok).toBe(false);
  });

  it('honours a chosen unit over the guess', () => {
    const r = parseObservationCsv('1000,20,2\n', { ...THICKNESS, distanceUnit: 'km' });
    expect(r.ok && r.points).toEqual([[1_000_000, 20, 2]]);
  });
});
