/**
 * Files of the calibration and of the analyses on the command line: calibration.json, and the
 * committed change and sensitivity curve as CSV (same conventions as csvWriters.ts: 7 significant
 * figures for model values, 10 for times, volumes unrounded, empty fields for what does not exist)
 * with a small JSON of their numbers. Each JSON carries the caution and the version.
 */
import type { JointCalibration } from '../model/analysis/calibrateJoint';
import type { ParameterCalibration } from '../model/analysis/calibrationTypes';
import { OBSERVATION_POINTER } from '../model/analysis/calibrationTypes';
import type { CommittedChange } from '../model/analysis/committedChange';
import type { SteadyPoint } from '../model/analysis/sensitivityCurve';
import type { Scenario } from '../model/scenario';
import { CAUTION_TEXT } from './caution';
import { COORDINATE_DIGITS, csvNumber, FIELD_DIGITS } from './csvWriters';

const field = (v: number) => csvNumber(v, FIELD_DIGITS);
const time = (v: number) => csvNumber(v, COORDINATE_DIGITS);

/** The observations the fit used, as they are in the scenario. */
function observationsUsed(scenario: Scenario, calibration: ParameterCalibration): unknown {
  const obs = scenario.observations ?? {};
  switch (calibration.observation) {
    case 'surfaceSpeed':
      return { year: obs.year ?? 0, surfaceSpeed: obs.surfaceSpeed };
    case 'thickness':
      return { terminus: obs.terminus, thickness: obs.thickness, ...(obs.elevationChange ? { elevationChange: obs.elevationChange } : {}) };
    case 'terminus':
    case 'terminusRecord':
      return { terminus: obs.terminus };
    case 'geodeticBalance':
      return { geodeticBalance: obs.geodeticBalance };
  }
}

export function calibrationJson(scenario: Scenario, calibration: ParameterCalibration, firnlineVersion: string): object {
  const { pointer, unit, before, value, range, sensitivity, misfitBefore, misfitAfter, runs, method, statements, observation } = calibration;
  return {
    format: 'firnline-calibration',
    version: 1,
    firnlineVersion,
    caution: CAUTION_TEXT,
    scenarioName: scenario.name ?? null,
    parameter: {
      pointer,
      unit,
      before,
      value,
      ...(range ? { range } : {}),
      ...(sensitivity ? { sensitivity } : {}),
    },
    observation: { kind: observation, pointer: OBSERVATION_POINTER[observation], count: misfitAfter.count },
    observationsUsed: observationsUsed(scenario, calibration),
    method,
    misfit: { before: misfitBefore, after: misfitAfter },
    runs,
    statements,
  };
}

/**
 * calibration.json of a joint fit of two parameters: `parameters` (both, with one-sigma ranges),
 * `correlation`, one `observations` entry per kind, misfits before and after per kind.
 */
export function jointCalibrationJson(scenario: Scenario, calibration: JointCalibration, firnlineVersion: string): object {
  const obs = scenario.observations ?? {};
  const used: Record<string, unknown> = {};
  for (const kind of calibration.observations) {
    if (kind === 'surfaceSpeed') Object.assign(used, { year: obs.year ?? 0, surfaceSpeed: obs.surfaceSpeed });
    else if (kind === 'terminus' || kind === 'terminusRecord') Object.assign(used, { ...(obs.year !== undefined ? { year: obs.year } : {}), terminus: obs.terminus });
    else if (kind === 'geodeticBalance') Object.assign(used, { geodeticBalance: obs.geodeticBalance });
  }
  return {
    format: 'firnline-calibration',
    version: 1,
    firnlineVersion,
    caution: CAUTION_TEXT,
    scenarioName: scenario.name ?? null,
    parameters: calibration.parameters,
    correlation: calibration.correlation,
    observations: calibration.observations.map((kind) => ({ kind, pointer: OBSERVATION_POINTER[kind], count: calibration.misfitAfter[kind]?.count ?? 0 })),
    observationsUsed: used,
    method: calibration.method,
    misfit: { before: calibration.misfitBefore, after: calibration.misfitAfter },
    runs: calibration.runs,
    statements: calibration.statements,
  };
}

export const COMMITTED_HEADER = ['t_yr', 'phase', 'length_m', 'volume_m3'] as const;

/** The run so far (phase "run", the output frames up to the year held from) and the held run ("held"). */
export function committedCsv(runSoFar: readonly { time: number; length: number; volume: number }[], result: CommittedChange): string {
  const lines = [COMMITTED_HEADER.join(',')];
  for (const f of runSoFar) lines.push([time(f.time), 'run', field(f.length), csvNumber(f.volume)].join(','));
  for (const p of result.path) lines.push([time(p.year), 'held', field(p.length), csvNumber(p.volume)].join(','));
  return lines.join('\n') + '\n';
}

export function committedJson(scenario: Scenario, result: CommittedChange, firnlineVersion: string): object {
  const { path: _path, ...numbers } = result;
  return { format: 'firnline-committed-change', version: 1, firnlineVersion, caution: CAUTION_TEXT, scenarioName: scenario.name ?? null, ...numbers };
}

export const SENSITIVITY_HEADER = ['warming_K', 'branch', 'terminus_m', 'length_m', 'volume_m3', 'years_to_steady', 'converged'] as const;

export function sensitivityCsv(points: readonly SteadyPoint[]): string {
  const lines = [SENSITIVITY_HEADER.join(',')];
  for (const p of points) {
    lines.push([time(p.warming), p.branch, field(p.terminus), field(p.length), csvNumber(p.volume), time(p.years), p.converged ? '1' : '0'].join(','));
  }
  return lines.join('\n') + '\n';
}
