/**
 * Builds the prepared flowline from a validated scenario: samples bed, width and initial surface
 * on the grid, converts parameters to model units and fills in the documented defaults.
 */
import { DEFAULT_NUMERICS, type FlowlineModel, type FlowParameters, type ShapeFactorRule } from './flowlineModel';
import { createMassBalance } from './physics/massBalance/createMassBalance';
import { debrisMeltFactor } from './physics/massBalance/debrisCover';
import { rateFactorFromTemperature } from './physics/rateFactor';
import { piecewiseLinear } from './piecewiseLinear';
import type { Scenario } from './scenario';
import { DEFAULT_ICE_DENSITY, GRAVITY, perSecondToPerYear, WATER_DENSITY } from './units';
import { climateSeries } from './climate';

export function createFlowlineModel(scenario: Scenario): FlowlineModel {
  const { length, spacing } = scenario.grid;
  const cellCount = Math.round(length / spacing);
  const bedAt = piecewiseLinear(scenario.bed);
  const widthAt = scenario.width ? piecewiseLinear(scenario.width) : () => 1;
  const x = new Float64Array(cellCount);
  const bed = new Float64Array(cellCount);
  const widthAtCells = new Float64Array(cellCount);
  const widthAtFaces = new Float64Array(cellCount + 1);
  const initialThickness = new Float64Array(cellCount);
  // Factor on ablation per cell from the debris cover (1: bare ice).
  const debrisAt = scenario.debris ? piecewiseLinear(scenario.debris) : undefined;
  const ablationFactor = new Float64Array(cellCount).fill(1);
  const surfaceAt = scenario.surface ? piecewiseLinear(scenario.surface) : undefined;
  for (let i = 0; i < cellCount; i++) {
    x[i] = (i + 0.5) * spacing;
    bed[i] = bedAt(x[i]);
    widthAtCells[i] = widthAt(x[i]);
    if (debrisAt) ablationFactor[i] = debrisMeltFactor(debrisAt(x[i]));
    // The surface sketch is clipped to the bed: ice thickness is never negative.
    initialThickness[i] = surfaceAt ? Math.max(0, surfaceAt(x[i]) - bed[i]) : 0;
  }
  for (let j = 0; j <= cellCount; j++) widthAtFaces[j] = widthAt(j * spacing);

  const flow = flowParameters(scenario);
  const massBalance = createMassBalance(scenario.massBalance);
  const waterToIce = WATER_DENSITY / flow.density;
  const climate = climateSeries(scenario);
  return {
    grid: {
      cellCount,
      spacing,
      x,
      bed,
      bedBeyondEnd: bedAt(length + 0.5 * spacing),
      widthAtCells,
      widthAtFaces,
      ...(scenario.section ? { section: { shape: scenario.section.shape, widening: scenario.section.widening ?? 0 } } : {}),
    },
    flow,
    numerics: {
      scheme: scenario.numerics?.scheme ?? DEFAULT_NUMERICS.scheme,
      maxStepYears: scenario.numerics?.maxStepYears ?? DEFAULT_NUMERICS.maxStepYears,
    },
    iceBalance(surface, warming, precipitationFactor, out) {
      for (let i = 0; i < surface.length; i++) {
        const b = massBalance.balanceAt(surface[i], warming, precipitationFactor);
        // Debris reduces ablation only (physics/massBalance/debrisCover.ts).
        out[i] = waterToIce * (b < 0 ? b * ablationFactor[i] : b);
      }
    },
    iceToWaterEquivalent: 1 / waterToIce,
    warmingAt: climate.warmingAt,
    precipitationFactorAt: climate.precipitationFactorAt,
    massBalance,
    initialThickness,
    frontalAblationCoefficient: scenario.frontalAblation?.waterDepthCoefficient ?? 0,
  };
}

function flowParameters(scenario: Scenario): FlowParameters {
  const ice = scenario.ice;
  const rateFactorPerSecond =
    ice.A !== undefined ? ice.A : rateFactorFromTemperature(ice.temperature ?? 0, ice.enhancement ?? 1);
  return {
    n: ice.n,
    rateFactorPerSecond,
    rateFactorPerYear: perSecondToPerYear(rateFactorPerSecond),
    density: ice.density ?? DEFAULT_ICE_DENSITY,
    gravity: GRAVITY,
    slidingCoefficient: scenario.sliding?.C ?? 0,
    slidingExponent: scenario.sliding?.m ?? 3,
    shapeFactor: shapeFactorRule(scenario.shapeFactor),
  };
}

function shapeFactorRule(spec: Scenario['shapeFactor']): ShapeFactorRule {
  if (spec === undefined) return { kind: 'constant', value: 1 };
  if (typeof spec === 'number') return { kind: 'constant', value: spec };
  return { kind: 'cross-section', crossSection: spec.crossSection };
}
