/**
 * The summary.json object written next to the CSV files: provenance, the mass budget, time-step
 * statistics, warnings and the caution. Non-finite numbers become null, because JSON has no NaN
 * and JSON.stringify would silently write null anyway; doing it here makes it visible in the type.
 */
import type { RunSummary } from '../model/runScenario';
import type { ValidationMessage } from '../scenario/validationMessage';
import { formatMessage } from '../scenario/validationMessage';
import { CAUTION_TEXT } from './caution';

export const SUMMARY_FORMAT = 'firnline-summary';
export const SUMMARY_VERSION = 1;


/** Units of the summary's numbers, so that the file explains itself. */
export const SUMMARY_UNITS = {
  massBudget:
    'm^3 (m^3 per m of width when the scenario gives no width); relativeResidual is dimensionless: ' +
    '|residual| / the largest of initial volume, final volume, gross accumulation, outflow, frontal ablation and 1 mm of ice ' +
    'over the domain; solverResidual is what the implicit solver tolerance left unbalanced; frontalAblation is the ice calved ' +
    'into a lake at the ice front (residual = final - initial - appliedBalance + outflow + frontalAblation)',
  'spinup.years': 'model years (a) before year 0',
  start:
    'year, startYear: model years (a), year 0 = the observation year; climateOffset, spinUpWarming: K; ' +
    'terminus*: m along the flowline; volume*: m^3 (m^3 per m of width when the scenario gives no width); ' +
    'committed: the further change if the warming stayed at its year-0 value, lengthChange m, volumeChange m^3, yearsToSteady a',
  smallestStep_yr: 'a; smallest stability-limited time step',
  largestStep_yr: 'a; largest time step taken',
  responseTime: 'a (model years; 1 a = 365.25 d)',
  outputTimes_yr: 'a',
} as const;

type JsonNumber = number | null;

export interface SummaryJson {
  format: typeof SUMMARY_FORMAT;
  version: typeof SUMMARY_VERSION;
  firnlineVersion: string;
  scenarioName: string | null;
  massBudget: {
    initialVolume: JsonNumber;
    finalVolume: JsonNumber;
    appliedBalance: JsonNumber;
    outflow: JsonNumber;
    frontalAblation: JsonNumber;
    residual: JsonNumber;
    relativeResidual: JsonNumber;
    grossAccumulation: JsonNumber;
    clippedRoundOff: JsonNumber;
    solverResidual: JsonNumber;
  };
  numerics: { scheme: string; maxStepYears: number };
  spinup?: { years: JsonNumber; converged: boolean; criterion: string };
  start?: {
    from: 'observed' | 'transient';
    year: number;
    startYear?: number;
    climateOffset?: JsonNumber;
    fitted?: boolean;
    spinUpWarming?: JsonNumber;
    spinUpYears?: JsonNumber;
    spinUpConverged?: boolean;
    terminusObserved?: JsonNumber;
    terminusModelled: JsonNumber;
    volumeObserved: JsonNumber;
    volumeModelled: JsonNumber;
    bracketed?: boolean;
    trials?: { climateOffset: JsonNumber; terminus: JsonNumber; volume: JsonNumber; misfit: JsonNumber; spinUpConverged: boolean }[];
    committed: {
      warming: JsonNumber;
      lengthNow: JsonNumber;
      volumeNow: JsonNumber;
      lengthChange: JsonNumber;
      volumeChange: JsonNumber;
      yearsToSteady: JsonNumber;
      converged: boolean;
    };
    statements: string[];
  };
  steps: number;
  smallestStep_yr: JsonNumber;
  largestStep_yr: JsonNumber;
  endsInSteadyState: boolean;
  responseTime?: {
    stepStart: JsonNumber;
    stepEnd: JsonNumber;
    eFoldingYears: JsonNumber;
    estimateYears: JsonNumber;
    reachedSteadyState: boolean;
  };
  warnings: string[];
  outputTimes_yr: JsonNumber[];
  units: typeof SUMMARY_UNITS;
  caution: string;
}

export interface SummaryInput {
  firnlineVersion: string;
  scenarioName: string | undefined;
  /** Whether the scenario asked for a spin-up (the section is omitted otherwise). */
  spinupRequested: boolean;
  run: RunSummary;
  validatorWarnings: readonly ValidationMessage[];
  outputTimes: readonly number[];
}

/** A finite number, or null. */
export function finiteOrNull(value: number): JsonNumber {
  return Number.isFinite(value) ? value : null;
}

