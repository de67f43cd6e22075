/**
 * Hard limits (errors) and soft limits (warnings) of the scenario format, kept in one place so
 * that the schema, the warnings and docs/scenario-format.md agree. Units as in the format.
 *
 * Hard limits reject input that is meaningless or that the model cannot run in reasonable time
 * and memory; soft limits flag input that is valid but physically odd.
 */
export const SCENARIO_LIMITS = {
  /** Longest scenario name [characters]. */
  nameMaxLength: 200,

  /** Longest domain [m]; 1000 km is longer than any valley glacier. */
  gridLengthMax: 1_000_000,
  /** Smallest cell spacing [m]; below 1 m the shallow-ice approximation has no meaning. */
  spacingMin: 1,
  /** Cell count bounds; 100,000 keeps a run within a browser tab's memory and time. */
  cellsMin: 2,
  cellsMax: 100_000,
  /** length / spacing must be whole within this relative tolerance (decimal spacings like 0.1 km). */
  cellsWholeTolerance: 1e-9,
  /** Fewer cells than this resolve a glacier poorly (warning). */
  cellsWarnBelow: 10,

  /** Most points in any point list. */
  pointsMax: 10_000,
  /** Point positions along the flowline [m]; 10,000 km, far beyond any domain. */
  positionAbsMax: 10_000_000,
  /** Warming times [a]; ten times the longest run. */
  yearAbsMax: 1_000_000,

  /** Bed elevation [m a.s.l.]: deeper than any overdeepening, higher than any summit. */
  bedMin: -1000,
  bedMax: 9000,
  /** Other elevations (surface, ELA, tables, reference) [m a.s.l.]: the bed range plus 1 km of ice. */
  elevationMin: -1000,
  elevationMax: 10_000,

  /** Glacier width [m]. */
  widthMax: 100_000,
  /** Valley-section widening at 100 m of ice [m]: a flank slope of 1 in 2000 is flatter than any valley side. */
  sectionWideningMax: 100_000,
  /** Largest width ratio within the domain before a warning. */
  widthRatioWarnAbove: 20,

  /** Glen's exponent n [-]; n = 1 (linear viscous) to 5 covers every value in use. */
  nMin: 1,
  nMax: 5,
  /** Stress at which A and C are judged [Pa]: 100 kPa, a typical basal shear stress. */
  referenceStress: 100_000,
  /**
   * Hard limit on the strain rate A * (100 kPa)^n [s^-1]. For n = 3 this is A <= 1e-20.
   * A ceiling on A alone would depend on n, because A's unit is Pa^-n s^-1.
   */
  strainRateMax: 1e-5,
  /** Usual strain rates at 100 kPa [s^-1]; for n = 3, A from 1e-26 to 1e-22 Pa^-3 s^-1 (warning). */
  strainRateWarnMin: 1e-11,
  strainRateWarnMax: 1e-7,
  /** Ice temperature relative to pressure melting [deg C]. */
  temperatureMin: -60,
  temperatureMax: 0,
  /** Enhancement factor [-]. */
  enhancementMax: 100,
  enhancementWarnAbove: 10,
  /** Ice density [kg m^-3]: 800 (firn near pore close-off) to 1000 (water); warn outside 830..917. */
  densityMin: 800,
  densityMax: 1000,
  densityWarnMin: 830,
  densityWarnMax: 917,

  /** Sliding exponent m [-]. */
  slidingExponentMin: 1,
  slidingExponentMax: 10,
  /** Hard limit on the sliding speed at 100 kPa [m a^-1]; C's unit m a^-1 Pa^-m depends on m. */
  slidingSpeedMax: 1_000_000,
  /** Sliding speeds at 100 kPa outside this range give a warning [m a^-1]. */
  slidingSpeedWarnMin: 0.01,
  slidingSpeedWarnMax: 10_000,

  /** Balance gradients [(m w.e. a^-1) m^-1]. */
  gradientMax: 0.1,
  /** Mass-balance rates [m w.e. a^-1]. */
  balanceAbsMax: 100,
  maxAccumulationMax: 20,
  /** ELA shift per kelvin [m K^-1]. */
  elaSensitivityMax: 1000,
  /** Precipitation change per kelvin [% K^-1]: Clausius–Clapeyron gives about +7; -20 to +30 is generous. */
  precipitationPerKMin: -20,
  precipitationPerKMax: 30,
  /** Largest precipitation factor in a forcing series [-]. */
  precipitationFactorMax: 10,
  /** Year-to-year weather: temperature [K] and precipitation [-] standard deviations, largest seed. */
  temperatureSdMax: 5,
  precipitationSdMax: 0.5,
  seedMax: 4_294_967_295,
  /** Debris thickness [m]: the thickest covers on valley glaciers are a few metres. */
  debrisThicknessMax: 10,
  /** Calving water-depth coefficient [a^-1]: tidewater about 27 (Brown et al. 1982); 100 is generous. */
  frontalAblationCoefficientMax: 100,
  /** Warming [K]. */
  warmingAbsMax: 50,

  /** Degree-day model. */
  airTemperatureMin: -60,
  airTemperatureMax: 40,
  amplitudeMax: 40,
  lapseRateMax: 0.015,
  precipitationMax: 20,
  precipitationGradientAbsMax: 0.005,
  snowThresholdAbsMax: 10,
  degreeDayFactorMax: 50,
  /** Spread of air temperature about the annual cycle [K]. */
  dailyTemperatureSdMax: 10,

  /** Run length [a] and number of output intervals. */
  yearsMax: 100_000,
  outputsMax: 100_000,

  /** Observations (the `observations` key). Positions must also lie in the domain [0, grid.length]. */
  /** Observed ice thickness and its uncertainty [m]: the thickest ice measured anywhere is under 5 km. */
  observedThicknessMax: 5000,
  /** Observed surface speed and its uncertainty [m a^-1]: far above the fastest glacier flow known (some km a^-1). */
  observedSpeedMax: 100_000,
  /** Observed surface elevation change [m a^-1]: far beyond the fastest thinning or thickening known. */
  elevationChangeAbsMax: 100,
} as const;
