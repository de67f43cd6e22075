/**
 * The prepared flowline: the grid, the geometry sampled on it, the flow parameters in model
 * units, and the climate forcing as functions. Built from a scenario by createFlowlineModel, or
 * by hand in tests (e.g. a balance given as a function of x for an exact solution).
 *
 * Grid: N cells of size dx; cell i is centred at (i + 0.5) dx; face j sits at x = j dx, between
 * cells j-1 and j. Face 0 (the head) carries no flux; face N is the outflow boundary.
 */
import type { CrossSection } from './physics/shapeFactor';
import type { ValleySection } from './physics/valleySection';
import type { MassBalanceModel } from './physics/massBalance/massBalanceModel';

export interface FlowlineGrid {
  /** Number of cells N. */
  cellCount: number;
  /** Cell size dx [m]. */
  spacing: number;
  /** Cell-centre positions x [m]. */
  x: Float64Array;
  /** Bed elevation at cell centres [m a.s.l.]. */
  bed: Float64Array;
  /** Bed elevation half a cell beyond the domain end [m a.s.l.] (the ice-free ghost cell). */
  bedBeyondEnd: number;
  /** Glacier width at cell centres [m]; with a `section`, the valley-floor width. */
  widthAtCells: Float64Array;
  /** Glacier width at faces [m] (N + 1 values); with a `section`, the valley-floor width. */
  widthAtFaces: Float64Array;
  /**
   * A cross-section whose surface width and area follow the ice (physics/valleySection.ts);
   * absent: vertical walls at the fixed width (the unit-width and fixed-width forms).
   */
  section?: ValleySection;
}

export type ShapeFactorRule =
  | { kind: 'constant'; value: number }
  | { kind: 'cross-section'; crossSection: CrossSection };

export interface FlowParameters {
  /** Glen exponent n [-]. */
  n: number;
  /** Rate factor A [Pa^-n s^-1] (after enhancement). */
  rateFactorPerSecond: number;
  /** Rate factor A [Pa^-n a^-1], the unit used inside the flux kernel. */
  rateFactorPerYear: number;
  /** Ice density [kg m^-3]. */
  density: number;
  /** Gravitational acceleration [m s^-2]. */
  gravity: number;
  /** Sliding coefficient C [m a^-1 Pa^-m]; 0 = no sliding. */
  slidingCoefficient: number;
  /** Sliding exponent m [-]. */
  slidingExponent: number;
  shapeFactor: ShapeFactorRule;
}

/**
 * Surface balance in metres of ice per year at every cell, given the current surface elevation
 * [m a.s.l.], the warming dT [K] and the precipitation factor [-] (1: the scenario's own
 * precipitation). Writes into `out` (length N).
 */
export type BalanceField = (surface: Float64Array, warming: number, precipitationFactor: number, out: Float64Array) => void;

/** How the continuity equation is stepped in time (see stepper/). */
export type SchemeName = 'implicit' | 'explicit';

export interface Numerics {
  /** implicit: backward Euler with Newton (fast, default); explicit: forward Euler at its stability limit. */
  scheme: SchemeName;
  /** Longest time step [a]. */
  maxStepYears: number;
}

export const DEFAULT_NUMERICS: Numerics = { scheme: 'implicit', maxStepYears: 1 };

export interface FlowlineModel {
  grid: FlowlineGrid;
  numerics: Numerics;
  flow: FlowParameters;
  /** Balance in ice-equivalent m a^-1 (what changes the thickness). */
  iceBalance: BalanceField;
  /** Converts ice-equivalent m to m w.e. (rho_ice / rho_water). */
  iceToWaterEquivalent: number;
  /** Warming dT(t) [K] at model year t. */
  warmingAt: (year: number) => number;
  /** Factor on precipitation [-] at model year t from the forcing series (1 without one; model/climate.ts). */
  precipitationFactorAt: (year: number) => number;
  /** The climatic balance formulation, when the balance comes from one (for ELA and AAR). */
  massBalance?: MassBalanceModel;
  /** Initial ice thickness at cell centres [m]. */
  initialThickness: Float64Array;
  /**
   * Frontal ablation: c in u_c = c D_w [a^-1] (physics/frontalAblation.ts); absent or 0: none.
   */
  frontalAblationCoefficient?: number;
}
