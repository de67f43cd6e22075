/**
 * Reads a climate forcing series from CSV text: year, warming (K) and precipitation factor, one
 * row per year (the scenario key `forcing`). Pure (no DOM): the Warming panel imports nothing
 * until every row reads; each bad row is named by its line number and reason, as in the profile
 * import (csvProfileImport.ts).
 *
 * Accepted: comma, semicolon or tab separators (decimal commas with semicolons or tabs); an
 * optional header line (any first line whose first field is not a number); blank lines and lines
 * starting with '#' are skipped. The ranges are the scenario format's (scenarioLimits.ts).
 */
import { formatNumber } from '../scenario/formatNumber';
import { SCENARIO_LIMITS as L } from '../scenario/scenarioLimits';
import type { ForcingRow } from '../model/scenario';
import { MAX_CSV_BYTES } from './csvProfileImport';

export interface CsvForcingProblem {
  /** Line number in the file, from 1. */
  line: number;
  message: string;
}

export type CsvForcingResult =
  | { ok: true; rows: ForcingRow[]; header: string | null }
  | { ok: false; error: string; problems: CsvForcingProblem[] };

const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;
const NAMES = ['the year', 'the warming', 'the precipitation factor'] as const;

function readNumber(raw: string, decimalComma: boolean): number | string {
  const token = raw.trim();
  if (token === '') return 'is empty';
  const normal = decimalComma ? token.replace(',', '.') : token;
  if (!NUMBER.test(normal)) return `"${token}" is not a number`;
  const value = Number(normal);
  return Number.isFinite(value) ? value : `"${token}" is too large`;
}

/** Why a value is outside the format's range, or null. */
function outOfRange(column: number, value: number): string | null {
  if (column === 0 && Math.abs(value) > L.yearAbsMax) return `the year must be from ${formatNumber(-L.yearAbsMax)} to ${formatNumber(L.yearAbsMax)} a`;
  if (column === 1 && Math.abs(value) > L.warmingAbsMax) return `the warming must be from ${-L.warmingAbsMax} to ${L.warmingAbsMax} K`;
  if (column === 2 && !(value > 0 && value <= L.precipitationFactorMax)) {
    return `the precipitation factor must be greater than 0 and at most ${L.precipitationFactorMax}`;
  }
  return null;
}

/** Reads CSV text into forcing rows; never throws. */
export function parseForcingCsv(text: string): CsvForcingResult {
  if (text.length > MAX_CSV_BYTES) return { ok: false, error: 'the file is larger than 20 MB', problems: [] };
  const lines = text.replace(/^\uFEFF/, '').split(/\r\n|\n|\r/);
  const content = lines.map((l, i) => ({ text: l, line: i + 1 })).filter((l) => l.text.trim() !== '' && !l.text.trim().startsWith('#'));
  if (content.length === 0) return { ok: false, error: 'the file holds no rows', problems: [] };
  const separator = ['\t', ';', ','].find((sep) => content.slice(0, 20).every((l) => l.text.includes(sep))) ?? ',';
  const decimalComma = separator !== ',';
  let header: string | null = null;
  if (typeof readNumber(content[0].text.split(separator)[0], decimalComma) === 'string') {
    header = content[0].text;
    content.shift();
  }
  const rows: ForcingRow[] = [];
  const problems: CsvForcingProblem[] = [];
  let previousYear: { year: number; line: number } | undefined;
  for (const { text: lineText, line } of content) {
    const fields = lineText.split(separator);
    if (fields.length !== 3) {
      problems.push({ line, message: `has ${fields.length} field${fields.length === 1 ? '' : 's'}; each row needs exactly three: year, warming (K), precipitation factor` });
      continue;
    }
    const values: number[] = [];
    const reasons: string[] = [];
    fields.forEach((field, column) => {
      const v = readNumber(field, decimalComma);
      if (typeof v === 'string') reasons.push(`${NAMES[column]} ${v}`);
      else {
        const range = outOfRange(column, v);
        if (range) reasons.push(`${formatNumber(v)}: ${range}`);
        values.push(v);
      }
    });
    if (reasons.length > 0) {
      problems.push({ line, message: reasons.join('; ') });
      continue;
    }
    const [year, warming, factor] = values;
    if (previousYear && !(year > previousYear.year)) {
      problems.push({ line, message: `the year ${formatNumber(year)} must be greater than the year before it (${formatNumber(previousYear.year)} on line ${previousYear.line})` });
      continue;
    }
    previousYear = { year, line };
    rows.push([year, warming, factor]);
  }
  if (problems.length > 0) {
    return { ok: false, error: `${problems.length} row${problems.length === 1 ? '' : 's'} could not be read; nothing was imported`, problems };
  }
  if (rows.length === 0) return { ok: false, error: 'the file holds a header but no rows', problems: [] };
  if (rows.length > L.pointsMax) return { ok: false, error: `the forcing may have at most ${formatNumber(L.pointsMax)} rows`, problems: [] };
  return { ok: true, rows, header };
}
