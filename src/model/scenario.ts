/**
 * The scenario: everything needed to run one flowline experiment. This is the single type shared
 * by the browser, the worker, the command line and the tests; src/scenario/validateScenario.ts is the
 * single validator that produces it from untrusted JSON. Units as the file format states:
 * metres, years (1 a = 365.25 d), pascals, degrees C.
 */
import type { Point } from './piecewiseLinear';
import type { CrossSection } from './physics/shapeFactor';
import type { SectionShape } from './physics/valleySection';

export type { Point, CrossSection, SectionShape };

export const SCENARIO_FORMAT = 'firnline-scenario';
export const SCENARIO_VERSION = 1;

export interface GridSpec {
  /** Length of the flowline domain [m]; x = 0 is the head of the valley. */
  length: number;
  /** Cell size [m]; length / spacing must be a whole number. */
  spacing: number;
}

export interface IceSpec {
  /** Glen's flow-law exponent n [-]. */
  n: number;
  /** Rate factor A [Pa^-n s^-1]; exactly one of A and temperature is given. */
  A?: number;
  /** Ice temperature relative to pressure melting [deg C, <= 0], for A from the Arrhenius relation. */
  temperature?: number;
  /** Enhancement factor E [-] multiplying A from temperature (default 1). */
  enhancement?: number;
  /** Ice density [kg m^-3] (default 910). */
  density?: number;
}

export interface SlidingSpec {
  /** Sliding coefficient C [m a^-1 Pa^-m]; 0 disables sliding. */
  C: number;
  /** Sliding exponent m [-]. */
  m: number;
}

export interface LinearBalanceSpec {
  model: 'linear';
  /** Equilibrium-line altitude at zero warming [m a.s.l.]. */
  ela: number;
  /** Balance gradient below the ELA [(m w.e. a^-1) m^-1]. */
  ablationGradient: number;
  /** Balance gradient above the ELA [(m w.e. a^-1) m^-1]; default: ablationGradient. */
  accumulationGradient?: number;
  /** Cap on accumulation [m w.e. a^-1]; default: none. */
  maxAccumulation?: number;
  /** ELA rise per kelvin of warming [m K^-1]; default 100. */
  elaSensitivity?: number;
  /** Precipitation change per kelvin of warming [% K^-1], compounded; scales accumulation; default 0. */
  precipitationPerK?: number;
}

export interface TableBalanceSpec {
  model: 'table';
  /** [elevation m a.s.l., balance m w.e. a^-1], elevation strictly increasing. */
  points: Point[];
  /** Upward shift of the table per kelvin of warming [m K^-1]; default 100. */
  elaSensitivity?: number;
  /** Precipitation change per kelvin of warming [% K^-1], compounded; scales accumulation; default 0. */
  precipitationPerK?: number;
}

export interface DegreeDayBalanceSpec {
  model: 'degree-day';
  /** Elevation at which meanTemperature and precipitation apply [m a.s.l.]. */
  referenceElevation: number;
  /** Annual mean air temperature at the reference elevation [deg C]. */
  meanTemperature: number;
  /** Half the range of the annual temperature cycle [K]. */
  amplitude: number;
  /** Decrease of temperature with height [K m^-1]. */
  lapseRate: number;
  /** Annual precipitation at the reference elevation [m w.e. a^-1]. */
  precipitation: number;
  /** Relative increase of precipitation with height [fraction per m]. */
  precipitationGradient: number;
  /** Air temperature below which precipitation falls as snow [deg C]. */
  snowThreshold: number;
  /** Degree-day factor for snow [mm w.e. K^-1 d^-1]. */
  ddfSnow: number;
  /** Degree-day factor for ice [mm w.e. K^-1 d^-1]. */
  ddfIce: number;
  /** Standard deviation of air temperature about the annual cycle [K] (Calov & Greve 2005); default 0. */
  dailyTemperatureSd?: number;
  /** Share of snow melt and rain that refreezes in the snowpack [-], at most 0.6 of the snowfall; default 0. */
  refreezingFraction?: number;
  /** Precipitation change per kelvin of warming [% K^-1], compounded; scales precipitation; default 0. */
  precipitationPerK?: number;
}

export type MassBalanceSpec = LinearBalanceSpec | TableBalanceSpec | DegreeDayBalanceSpec;

/** One year of a forcing series: [year a, warming K, precipitation factor -]. */
export type ForcingRow = [year: number, warming: number, precipitationFactor: number];

/** Year-to-year weather on top of the climate (model/random/weather.ts). */
export interface VariabilitySpec {
  /** Standard deviation of the annual temperature anomaly [K]. */
  temperatureSd: number;
  /** Standard deviation of the annual precipitation factor [-] (fraction of the mean). */
  precipitationSd: number;
  /** Seed of the generator: a whole number; the same seed gives the same weather everywhere. */
  seed: number;
  /** Lag-one autocorrelation of the anomalies [-], 0 <= ar1 < 1; default 0 (white noise). */
  ar1?: number;
}

export type ShapeFactorSpec = number | { crossSection: CrossSection };

/**
 * A valley cross-section that follows the ice (physics/valleySection.ts): with it, `width` is the
 * valley-floor width and the surface width and section area grow with the ice thickness.
 */
