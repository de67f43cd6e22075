import { describe, expect, it } from 'vitest';
import { parseForcingCsv } from '../../src/csvImport/csvForcingImport';

describe('parseForcingCsv', () => {
  it('reads a header, commas and comments into [year, K, factor] rows', () => {
    const result = parseForcingCsv('# invented series\nyear,dT (K),precipitation factor\n0,0,1\n50,0.8,1.05\n\n100,1.6,1.1\n');
    expect(result).toEqual({ ok: true, header: 'year,dT (K),precipitation factor', rows: [[0, 0, 1], [50, 0.8, 1.05], [100, 1.6, 1.1]] });
  });
  it('reads semicolons with decimal commas', () => {
    const result = parseForcingCsv('0;0;1\n10;0,5;1,02\n');
    expect(result.ok && result.rows).toEqual([[0, 0, 1], [10, 0.5, 1.02]]);
  });
  it('names every bad row by line and reason and imports nothing', () => {
    const result = parseForcingCsv('year,dT,P\n0,0,1\n10,x,1\n20,1,0\n30,1,1\n30,2,1\n40,1\n');
    if (result.ok) throw new Error('expected problems');
    expect(result.error).toBe('4 rows could not be read; nothing was imported');
    expect(result.problems).toEqual([
      { line: 3, message: 'the warming "x" is not a number' },
      { line: 4, message: '0: the precipitation factor must be greater than 0 and at most 10' },
      { line: 6, message: 'the year 30 must be greater than the year before it (30 on line 5)' },
      { line: 7, message: 'has 2 fields; each row needs exactly three: year, warming (K), precipitation factor' },
    ]);
  });
  it('refuses an empty file', () => {
    expect(parseForcingCsv('\n# nothing\n')).toEqual({ ok: false, error: 'the file holds no rows', problems: [] });
  });
});
