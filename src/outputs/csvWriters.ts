/**
 * CSV text of a run's outputs (RFC 4180 style, comma-separated, "\n" line ends, one header line,
 * no comment lines, so that any CSV reader takes the files as they are).
 *
 * Number rule, chosen so that a value read back is exactly the value written (the shortest
 * JavaScript form of a double parses back to that double):
 *   - model fields (elevations, speeds, stresses, ...): rounded to 7 significant figures,
 *     i.e. Number(v.toPrecision(7)), then written in JavaScript's shortest form: plain decimals
 *     for 1e-6 <= |v| < 1e21, exponent notation ("3.2e-8") outside that range;
 *   - time and position (t_yr, x_m): 10 significant figures, which keeps every time and cell
 *     centre the format allows apart and removes floating-point noise such as 0.30000000000000004;
 *   - volume and area: not rounded (full round-trip digits), since differences between output
 *     times can be far below 7 significant figures of the total;
 *   - non-finite values (terminus of an ice-free valley, undefined ELA) are an empty field;
 *     -0 is written as 0.
 */
import type { GlacierNumbers, ProfileFields } from '../model/diagnostics';

export const PROFILES_HEADER = [
  't_yr',
  'x_m',
  'bed_m',
  'surface_m',
  'thickness_m',
  'width_m',
  'surface_width_m',
  'u_surface_m_a',
  'u_sliding_m_a',
  'tau_d_kPa',
  'strain_rate_a',
  'crevasse_depth_m',
  'balance_mwe_a',
] as const;

export const SERIES_HEADER = [
  't_yr',
  'volume_m3',
  'area_m2',
  'length_m',
  'terminus_m',
  'ela_m',
  'aar',
  'max_thickness_m',
  'max_u_surface_m_a',
  'warming_K',
  'frontal_ablation_m3_a',
] as const;

/** Significant figures of model fields. */
export const FIELD_DIGITS = 7;
/** Significant figures of times and positions. */
export const COORDINATE_DIGITS = 10;

/** One number as a CSV field: rounded to `digits` significant figures (undefined: not rounded). */
export function csvNumber(value: number, digits?: number): string {
  // Fast path: off the glacier most fields are exactly 0 (and -0 is written as 0 anyway).
  if (value === 0) return '0';
  if (!Number.isFinite(value)) return '';
  if (digits === undefined) return String(value);
  const magnitude = Math.abs(value);
  if (digits <= 15 && magnitude >= 1e-300 && magnitude < 1e300) return shortestOfPrecision(value.toPrecision(digits));
  // String(-0) is already "0"; adding 0 also turns a rounded -0 into +0 for readers that keep the sign.
  return String(Number(value.toPrecision(digits)) + 0);
}

/**
 * String(Number(text)) for text = v.toPrecision(d), d <= 15, without parsing and printing again
 * (a third of the time of profiles.csv). A decimal of at most 15 significant digits comes back
 * from the double nearest to it, so the shortest form of that double is the same digits without
 * trailing zeros, laid out as Number.prototype.toString does: plain for 1e-7 < |v| < 1e21,
 * otherwise d.ddde±n. Subnormal and near-overflow values, where that reasoning fails, take the
 * slow path above; a test compares both on a million values.
 */
function shortestOfPrecision(text: string): string {
  const e = text.indexOf('e');
  // toPrecision writes plain decimals exactly where String() does for these magnitudes.
  if (e < 0) return text.indexOf('.') < 0 ? text : withoutTrailingZeros(text, text.length);
  const mantissa = withoutTrailingZeros(text, e);
  const exponent = Number(text.slice(e + 1));
  if (exponent < 0 || exponent >= 21) return mantissa + text.slice(e);
  // 1e7 <= |v| < 1e21 (toPrecision wrote an exponent, String() writes the whole number).
  const negative = mantissa.charCodeAt(0) === 45;
  const digitString = (negative ? mantissa.slice(1) : mantissa).replace('.', '');
  return (negative ? '-' : '') + digitString + '0'.repeat(exponent + 1 - digitString.length);
}

/** text.slice(0, end) without the trailing zeros of its fraction (and the point when none remain). */
function withoutTrailingZeros(text: string, end: number): string {
  let k = end;
  while (text.charCodeAt(k - 1) === 48) k--;
  if (text.charCodeAt(k - 1) === 46) k--;
  return text.slice(0, k);
}

const field = (v: number) => csvNumber(v, FIELD_DIGITS);
const coordinate = (v: number) => csvNumber(v, COORDINATE_DIGITS);

export function profilesHeaderLine(): string {
  return PROFILES_HEADER.join(',') + '\n';
}

/** The profiles.csv rows of one output time, one per cell, each ending in "\n". */
/** The texts of the columns that do not change between output times (x, bed, width). */
export interface FixedProfileText {
  x: string[];
  bed: string[];
  width: string[];
}

export function fixedProfileText(p: Pick<ProfileFields, 'x' | 'bed' | 'width'>): FixedProfileText {
  return { x: Array.from(p.x, coordinate), bed: Array.from(p.bed, field), width: Array.from(p.width, field) };
}

/** `fixed`: the x, bed and width columns already written (fixedProfileText of the same arrays). */
export function profileRows(time: number, p: ProfileFields, fixed: FixedProfileText = fixedProfileText(p)): string {
  const t = coordinate(time);
  const lines: string[] = [];
  for (let i = 0; i < p.x.length; i++) {
    lines.push(
      [
        t,
        fixed.x[i],
        fixed.bed[i],
        field(p.surface[i]),
        field(p.thickness[i]),
        fixed.width[i],
        field(p.surfaceWidth[i]),
        field(p.surfaceSpeed[i]),
        field(p.slidingSpeed[i]),
        field(p.drivingStress[i]),
        field(p.strainRate[i]),
        field(p.crevasseDepth[i]),
        field(p.balance[i]),
      ].join(','),
    );
  }
  return lines.length > 0 ? lines.join('\n') + '\n' : '';
}

/** Whole profiles.csv: the header, then every cell of every output time in time order. */
export function profilesCsv(snapshots: Iterable<{ time: number; fields: ProfileFields }>): string {
  let text = profilesHeaderLine();
  for (const s of snapshots) text += profileRows(s.time, s.fields);
  return text;
}

/** One series.csv row (with its "\n"). */
export function seriesRow(g: GlacierNumbers): string {
  return (
    [
      coordinate(g.time),
      csvNumber(g.volume),
      csvNumber(g.area),
      field(g.length),
      field(g.terminus),
      field(g.ela),
      field(g.aar),
      field(g.maxThickness),
      field(g.maxSurfaceSpeed),
      field(g.warming),
      field(g.frontalAblation),
    ].join(',') + '\n'
  );
}

/** Whole series.csv: the header, then one row per output time. */
export function seriesCsv(numbers: Iterable<GlacierNumbers>): string {
  let text = SERIES_HEADER.join(',') + '\n';
  for (const g of numbers) text += seriesRow(g);
  return text;
}