export interface SectionSpec {
  /** "rectangular" (vertical walls), "trapezoidal" (straight flanks) or "parabolic" (a U). */
  shape: SectionShape;
  /** Surface width at 100 m of ice minus the floor width [m]; required unless rectangular. */
  widening?: number;
}

export interface RunSpec {
  /** Length of the run [a]. */
  years: number;
  /** Interval between output times [a]. */
  outputEvery: number;
}

export interface NumericsSpec {
  /** "implicit" (default, fast) or "explicit" (forward Euler at its stability limit, the reference). */
  scheme?: 'implicit' | 'explicit';
  /** Longest time step [a] (default 1, the most either scheme takes). */
  maxStepYears?: number;
}

/** A measurement with its one-sigma uncertainty: [x m, value, uncertainty] (units by key). */
export type ObservedPoint = [x: number, value: number, uncertainty: number];

/**
 * What was measured on the glacier (all optional). Positions are metres down-valley on the
 * scenario's flowline; `year` is the model year the single-time observations describe.
 */
export interface Observations {
  /** Model year of the thickness, speed and terminus observations [a]; absent: year 0. */
  year?: number;
  /** Terminus position [m], or a record [year a, x m] in time order. */
  terminus?: number | Point[];
  /** Radar or borehole ice thickness [x m, thickness m, uncertainty m]. */
  thickness?: ObservedPoint[];
  /** Surface speed [x m, speed m a^-1, uncertainty m a^-1]. */
  surfaceSpeed?: ObservedPoint[];
  /** Surface elevation change [x m, m a^-1] over the years `from` to `to`. */
  elevationChange?: { from: number; to: number; points: Point[] };
  /** Glacier-wide geodetic mass balance [m w.e. a^-1] over the years `from` to `to`. */
  geodeticBalance?: { from: number; to: number; value: number };
}

/**
 * Start from the glacier as it is today (see todayStart.ts): the run begins at year 0, the
 * observation year, instead of from a steady state. "observed": from the scenario's surface over
 * its bed as given (e.g. the bed `firnline invert` wrote). "transient": from a steady state under
 * an earlier climate, dT(startYear) + climateOffset, carried through the warming history from
 * startYear to year 0; climateOffset absent: fitted so that the terminus and volume at year 0
 * match the observed terminus and the observed glacier (surface minus bed).
 */
export type StartSpec =
  | { from: 'observed' }
  | {
      from: 'transient';
      /** Model year the history starts [a], before year 0. */
      startYear: number;
      /** Added to dT(startYear) during the spin-up [K]; absent: fitted. */
      climateOffset?: number;
    };

/**
 * Frontal ablation into a lake at the ice front (physics/frontalAblation.ts): calving rate
 * u_c = waterDepthCoefficient * D_w [m a^-1], D_w the water depth at the front [m].
 */
export type FrontalAblationSpec = {
  /** c [a^-1]: about 27 for tidewater (Brown et al. 1982), an order smaller in fresh water. */
  waterDepthCoefficient: number;
};

/**
 * A type alias rather than an interface so that a scenario is also a JSON object
 * (Record<string, unknown>), as the experiment file's base is, without a cast. A scenario that
 * has been through the one validator is a ValidScenario (src/scenario/validateScenario.ts).
 */
export type Scenario = {
  format: typeof SCENARIO_FORMAT;
  version: typeof SCENARIO_VERSION;
  name?: string;
  grid: GridSpec;
  /** Bed elevation [x m, z m a.s.l.]. */
  bed: Point[];
  /** Glacier width [x m, width m]; absent: 1 m everywhere (unit-width flowline). */
  width?: Point[];
  shapeFactor?: ShapeFactorSpec;
  /** Cross-section of the valley; needs `width` (the floor); absent: vertical walls at `width`. */
  section?: SectionSpec;
  /**
   * Debris cover [x m, thickness m], piecewise linear, constant beyond the ends; reduces ablation
   * (physics/massBalance/debrisCover.ts). Absent: bare ice.
   */
  debris?: Point[];
  /** Calving into a lake at the ice front; absent: none. */
  frontalAblation?: FrontalAblationSpec;
  /** Initial ice surface [x m, z m a.s.l.], clipped to the bed; absent: ice-free. */
  surface?: Point[];
  ice: IceSpec;
  sliding?: SlidingSpec;
  massBalance: MassBalanceSpec;
  /** Warming dT(t) [year a, K], piecewise linear, constant beyond the ends. */
  warming?: Point[];
  /**
   * Climate forcing [year a, warming K, precipitation factor -], years strictly increasing,
   * piecewise linear, constant beyond the ends; replaces `warming` (never both; model/climate.ts).
   */
  forcing?: ForcingRow[];
  /** Year-to-year weather: seeded random anomalies of temperature and precipitation. */
  variability?: VariabilitySpec;
  /** Reach a steady state under the year-0 climate before year 0. */
  spinup?: boolean;
  /** Start from the glacier as it is today (year 0 = the observation year) instead of steady. */
  start?: StartSpec;
  run: RunSpec;
  /** Time-stepping choices; absent: implicit with steps of at most 1 a. */
  numerics?: NumericsSpec;
  /** Measurements on the glacier, for the bed inversion and calibration. */
  observations?: Observations;
};
