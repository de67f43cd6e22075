/**
 * STUB, only so that the command line type-checks until the real inversion lands: the exact
 * contract of src/model/inversion/invertBed.ts, whose bodies throw. Replace this whole file with
 * the real module.
 */
import type { Scenario } from '../scenario';
/** A scenario that may leave out the bed (the inversion's input). */
export type InversionScenario = Omit<Scenario, 'bed'> & { bed?: Scenario['bed'] };
export interface InversionOptions { smoothingMetres?: number }
export interface InversionResult {
  x: Float64Array;            // cell centres [m]
  surface: Float64Array;      // observed surface [m a.s.l.]
  thickness: Float64Array;    // [m], 0 beyond the terminus
  bed: Float64Array;          // surface - thickness [m a.s.l.]
  flux: Float64Array;         // volume flux through the cell [m^3 a^-1]
  slope: Float64Array;        // smoothed surface slope used, |ds/dx| [-]
  thicknessLow: Float64Array; // band [m]
  thicknessHigh: Float64Array;// band [m]
  terminus: number;           // [m]
  rateFactorMultiplier: number;           // 1 when not fitted
  rateFactorMultiplierRange?: [number, number]; // when fitted to radar points
  misfit?: { count: number; rmsMetres: number; biasMetres: number; weightedRms: number };
  statements: string[];       // assumptions stated in the output, e.g. the steady-state shift
}
export function invertBed(_scenario: InversionScenario, _options?: InversionOptions): InversionResult {
  throw new Error('not yet');
}
/** The complete scenario with the inverted bed, the observed surface as initial surface, any fitted A in place. */
export function invertedScenario(_scenario: InversionScenario, _result: InversionResult): Scenario {
  throw new Error('not yet');
}
