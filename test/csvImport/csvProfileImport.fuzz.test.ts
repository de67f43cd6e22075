/**
 * Property-based fuzzing (fast-check) of the CSV profile reader: mutated valid files, random
 * CSV-like text, random text and binary junk. Whatever comes in, no exception escapes; a file
 * that is refused says why, naming the line when one line is at fault; every row left out names
 * its line (a real, non-blank line of the input) and a reason. 10,400 generated inputs in all.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseProfileCsv, type CsvProfileResult } from '../../src/csvImport/csvProfileImport';

const RUNS_MUTATED = 4000;
const RUNS_CSV = 2800;
const RUNS_TEXT = 2000;
const RUNS_BINARY = 1600;
let checked = 0;

/** Refusals about the whole file rather than one line of it. */
const FILE_LEVEL = [
  /^the file is larger than 20 MB/,
  /^the file is not text/,
  /^the file is empty;/,
  /^the file has a header but no rows of numbers$/,
];

function lineCount(text: string): number {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  return body.split(/\r\n|\n|\r/).length;
}

function lineAt(text: string, line: number): string {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  return body.split(/\r\n|\n|\r/)[line - 1] ?? '';
}

function check(text: string): void {
  let result: CsvProfileResult;
  try {
    result = parseProfileCsv(text);
  } catch (error) {
    throw new Error(`parseProfileCsv threw on ${JSON.stringify(text.slice(0, 200))}`, { cause: error });
  }
  checked++;
  if (!result.ok) {
    expect(result.error.length).toBeGreaterThan(10);
    if (!FILE_LEVEL.some((pattern) => pattern.test(result.error))) {
      // A refusal because of one line names that line, and it is a real line of the file.
      const named = /line (\d+)/.exec(result.error);
      expect(named, result.error).not.toBeNull();
      const line = Number(named![1]);
      expect(line).toBeGreaterThanOrEqual(1);
      expect(line).toBeLessThanOrEqual(lineCount(text));
      expect(lineAt(text, line).trim()).not.toBe('');
    }
    return;
  }
  const lines = lineCount(text);
  for (const problem of result.problems) {
    expect(Number.isInteger(problem.line)).toBe(true);
    expect(problem.line).toBeGreaterThanOrEqual(1);
    expect(problem.line).toBeLessThanOrEqual(lines);
    expect(lineAt(text, problem.line).trim()).not.toBe('');
    expect(problem.message.trim().length, `line ${problem.line}`).toBeGreaterThan(3);
  }
  for (const row of result.rows) {
    expect(Number.isFinite(row.distanceM) && Number.isFinite(row.bed)).toBe(true);
    expect(row.line).toBeLessThanOrEqual(lines);
  }
  // Rows keep increasing distances: that is what the reader promises the importer.
  for (let i = 1; i < result.rows.length; i++) expect(result.rows[i].distance).toBeGreaterThan(result.rows[i - 1].distance);
}

/** A valid profile: increasing distances, beds in range, optional surface and width. */
const validFile = fc
  .record({
    rows: fc.array(fc.tuple(fc.integer({ min: 1, max: 400 }), fc.integer({ min: 0, max: 4000 }), fc.integer({ min: 0, max: 300 }), fc.integer({ min: 50, max: 3000 })), {
      minLength: 1,
      maxLength: 30,
    }),
    columns: fc.integer({ min: 2, max: 4 }),
    separator: fc.constantFrom(',', ';', '\t'),
    header: fc.boolean(),
    newline: fc.constantFrom('\n', '\r\n', '\r'),
  })
  .map(({ rows, columns, separator, header, newline }) => {
    const names = ['distance_m', 'bed_m', 'surface_m', 'width_m'].slice(0, columns);
    let x = 0;
    const lines = rows.map(([dx, bed, ice, width]) => {
      x += dx * 10;
      return [x, bed, bed + ice, width].slice(0, columns).join(separator);
    });
    return (header ? [names.join(separator), ...lines] : lines).join(newline);
  });

