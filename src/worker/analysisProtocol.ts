/**
 * Messages between the main thread and the analysis worker (committed change, steady-state
 * sensitivity curve, terminus calibration, fit of a parameter to the observations, the bed from the surface).
 * One job at a time; a new 'start' replaces the job
 * under way. Typed both ways, like protocol.ts, so a change on one side breaks the other's build.
 */
import type { BedFromSurface } from '../model/analysis/bedFromSurface';
import type { CalibrationResult } from '../model/analysis/calibrateTerminus';
import type { ObservationKind, ParameterCalibration } from '../model/analysis/calibrationTypes';
import type { CommittedChange } from '../model/analysis/committedChange';
import type { SteadyPoint } from '../model/analysis/sensitivityCurve';
import type { AnalysisProgress } from '../model/analysis/stepwise';
import type { ValidScenario } from '../scenario/validateScenario';

export type AnalysisKind = 'committed' | 'sensitivity' | 'calibration' | 'fit' | 'inversion';

export type AnalysisRequest =
  /** Hold the warming of model year `year` from the glacier `thickness` [m] of that year. */
  | { kind: 'committed'; scenario: ValidScenario; year: number; thickness: Float64Array }
  /** Held warmings from `from` to `to` [K] in steps of `step` [K], up and back down. */
  | { kind: 'sensitivity'; scenario: ValidScenario; from: number; to: number; step: number }
  /** Observed terminus and accepted mismatch [m]. */
  | { kind: 'calibration'; scenario: ValidScenario; observedTerminus: number; tolerance: number }
  /** Fit the number at `pointer` to the scenario's observation `observation` (calibrateParameter). */
  | { kind: 'fit'; scenario: ValidScenario; pointer: string; observation: ObservationKind }
  /** The bed from the scenario's surface and observed terminus; smoothing [m]; A fitted to the radar points or not. */
  | { kind: 'inversion'; scenario: ValidScenario; smoothingMetres: number; fitRateFactor: boolean };

/** What every result carries about the flowline, for charts and messages. */
export interface FlowlineFacts {
  /** Domain length [m]. */
  domainLength: number;
  /** Grid spacing [m]. */
  spacing: number;
}

export type AnalysisResult =
  | ({ kind: 'committed'; committed: CommittedChange } & FlowlineFacts)
  | ({ kind: 'sensitivity'; points: SteadyPoint[]; from: number; to: number; step: number } & FlowlineFacts)
  | ({ kind: 'calibration'; calibration: CalibrationResult; observedTerminus: number; tolerance: number } & FlowlineFacts)
  | ({ kind: 'fit'; fit: ParameterCalibration } & FlowlineFacts)
  | ({ kind: 'inversion'; bed: BedFromSurface } & FlowlineFacts);

export type ToAnalysisWorker = { type: 'start'; jobId: number; request: AnalysisRequest } | { type: 'cancel'; jobId: number };

export type FromAnalysisWorker =
  | { type: 'progress'; jobId: number; progress: AnalysisProgress }
  | { type: 'result'; jobId: number; result: AnalysisResult }
  | { type: 'cancelled'; jobId: number }
  /** `year`/`position` locate a numerical failure. */
  | { type: 'failed'; jobId: number; message: string; year?: number; position?: number };
