import { describe, expect, it } from 'vitest';
import { MAX_CSV_BYTES, parseProfileCsv, type CsvProfile } from '../../src/csvImport/csvProfileImport';

function ok(text: string, options?: Parameters<typeof parseProfileCsv>[1]): CsvProfile {
  const r = parseProfileCsv(text, options);
  if (!r.ok) throw new Error(`expected a profile, got: ${r.error}`);
  return r;
}

function refused(text: string): string {
  const r = parseProfileCsv(text);
  if (r.ok) throw new Error('expected a refusal');
  return r.error;
}

// Invented survey values; the format rules are those of docs/scenario-format.md (limits) and
// RFC 4180 (quoting) as d3-dsv implements it.
describe('parseProfileCsv', () => {
  it('reads a good file with a header in metres, with surface and width', () => {
    const p = ok('distance_m,bed_m,surface_m,width_m\n0,3300,3380,1500\n2000,2950,3100,1100\n5000,2600,2700,800\n');
    expect(p.header).toEqual(['distance_m', 'bed_m', 'surface_m', 'width_m']);
    expect(p.unit).toBe('m');
    expect(p.unitReason).toBe('as the header states');
    expect(p.problems).toEqual([]);
    expect(p.rows.map((r) => [r.line, r.distanceM, r.bed, r.surface, r.width])).toEqual([
      [2, 0, 3300, 3380, 1500],
      [3, 2000, 2950, 3100, 1100],
      [4, 5000, 2600, 2700, 800],
    ]);
  });

  it('guesses kilometres when the largest distance is below 500, and says why', () => {
    const p = ok('0,3300\n2.5,2900\n12.25,1950\n');
    expect(p.header).toBeNull();
    expect(p.unit).toBe('km');
    expect(p.unitReason).toMatch(/largest distance, 12.25, is below 500/);
    expect(p.rows.map((r) => r.distanceM)).toEqual([0, 2500, 12250]);
  });

  it('guesses metres at 500 or more, and the user can choose otherwise', () => {
    expect(ok('0,3300\n12000,1950\n').unit).toBe('m');
    const chosen = ok('0,3300\n120,1950\n', { unit: 'm' });
    expect(chosen.unit).toBe('m');
    expect(chosen.rows[1].distanceM).toBe(120);
  });

  it('takes the unit from a header such as "distance (km)"', () => {
    const p = ok('Distance (km);Bed (m)\n0;3300\n800;1950\n');
    expect(p.unit).toBe('km');
    expect(p.rows[1].distanceM).toBe(800_000);
  });

  it('reads semicolon- and tab-separated files with decimal commas', () => {
    const semi = ok('distance;bed\n0;3300,5\n1,5;3100,25\n');
    expect(semi.separator).toBe(';');
    expect(semi.rows.map((r) => [r.distanceM, r.bed])).toEqual([[0, 3300.5], [1500, 3100.25]]);
    expect(semi.notes).toContain('Decimal commas read as decimal points.');
    const tab = ok('x\tbed\n0\t3300\n1200\t3100,5\n');
    expect(tab.separator).toBe('\t');
    expect(tab.rows[1].bed).toBe(3100.5);
  });

  it('refuses decimal commas in a comma-separated file, naming the line and the remedy', () => {
    const p = ok('distance,bed\n0,3300\n"1,5",3100\n');
    expect(p.problems).toHaveLength(1);
    expect(p.problems[0].line).toBe(3);
    expect(p.problems[0].message).toMatch(/decimal comma.*semicolons or tabs/);
  });

  it('lists unreadable rows with their line numbers and reasons, keeping the good ones', () => {
    const text = ['# survey 2019', 'distance,bed,surface', '0,3300,3380', '', '1000,abc,3200', '2000,2950', '3000,2800,', '4000,9500,2900', '5000'].join('\n');
    const p = ok(text);
    expect(p.rows.map((r) => r.line)).toEqual([3, 6, 7]);
    expect(p.rows[1].surface).toBeUndefined();
    expect(p.problems).toEqual([
      { line: 5, message: 'bed "abc" is not a number' },
      { line: 8, message: 'bed elevation 9500 m is outside -1000 to 9000 m a.s.l.' },
      { line: 9, message: '1 value, expected at least 2 (columns: distance, bed, surface) separated by commas' },
    ]);
  });

  it('refuses distances that do not increase, naming both lines', () => {
    const p = ok('0,3300\n1000,3100\n1000,3050\n900,3000\n2000,2900\n');
    expect(p.rows.map((r) => r.line)).toEqual([1, 2, 5]);
    expect(p.problems.map((q) => q.line)).toEqual([3, 4]);
    expect(p.problems[0].message).toBe('distance 1000 is not greater than 1000 on line 2; distances must increase down the valley');
    expect(p.problems[1].message).toMatch(/distance 900 is not greater than 1000 on line 2/);
  });

  it('refuses numbers with thousands separators and widths that are not positive', () => {
    const p = ok('distance;bed;width\n0;3.300,5;900\n1000;3100;0\n');
    expect(p.problems[0]).toEqual({ line: 2, message: 'bed "3.300,5" has both a point and a comma; write numbers without thousands separators' });
    expect(p.problems[1].message).toMatch(/width 0 m must be greater than 0/);
  });

  it('refuses an empty file, a blank file and a header without rows', () => {
    expect(refused('')).toMatch(/the file is empty/);
    expect(refused('\n  \n\r\n')).toMatch(/the file is empty/);
    expect(refused('distance,bed\n')).toBe('the file has a header but no rows of numbers');
  });

  it('refuses binary junk', () => {
    const junk = String.fromCharCode(...Array.from({ length: 400 }, (_, i) => (i * 37) % 256));
    expect(refused(junk)).toMatch(/not text/);
    expect(refused('PK\u0003\u0004\u0000\u0000 zip')).toMatch(/not text/);
  });

  it('refuses text over 20 MB before reading it', () => {
    const huge = '0,1\n'.repeat(Math.ceil((MAX_CSV_BYTES + 1) / 4));
    expect(refused(huge)).toMatch(/larger than 20 MB/);
  });

  it('refuses a first line with too many columns and a header without distance and bed', () => {
    expect(refused('1,2,3,4,5\n')).toMatch(/line 1 has 5 values; a profile needs 2 to 4 columns/);
    expect(refused('a,b,c,d,e\n1,2,3,4,5\n')).toMatch(/must name a distance column and a bed column/);
  });

  it('reads columns in any order by their header names and notes unused ones', () => {
    const p = ok('width,comment,bed,distance_km\n900,start,3300,0\n700,end,2000,10\n');
    expect(p.columns).toMatchObject({ width: 0, bed: 2, distance: 3 });
    expect(p.unit).toBe('km');
    expect(p.rows[1]).toMatchObject({ distanceM: 10_000, bed: 2000, width: 700 });
    expect(p.notes[0]).toBe('Columns not used: "comment".');
  });
});
