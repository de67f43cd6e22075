/**
 * Reads a surveyed long profile from CSV text: distance, bed elevation, and optionally ice
 * surface elevation and glacier width. Pure (no DOM): the import dialog shows what this returns
 * and imports nothing until the result is clean or the user has chosen to leave bad rows out.
 *
 * Accepted: comma, semicolon or tab separators; an optional header line naming the columns
 * (units in the names such as "distance (km)" are honoured); decimal commas when the columns are
 * separated by semicolons or tabs; blank lines and lines starting with '#' are skipped.
 * Distances in metres or kilometres: as the header says, as the caller chooses, or else guessed
 * (largest distance below 500 -> kilometres; no valley glacier is under 500 m long).
 */
import { dsvFormat } from 'd3';
import { SCENARIO_LIMITS } from '../scenario/scenarioLimits';

/** Largest file accepted [bytes]: 20 MB, as for scenario files; a surveyed profile is far smaller. */
export const MAX_CSV_BYTES = 20_000_000;

/** A largest distance below this is taken as kilometres when the unit is not stated. */
export const KM_GUESS_BELOW = 500;

export type DistanceUnit = 'm' | 'km';
export type Separator = ',' | ';' | '\t';
export type ProfileColumn = 'distance' | 'bed' | 'surface' | 'width';

export interface CsvProfileRow {
  /** Line number in the file, from 1. */
  line: number;
  /** Distance along the flowline as written in the file (in `unit`). */
  distance: number;
  /** Distance along the flowline [m]. */
  distanceM: number;
  /** Bed elevation [m a.s.l.]. */
  bed: number;
  /** Ice surface elevation [m a.s.l.], where given. */
  surface?: number;
  /** Glacier width [m], where given. */
  width?: number;
}

export interface CsvRowProblem {
  line: number;
  message: string;
}

export interface CsvProfile {
  ok: true;
  separator: Separator;
  decimalComma: boolean;
  /** Header line as written, or null when the first line holds numbers. */
  header: string[] | null;
  /** Column index of each quantity in the file. */
  columns: Partial<Record<ProfileColumn, number>> & { distance: number; bed: number };
  unit: DistanceUnit;
  /** Why this unit: "stated in the header", "chosen", or the guess and its reason. */
  unitReason: string;
  /** Readable rows, in file order. */
  rows: CsvProfileRow[];
  /** Rows that could not be read, with their line numbers and reasons. */
  problems: CsvRowProblem[];
  /** Things the user should know that are not errors. */
  notes: string[];
}

export type CsvProfileResult = CsvProfile | { ok: false; error: string };

export interface CsvProfileOptions {
  /** 'auto' (default): from the header, else guessed from the largest distance. */
  unit?: 'auto' | DistanceUnit;
}

const SEPARATOR_NAMES: Record<Separator, string> = { ',': 'commas', ';': 'semicolons', '\t': 'tabs' };
const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

function fail(error: string): CsvProfileResult {
  return { ok: false, error };
}

/** Share of characters that no text file holds: NUL, other C0 controls, U+FFFD from bad UTF-8. */
export function looksBinary(text: string): boolean {
  const sample = text.slice(0, 65_536);
  let odd = 0;
  for (let i = 0; i < sample.length; i++) {
    const c = sample.charCodeAt(i);
    if (c === 0) return true;
    if ((c < 32 && c !== 9 && c !== 10 && c !== 13) || c === 0xfffd) odd++;
  }
  return odd > 0 && odd >= sample.length * 0.01;
}

/** The separator of the first lines (at most 20 are looked at). */
export function detectSeparator(sample: string[]): Separator {
  for (const sep of ['\t', ';', ','] as Separator[]) {
    if (sample.every((l) => l.includes(sep))) return sep;
  }
  return ',';
}

function columnName(field: string): string {
  return field.trim().toLowerCase();
}

