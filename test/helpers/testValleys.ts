/**
 * Invented test valleys and balance settings that several tests share: a straight 12 km valley
 * narrowing from 800 to 300 m under a linear balance, and a degree-day balance of a temperate
 * valley glacier (values of the usual order, common practice, no single source).
 */
import type { RunSpec, Scenario } from '../../src/model/scenario';

export function straightValley(name: string, run: RunSpec): Scenario {
  return {
    format: 'firnline-scenario',
    version: 1,
    name,
    grid: { length: 12000, spacing: 100 },
    bed: [[0, 3100], [12000, 1900]],
    width: [[0, 800], [12000, 300]],
    ice: { n: 3, A: 2.4e-24 },
    massBalance: { model: 'linear', ela: 2800, ablationGradient: 0.007, maxAccumulation: 2 },
    spinup: true,
    run,
  };
}

export const DEGREE_DAY_BALANCE = {
  model: 'degree-day',
  referenceElevation: 3000,
  meanTemperature: -6,
  amplitude: 9,
  lapseRate: 0.0065,
  precipitation: 1.2,
  precipitationGradient: 0.0005,
  snowThreshold: 1,
  ddfSnow: 3,
  ddfIce: 6,
} as const;