function spinupSection(input: SummaryInput): Pick<SummaryJson, 'spinup'> {
  const s = input.run.spinup;
  if (!input.spinupRequested || !s) return {};
  return { spinup: { years: finiteOrNull(s.years), converged: s.converged, criterion: s.criterion } };
}

function optionalNumber<K extends string>(key: K, value: number | undefined): Partial<Record<K, JsonNumber>> {
  return value === undefined ? {} : ({ [key]: finiteOrNull(value) } as Partial<Record<K, JsonNumber>>);
}

function startSection(r: RunSummary['start']): Pick<SummaryJson, 'start'> {
  if (!r) return {};
  const c = r.committed;
  return {
    start: {
      from: r.from,
      year: r.year,
      ...(r.startYear !== undefined ? { startYear: r.startYear } : {}),
      ...optionalNumber('climateOffset', r.climateOffset),
      ...(r.fitted !== undefined ? { fitted: r.fitted } : {}),
      ...optionalNumber('spinUpWarming', r.spinUpWarming),
      ...optionalNumber('spinUpYears', r.spinUpYears),
      ...(r.spinUpConverged !== undefined ? { spinUpConverged: r.spinUpConverged } : {}),
      ...optionalNumber('terminusObserved', r.terminusObserved),
      terminusModelled: finiteOrNull(r.terminusModelled),
      volumeObserved: finiteOrNull(r.volumeObserved),
      volumeModelled: finiteOrNull(r.volumeModelled),
      ...(r.bracketed !== undefined ? { bracketed: r.bracketed } : {}),
      ...(r.trials
        ? {
            trials: r.trials.map((t) => ({
              climateOffset: finiteOrNull(t.climateOffset),
              terminus: finiteOrNull(t.terminus),
              volume: finiteOrNull(t.volume),
              misfit: finiteOrNull(t.misfit),
              spinUpConverged: t.spinUpConverged,
            })),
          }
        : {}),
      committed: {
        warming: finiteOrNull(c.warming),
        lengthNow: finiteOrNull(c.lengthNow),
        volumeNow: finiteOrNull(c.volumeNow),
        lengthChange: finiteOrNull(c.lengthChange),
        volumeChange: finiteOrNull(c.volumeChange),
        yearsToSteady: finiteOrNull(c.yearsToSteady),
        converged: c.converged,
      },
      statements: [...r.statements],
    },
  };
}

function responseTimeSection(r: RunSummary['responseTime']): Pick<SummaryJson, 'responseTime'> {
  if (!r) return {};
  return {
    responseTime: {
      stepStart: finiteOrNull(r.stepStart),
      stepEnd: finiteOrNull(r.stepEnd),
      eFoldingYears: finiteOrNull(r.eFoldingYears),
      estimateYears: finiteOrNull(r.estimateYears),
      reachedSteadyState: r.reachedSteadyState,
    },
  };
}

export function summaryJson(input: SummaryInput): SummaryJson {
  const { run } = input;
  const b = run.massBudget;
  // Built in the order the keys should appear in the file.
  return {
    format: SUMMARY_FORMAT,
    version: SUMMARY_VERSION,
    firnlineVersion: input.firnlineVersion,
    scenarioName: input.scenarioName ?? null,
    massBudget: {
      initialVolume: finiteOrNull(b.initialVolume),
      finalVolume: finiteOrNull(b.finalVolume),
      appliedBalance: finiteOrNull(b.appliedBalance),
      outflow: finiteOrNull(b.outflow),
      frontalAblation: finiteOrNull(b.frontalAblation),
      residual: finiteOrNull(b.residual),
      relativeResidual: finiteOrNull(b.relativeResidual),
      grossAccumulation: finiteOrNull(b.grossAccumulation),
      clippedRoundOff: finiteOrNull(b.clippedRoundOff),
      solverResidual: finiteOrNull(b.solverResidual),
    },
    numerics: { ...run.numerics },
    ...spinupSection(input),
    ...startSection(run.start),
    steps: run.steps,
    smallestStep_yr: finiteOrNull(run.smallestStep),
    largestStep_yr: finiteOrNull(run.largestStep),
    endsInSteadyState: run.endsInSteadyState,
    ...responseTimeSection(run.responseTime),
    warnings: [...input.validatorWarnings.map(formatMessage), ...run.warnings],
    outputTimes_yr: input.outputTimes.map(finiteOrNull),
    units: SUMMARY_UNITS,
    caution: CAUTION_TEXT,
  };
}