/** Which quantity a header names, from its leading word(s). */
function columnFor(name: string): ProfileColumn | null {
  const bare = name.replace(/[([{].*$/, '').replace(/[_\s-]+(m|km)$/, '').trim();
  if (/^(x|distance|dist|chainage)\b/.test(bare) || bare.startsWith('distance')) return 'distance';
  if (/^(bed|bedrock|b|z_?bed|bed[_\s]?elevation)\b/.test(bare) || bare.startsWith('bed')) return 'bed';
  if (/^(surface|surf|s|ice[_\s]?surface|z_?surf)\b/.test(bare) || bare.startsWith('surface') || bare.startsWith('ice surface')) return 'surface';
  if (/^(width|w)\b/.test(bare)) return 'width';
  return null;
}

export function unitInHeader(name: string): DistanceUnit | null {
  if (/(\(|\[|_|\s)km(\)|\]|\b)/.test(name) || name === 'km') return 'km';
  if (/(\(|\[|_|\s)m(\)|\]|\b)/.test(name) || name === 'm') return 'm';
  return null;
}

export function parseNumber(raw: string, decimalComma: boolean): { value: number } | { problem: string } {
  const token = raw.trim();
  if (token === '') return { problem: 'is empty' };
  if (token.includes('.') && token.includes(',')) {
    return { problem: `"${token}" has both a point and a comma; write numbers without thousands separators` };
  }
  const normal = decimalComma ? token.replace(',', '.') : token;
  if (!NUMBER.test(normal)) {
    if (!decimalComma && token.includes(',')) {
      return { problem: `"${token}" has a decimal comma; with commas between the columns write decimal points, or separate the columns with semicolons or tabs` };
    }
    return { problem: `"${token}" is not a number` };
  }
  const value = Number(normal);
  if (!Number.isFinite(value)) return { problem: `"${token}" is too large` };
  return { value };
}

/** Reads CSV text; never throws. */
export function parseProfileCsv(text: string, options: CsvProfileOptions = {}): CsvProfileResult {
  if (text.length > MAX_CSV_BYTES) {
    return fail(`the file is larger than 20 MB (${MAX_CSV_BYTES.toLocaleString('en')} bytes), the largest profile accepted`);
  }
  if (looksBinary(text)) {
    return fail('the file is not text (it holds control characters or bytes that are not UTF-8); save the profile as CSV text');
  }
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const allLines = body.split(/\r\n|\n|\r/);
  const numbered = allLines
    .map((content, i) => ({ content, line: i + 1 }))
    .filter(({ content }) => content.trim() !== '' && !content.trimStart().startsWith('#'));
  if (numbered.length === 0) return fail('the file is empty; it needs a row for each point: distance, bed elevation');

  const separator = detectSeparator(numbered.slice(0, 20).map((l) => l.content));
  const dsv = dsvFormat(separator);
  // Quoted fields go through d3-dsv (RFC 4180); plain lines are split directly, which is much
  // faster on survey files of millions of rows.
  const split = (line: string): string[] => (line.includes('"') ? (dsv.parseRows(line)[0] ?? []) : line.split(separator));
  const decimalComma = separator !== ',';

  const first = split(numbered[0].content);
  const isHeader = first.some((f) => 'problem' in parseNumber(f, decimalComma));
  const notes: string[] = [];
  let header: string[] | null = null;
  let columns: CsvProfile['columns'];
  let headerUnit: DistanceUnit | null = null;

  if (isHeader) {
    header = first.map((f) => f.trim());
    const found: Partial<Record<ProfileColumn, number>> = {};
    header.forEach((name, i) => {
      const column = columnFor(columnName(name));
      if (column && found[column] === undefined) found[column] = i;
    });
    if (found.distance !== undefined && found.bed !== undefined) {
      columns = { ...found, distance: found.distance, bed: found.bed };
      headerUnit = unitInHeader(columnName(header[found.distance]));
      const ignored = header.filter((_, i) => !Object.values(found).includes(i));
      if (ignored.length) notes.push(`Columns not used: ${ignored.map((n) => `"${n}"`).join(', ')}.`);
    } else if (header.length >= 2 && header.length <= 4) {
      columns = positional(header.length);
      notes.push(
        `The header names (${header.map((n) => `"${n}"`).join(', ')}) were not recognised; the columns are read in order as ${describeColumns(columns)}.`,
      );
    } else {
      return fail(
        `the header line (line ${numbered[0].line}) must name a distance column and a bed column, e.g. "distance_km${separator}bed_m${separator}surface_m${separator}width_m"`,
      );
    }
  } else {
    if (first.length < 2 || first.length > 4) {
      return fail(
        `line ${numbered[0].line} has ${first.length} ${first.length === 1 ? 'value' : 'values'}; a profile needs 2 to 4 columns (distance, bed elevation, optional surface elevation, optional width) separated by commas, semicolons or tabs`,
      );
    }
    columns = positional(first.length);
  }
  const dataLines = isHeader ? numbered.slice(1) : numbered;
  if (dataLines.length === 0) return fail('the file has a header but no rows of numbers');

  // Optional columns may be missing at the end of a row; distance and bed may not.
  const needed = Math.max(columns.distance, columns.bed) + 1;
  const rows: Omit<CsvProfileRow, 'distanceM'>[] = [];
  const problems: CsvRowProblem[] = [];
  const L = SCENARIO_LIMITS;
  for (const { content, line } of dataLines) {
    const fields = split(content);
    if (fields.length < needed) {
      problems.push({
        line,
        message: `${fields.length} ${fields.length === 1 ? 'value' : 'values'}, expected at least ${needed} (columns: ${describeColumns(columns)}) separated by ${SEPARATOR_NAMES[separator]}`,
      });
      continue;
    }
    const reasons: string[] = [];
    const read = (column: ProfileColumn, required: boolean): number | undefined => {
      const index = columns[column];
      if (index === undefined) return undefined;
      const raw = fields[index] ?? '';
      if (!required && raw.trim() === '') return undefined;
      const parsed = parseNumber(raw, decimalComma);
      if ('problem' in parsed) {
        reasons.push(`${column} ${parsed.problem}`);
        return undefined;
      }
      return parsed.value;
    };
    const distance = read('distance', true);
    const bed = read('bed', true);
    const surface = read('surface', false);
    const width = read('width', false);
    if (bed !== undefined && (bed < L.bedMin || bed > L.bedMax)) {
      reasons.push(`bed elevation ${bed} m is outside ${L.bedMin} to ${L.bedMax} m a.s.l.`);
    }
    if (surface !== undefined && (surface < L.elevationMin || surface > L.elevationMax)) {
      reasons.push(`surface elevation ${surface} m is outside ${L.elevationMin} to ${L.elevationMax} m a.s.l.`);
    }
    if (width !== undefined && (width <= 0 || width > L.widthMax)) {
      reasons.push(`width ${width} m must be greater than 0 and at most ${L.widthMax.toLocaleString('en')} m`);
    }
    const previous = rows[rows.length - 1];
    if (distance !== undefined && previous && distance <= previous.distance) {
      reasons.push(
        `distance ${distance} is not greater than ${previous.distance} on line ${previous.line}; distances must increase down the valley`,
      );
    }
    if (reasons.length || distance === undefined || bed === undefined) {
      problems.push({ line, message: reasons.join('; ') });
      continue;
    }
    rows.push({ line, distance, bed, surface, width });
  }

  const largest = rows.reduce((m, r) => Math.max(m, Math.abs(r.distance)), 0);
  const { unit, unitReason } = chooseDistanceUnit(options.unit, headerUnit, largest, 'distance');
  const factor = unit === 'km' ? 1000 : 1;
  if (decimalComma && dataLines.some(({ content }) => /\d,\d/.test(content))) notes.push('Decimal commas read as decimal points.');
  return {
    ok: true,
    separator,
    decimalComma,
    header,
    columns,
    unit,
    unitReason,
    rows: rows.map((r) => ({ ...r, distanceM: r.distance * factor })),
    problems,
    notes,
  };
}

function positional(count: number): CsvProfile['columns'] {
  const columns: CsvProfile['columns'] = { distance: 0, bed: 1 };
  if (count >= 3) columns.surface = 2;
  if (count >= 4) columns.width = 3;
  return columns;
}

function describeColumns(columns: CsvProfile['columns']): string {
  return (Object.entries(columns) as [ProfileColumn, number][])
    .sort((a, b) => a[1] - b[1])
    .map(([name]) => name)
    .join(', ');
}

/**
 * The distance unit of an imported column: as chosen, else as the header states, else guessed
 * from the largest value (below KM_GUESS_BELOW: kilometres), with the reason in words.
 */
export function chooseDistanceUnit(
  chosen: DistanceUnit | 'auto' | undefined,
  headerUnit: DistanceUnit | null,
  largest: number,
  noun: string,
): { unit: DistanceUnit; unitReason: string } {
  if (chosen === 'm' || chosen === 'km') return { unit: chosen, unitReason: 'as chosen' };
  if (headerUnit) return { unit: headerUnit, unitReason: 'as the header states' };
  const unit: DistanceUnit = largest < KM_GUESS_BELOW ? 'km' : 'm';
  const reading = unit === 'km' ? `below ${KM_GUESS_BELOW}, so it is read as kilometres` : `${KM_GUESS_BELOW} or more, so it is read as metres`;
  return { unit, unitReason: `guessed: the largest ${noun}, ${largest}, is ${reading}` };
}

export function separatorName(separator: Separator): string {
  return SEPARATOR_NAMES[separator];
}
