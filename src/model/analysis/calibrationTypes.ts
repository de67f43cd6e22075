/**
 * What a calibration reports, and its two refusals. See calibrateParameter.ts for the methods.
 */
import type { Scenario } from '../scenario';

/** The observation a fit uses (a key of Observations; the terminus record is its own kind). */
export type ObservationKind = 'surfaceSpeed' | 'thickness' | 'terminus' | 'terminusRecord' | 'geodeticBalance';

/** Where each kind lives in the scenario file. */
export const OBSERVATION_POINTER: Record<ObservationKind, string> = {
  surfaceSpeed: '/observations/surfaceSpeed',
  thickness: '/observations/thickness',
  terminus: '/observations/terminus',
  terminusRecord: '/observations/terminus',
  geodeticBalance: '/observations/geodeticBalance',
};

export interface Misfit {
  /** Observations compared. */
  count: number;
  /** Root mean square of modelled minus observed, in `unit`. */
  rms: number;
  /** Mean of modelled minus observed, in `unit`. */
  bias: number;
  unit: string;
  /** sum((modelled - observed) / sigma)^2, when the observations state uncertainties. */
  chiSquare?: number;
}

/**
 * The observations and the model's values at them, before and after the fit, for a chart: at
 * positions x [m] (speeds, thickness), at years [a] (terminus record), or one value (a terminus,
 * the geodetic balance) at the observation year or the middle of its period.
 */
export interface ObservedAndModelled {
  /** What the abscissa is: "x" [m] or "year" [a]. */
  along: 'x' | 'year';
  /** Unit of the values. */
  unit: string;
  at: number[];
  observed: number[];
  /** One-sigma uncertainties, when the observations state them. */
  uncertainty?: number[];
  before: number[];
  after: number[];
}

export interface ParameterCalibration {
  /** The JSON Pointer calibrated. */
  pointer: string;
  /** Unit of the parameter. */
  unit: string;
  observation: ObservationKind;
  /** The method and its published source, in words. */
  method: string;
  /** The parameter before and after. */
  before: number;
  value: number;
  /** One-sigma range (Delta chi^2), the band of values matching within the grid, or the final bracket. */
  range?: { low: number; high: number; kind: 'delta-chi-square' | 'match-band' | 'bracket' };
  /** d(observable)/d(parameter) at the answer, where no uncertainty is stated (sigma_p = sigma_obs / |slope|). */
  sensitivity?: { value: number; unit: string };
  misfitBefore: Misfit;
  misfitAfter: Misfit;
  /** Observed against modelled, before and after. */
  comparison: ObservedAndModelled;
  /** Model evaluations: what one is, and how many were used. */
  runs: { kind: string; count: number };
  /** Assumptions and choices, in words, for the output. */
  statements: string[];
  /** The scenario with the fitted value in place. */
  scenario: Scenario;
}

/** The pointer names no number, or no observation in the scenario constrains it (exit 2 on the command line). */
export class CalibrationRefusal extends Error {
  constructor(
    readonly pointer: string,
    message: string,
    /** The observation that would be needed, as a pointer into the scenario. */
    readonly needed?: string,
  ) {
    super(message);
    this.name = 'CalibrationRefusal';
  }
}

/** The search found no bracket of the answer (exit 3 on the command line); the message says what was tried. */
export class CalibrationNotBracketed extends Error {
  constructor(
    readonly pointer: string,
    message: string,
    readonly tried: { parameter: number; misfit: number }[],
  ) {
    super(message);
    this.name = 'CalibrationNotBracketed';
  }
}
