/**
 * Reads point observations (radar thickness or surface speed) from CSV text: columns x, value,
 * uncertainty, in that order; an optional header line. Pure (no DOM); the observations editor
 * shows what this returns, row by row, as the profile import does (csvProfileImport.ts, whose
 * separators, decimal commas, comment lines and distance units it shares).
 *
 * x in metres or kilometres: as the header says ("x (km)", "x_m"), as the caller chooses, or else
 * guessed (largest x below 500 -> kilometres). The value and uncertainty are in the list's unit
 * (m for thickness, m a^-1 for speed); the uncertainty is one sigma and greater than 0.
 */
import { dsvFormat } from 'd3';
import type { ObservedPoint } from '../model/scenario';
import { chooseDistanceUnit, detectSeparator, looksBinary, MAX_CSV_BYTES, parseNumber, unitInHeader, type CsvRowProblem, type DistanceUnit } from './csvProfileImport';

export interface ObservationCsvOptions {
  /** What is measured, for messages: "thickness", "surface speed". */
  what: string;
  /** Unit of the value and uncertainty: "m", "m a^-1". */
  unit: string;
  /** Largest value allowed. */
  max: number;
  /** 'auto' (default): from the header, else guessed from the largest x. */
  distanceUnit?: 'auto' | DistanceUnit;
}

export type ObservationCsvResult =
  | {
      ok: true;
      /** Points [x m, value, uncertainty], in file order. */
      points: ObservedPoint[];
      /** The line of each point. */
      lines: number[];
      problems: CsvRowProblem[];
      unit: DistanceUnit;
      unitReason: string;
      header: string[] | null;
    }
  | { ok: false; error: string };

/** The columns, in words, for the dialog and the messages. */
export function observationColumns(o: Pick<ObservationCsvOptions, 'what' | 'unit'>): string {
  return `x (distance down-valley, km or m), ${o.what} (${o.unit}), uncertainty (${o.unit}, one sigma, greater than 0)`;
}

/** Reads CSV text; never throws. */
export function parseObservationCsv(text: string, options: ObservationCsvOptions): ObservationCsvResult {
  const fail = (error: string): ObservationCsvResult => ({ ok: false, error });
  if (text.length > MAX_CSV_BYTES) return fail('the file is larger than 20 MB, the largest accepted');
  if (looksBinary(text)) return fail('the file is not text (it holds control characters or bytes that are not UTF-8); save the observations as CSV text');
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const numbered = body
    .split(/\r\n|\n|\r/)
    .map((content, i) => ({ content, line: i + 1 }))
    .filter(({ content }) => content.trim() !== '' && !content.trimStart().startsWith('#'));
  const columns = observationColumns(options);
  if (numbered.length === 0) return fail(`the file is empty; it needs a row for each point: ${columns}`);
  const separator = detectSeparator(numbered.slice(0, 20).map((l) => l.content));
  const dsv = dsvFormat(separator);
  const split = (line: string): string[] => (line.includes('"') ? (dsv.parseRows(line)[0] ?? []) : line.split(separator));
  const decimalComma = separator !== ',';
  const first = split(numbered[0].content);
  const isHeader = first.some((f) => 'problem' in parseNumber(f, decimalComma));
  const header = isHeader ? first.map((f) => f.trim()) : null;
  const headerUnit = header ? unitInHeader(header[0].toLowerCase()) : null;
  const dataLines = isHeader ? numbered.slice(1) : numbered;
  if (dataLines.length === 0) return fail('the file has a header but no rows of numbers');

  const rows: { line: number; x: number; value: number; sigma: number }[] = [];
  const problems: CsvRowProblem[] = [];
  for (const { content, line } of dataLines) {
    const fields = split(content);
    if (fields.length !== 3) {
      problems.push({ line, message: `${fields.length} ${fields.length === 1 ? 'value' : 'values'}, expected 3 (columns: ${columns})` });
      continue;
    }
    const reasons: string[] = [];
    const read = (index: number, name: string): number | undefined => {
      const parsed = parseNumber(fields[index], decimalComma);
      if ('problem' in parsed) {
        reasons.push(`${name} ${parsed.problem}`);
        return undefined;
      }
      return parsed.value;
    };
    const x = read(0, 'x');
    const value = read(1, options.what);
    const sigma = read(2, 'uncertainty');
    if (x !== undefined && x < 0) reasons.push(`x ${x} is negative; distances are measured down-valley from the head`);
    if (value !== undefined && (value < 0 || value > options.max)) {
      reasons.push(`${options.what} ${value} ${options.unit} is outside 0 to ${options.max.toLocaleString('en')} ${options.unit}`);
    }
    if (sigma !== undefined && !(sigma > 0)) reasons.push(`uncertainty ${sigma} ${options.unit} must be greater than 0 (a zero uncertainty cannot weight a fit)`);
    const previous = rows[rows.length - 1];
    if (x !== undefined && previous && x <= previous.x) {
      reasons.push(`x ${x} is not greater than ${previous.x} on line ${previous.line}; positions must increase down the valley (combine measurements at one place first)`);
    }
    if (reasons.length || x === undefined || value === undefined || sigma === undefined) {
      problems.push({ line, message: reasons.join('; ') });
      continue;
    }
    rows.push({ line, x, value, sigma });
  }

  const largest = rows.reduce((m, r) => Math.max(m, r.x), 0);
  const { unit, unitReason } = chooseDistanceUnit(options.distanceUnit, headerUnit, largest, 'x');
  const factor = unit === 'km' ? 1000 : 1;
  return {
    ok: true,
    points: rows.map((r) => [Number((r.x * factor).toPrecision(12)), r.value, r.sigma]),
    lines: rows.map((r) => r.line),
    problems,
    unit,
    unitReason,
    header,
  };
}