/** Edits that break files the way people and programs do. */
const mutation = fc.oneof(
  fc.record({ kind: fc.constant('insert' as const), at: fc.nat(), text: fc.constantFrom(',', ';', '\t', '"', '\n', '#', '-', '.', 'e', 'x', ' ', '\u0000', '1e999', 'NaN', '\uFEFF') }),
  fc.record({ kind: fc.constant('delete' as const), at: fc.nat(), length: fc.integer({ min: 1, max: 8 }) }),
  fc.record({ kind: fc.constant('swapLines' as const), a: fc.nat(), b: fc.nat() }),
  fc.record({ kind: fc.constant('duplicateLine' as const), a: fc.nat() }),
);

type Mutation = typeof mutation extends fc.Arbitrary<infer M> ? M : never;

function mutate(text: string, edits: Mutation[]): string {
  let out = text;
  for (const edit of edits) {
    if (edit.kind === 'insert') {
      const at = edit.at % (out.length + 1);
      out = out.slice(0, at) + edit.text + out.slice(at);
    } else if (edit.kind === 'delete') {
      const at = edit.at % (out.length + 1);
      out = out.slice(0, at) + out.slice(at + edit.length);
    } else {
      const lines = out.split('\n');
      const a = edit.a % lines.length;
      if (edit.kind === 'duplicateLine') lines.splice(a, 0, lines[a]);
      else {
        const b = edit.b % lines.length;
        [lines[a], lines[b]] = [lines[b], lines[a]];
      }
      out = lines.join('\n');
    }
  }
  return out;
}

const csvField = fc.oneof(
  fc.double({ noNaN: false }).map(String),
  fc.integer().map(String),
  fc.constantFrom('', ' ', 'distance', 'bed (km)', 'x', '"1,5"', '"a""b"', '1,5', '1.5.5', '-', '+', 'Infinity', '0x10', '１２'),
  fc.string({ maxLength: 6 }),
);
const randomCsv = fc
  .tuple(fc.array(fc.array(csvField, { minLength: 0, maxLength: 6 }), { minLength: 0, maxLength: 20 }), fc.constantFrom(',', ';', '\t', ' '), fc.constantFrom('\n', '\r\n'))
  .map(([rows, sep, nl]) => rows.map((r) => r.join(sep)).join(nl));

describe('CSV profile reader under fuzzing', () => {
  it(`never throws on ${RUNS_MUTATED} mutated valid files, and explains every refusal`, () => {
    fc.assert(
      fc.property(validFile, fc.array(mutation, { minLength: 0, maxLength: 6 }), (file, edits) => {
        if (edits.length === 0) {
          const clean = parseProfileCsv(file);
          expect(clean.ok && clean.problems).toEqual([]);
        }
        check(mutate(file, edits));
      }),
      { numRuns: RUNS_MUTATED },
    );
  });

  it(`never throws on ${RUNS_CSV} random CSV files`, () => {
    fc.assert(fc.property(randomCsv, check), { numRuns: RUNS_CSV });
  });

  it(`never throws on ${RUNS_TEXT} random texts`, () => {
    fc.assert(fc.property(fc.string({ unit: 'grapheme', maxLength: 300 }), check), { numRuns: RUNS_TEXT });
  });

  it(`never throws on ${RUNS_BINARY} binary files decoded as text`, () => {
    const decoder = new TextDecoder('utf-8');
    fc.assert(
      fc.property(fc.uint8Array({ maxLength: 400 }), (bytes) => check(decoder.decode(bytes))),
      { numRuns: RUNS_BINARY },
    );
    console.info(`CSV profile reader: ${checked} generated inputs checked`);
    expect(checked).toBeGreaterThanOrEqual(RUNS_MUTATED + RUNS_CSV + RUNS_TEXT + RUNS_BINARY);
  });
});
