/**
 * lakes.json, written beside summary.json by `firnline run`: for every output year, the lakes
 * that would stand in overdeepenings the ice has left (model/analysis/exposedLakes.ts), with the
 * lake caution. Non-finite numbers become null, as in summary.json.
 */
import { exposedLakesOverTime } from '../model/analysis/exposedLakes';
import type { RunReport } from '../model/runScenario';
import { LAKE_CAUTION_TEXT } from './caution';
import { finiteOrNull } from './summaryJson';

export const LAKES_FORMAT = 'firnline-lakes';
export const LAKES_VERSION = 1;

export const LAKES_UNITS = {
  t_yr: 'a (model years)',
  'start_m, end_m, length_m, deepestAt_m': 'm along the flowline from the head of the valley',
  waterLevel_m: 'm a.s.l.; the lip that holds the water',
  maxDepth_m: 'm',
  volume_m3: 'm^3 (m^3 per m of width when the scenario gives no width)',
} as const;

export const LAKES_METHOD =
  'Depression filling on the bed profile: water at a cell stands no higher than the lower of the highest beds up-valley and ' +
  'down-valley of it; a lake is a run of ice-free cells (thinner than 1 m) more than 0.01 m below that level. ' +
  'Geometry only: no water budget, ice dam, sediment or breach.';

type JsonNumber = number | null;

export interface LakeJson {
  start_m: JsonNumber;
  end_m: JsonNumber;
  length_m: JsonNumber;
  waterLevel_m: JsonNumber;
  maxDepth_m: JsonNumber;
  deepestAt_m: JsonNumber;
  volume_m3: JsonNumber;
  /** The depression continues under the ice. */
  touchesIce: boolean;
}

export interface LakesJson {
  format: typeof LAKES_FORMAT;
  version: typeof LAKES_VERSION;
  firnlineVersion: string;
  scenarioName: string | null;
  method: string;
  units: typeof LAKES_UNITS;
  outputs: { t_yr: JsonNumber; lakes: LakeJson[] }[];
  caution: string;
}

export function lakesJson(report: RunReport, firnlineVersion: string, scenarioName: string | undefined): LakesJson {
  return {
    format: LAKES_FORMAT,
    version: LAKES_VERSION,
    firnlineVersion,
    scenarioName: scenarioName ?? null,
    method: LAKES_METHOD,
    units: LAKES_UNITS,
    outputs: exposedLakesOverTime(report.model.grid, report.frames).map(({ time, lakes }) => ({
      t_yr: finiteOrNull(time),
      lakes: lakes.map((l) => ({
        start_m: finiteOrNull(l.start),
        end_m: finiteOrNull(l.end),
        length_m: finiteOrNull(l.length),
        waterLevel_m: finiteOrNull(l.waterLevel),
        maxDepth_m: finiteOrNull(l.maxDepth),
        deepestAt_m: finiteOrNull(l.deepestAt),
        volume_m3: finiteOrNull(l.volume),
        touchesIce: l.touchesIce,
      })),
    })),
    caution: LAKE_CAUTION_TEXT,
  };
}
