/**
 * What `firnline invert` writes beside the complete scenario: inversion.csv (one row per cell,
 * numbers as csvWriters.ts writes them: positions to 10 significant figures, the rest to 7, an
 * empty field for a value that does not exist) and inversion.json (the summary: terminus, the
 * rate-factor multiplier and its range, the misfit to the radar points, the stated assumptions,
 * the version and the caution; non-finite numbers as null).
 */
import type { InversionResult } from '../model/inversion/invertBed';
import { CAUTION_TEXT } from './caution';
import { COORDINATE_DIGITS, csvNumber, FIELD_DIGITS } from './csvWriters';

export const INVERSION_HEADER = [
  'x_m',
  'surface_m',
  'thickness_m',
  'bed_m',
  'flux_m3_a',
  'slope',
  'thickness_low_m',
  'thickness_high_m',
] as const;

export const INVERSION_FORMAT = 'firnline-inversion';
export const INVERSION_VERSION = 1;

/** The whole of inversion.csv: the header, then one row per cell in down-valley order. */
export function inversionCsv(r: InversionResult): string {
  const field = (v: number) => csvNumber(v, FIELD_DIGITS);
  const lines = [INVERSION_HEADER.join(',')];
  for (let i = 0; i < r.x.length; i++) {
    lines.push(
      [
        csvNumber(r.x[i], COORDINATE_DIGITS),
        field(r.surface[i]),
        field(r.thickness[i]),
        field(r.bed[i]),
        field(r.flux[i]),
        field(r.slope[i]),
        field(r.thicknessLow[i]),
        field(r.thicknessHigh[i]),
      ].join(','),
    );
  }
  return lines.join('\n') + '\n';
}

type JsonNumber = number | null;
const json = (v: number): JsonNumber => (Number.isFinite(v) ? v : null);

/** Units of the summary's numbers, so that the file explains itself. */
export const INVERSION_UNITS = {
  terminus_m: 'm from the head of the domain (x = 0)',
  rateFactorMultiplier:
    'dimensionless: the factor applied to the scenario\'s rate factor A (1 when not fitted to the radar points)',
  'misfit.count': 'radar thickness points compared',
  'misfit.rmsMetres': 'm; root-mean-square difference of inverted and radar thickness at the radar points',
  'misfit.biasMetres': 'm; mean difference of inverted and radar thickness at the radar points',
  'misfit.weightedRms': 'dimensionless; root-mean-square of the differences, each divided by the point\'s uncertainty',
} as const;

export interface InversionJson {
  format: typeof INVERSION_FORMAT;
  version: typeof INVERSION_VERSION;
  firnlineVersion: string;
  scenarioName: string | null;
  terminus_m: JsonNumber;
  maxThickness_m: JsonNumber;
  rateFactorMultiplier: JsonNumber;
  /** Only when the multiplier was fitted to radar points; else null. */
  rateFactorMultiplierRange: [JsonNumber, JsonNumber] | null;
  /** Only when there were radar points to compare with; else null. */
  misfit: { count: number; rmsMetres: JsonNumber; biasMetres: JsonNumber; weightedRms: JsonNumber } | null;
  statements: string[];
  /** The warnings of the written scenario.json, as "/path: message". */
  warnings: string[];
  files: { scenario: string; profile: string };
  units: typeof INVERSION_UNITS;
  caution: string;
}

export interface InversionJsonContext {
  firnlineVersion: string;
  scenarioName: string | undefined;
  warnings: readonly string[];
}

export function inversionJson(r: InversionResult, context: InversionJsonContext): InversionJson {
  let maxThickness = 0;
  for (const h of r.thickness) maxThickness = Math.max(maxThickness, h);
  const range = r.rateFactorMultiplierRange;
  const misfit = r.misfit;
  return {
    format: INVERSION_FORMAT,
    version: INVERSION_VERSION,
    firnlineVersion: context.firnlineVersion,
    scenarioName: context.scenarioName ?? null,
    terminus_m: json(r.terminus),
    maxThickness_m: json(maxThickness),
    rateFactorMultiplier: json(r.rateFactorMultiplier),
    rateFactorMultiplierRange: range === undefined ? null : [json(range[0]), json(range[1])],
    misfit:
      misfit === undefined
        ? null
        : {
            count: misfit.count,
            rmsMetres: json(misfit.rmsMetres),
            biasMetres: json(misfit.biasMetres),
            weightedRms: json(misfit.weightedRms),
          },
    statements: [...r.statements],
    warnings: [...context.warnings],
    files: {
      scenario: 'scenario.json: the complete scenario with the inverted bed, ready for firnline run',
      profile: 'inversion.csv: the inverted profile, one row per cell',
    },
    units: INVERSION_UNITS,
    caution: CAUTION_TEXT,
  };
}
