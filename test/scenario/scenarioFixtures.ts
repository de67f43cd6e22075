/**
 * Valid scenarios for the io tests: the invented Quennock valley (also the worked example in
 * docs/scenario-format.md), plus variants that exercise the other mass-balance models, A from
 * temperature and the numeric shape factor. The demo in examples/ is tested only for validity,
 * as its numbers are tuned elsewhere.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

export const DEMO_PATH = fileURLToPath(new URL('../../examples/demo-valley.json', import.meta.url));
export const DEMO_TEXT = readFileSync(DEMO_PATH, 'utf8');

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- tests poke at arbitrary keys
export type Json = any;

export function demo(): Json {
  return JSON.parse(DEMO_TEXT);
}

/** Quennock valley: a linear balance, a riegel at 8 km, every optional key but the degree-day ones. */
export function valleyScenario(): Json {
  return {
    format: 'firnline-scenario',
    version: 1,
    name: 'Quennock valley (invented), 2 K warming over 150 years',
    grid: { length: 15000, spacing: 100 },
    bed: [[0, 3300], [2000, 2950], [5000, 2600], [8000, 2350], [8600, 2380], [11000, 2100], [15000, 1700]],
    width: [[0, 1500], [3000, 900], [15000, 400]],
    shapeFactor: { crossSection: 'parabolic' },
    surface: [[0, 3380], [3000, 3050], [6000, 2760], [9000, 2520], [10500, 2240], [11200, 2080], [15000, 1700]],
    ice: { n: 3, A: 2.4e-24, density: 910 },
    sliding: { C: 5e-15, m: 3 },
    massBalance: {
      model: 'linear',
      ela: 2800,
      ablationGradient: 0.007,
      accumulationGradient: 0.003,
      maxAccumulation: 2,
      elaSensitivity: 110,
    },
    warming: [[0, 0], [150, 2]],
    spinup: false,
    run: { years: 400, outputEvery: 10 },
  };
}

/** A short cirque glacier with a balance table and ice from temperature. */
export function tableScenario(): Json {
  return {
    format: 'firnline-scenario',
    version: 1,
    name: 'Invented cirque, balance table',
    grid: { length: 4000, spacing: 100 },
    bed: [[0, 3000], [1500, 2700], [4000, 2300]],
    width: [[0, 600], [4000, 300]],
    shapeFactor: 0.8,
    ice: { n: 3, temperature: -2, enhancement: 1.5, density: 900 },
    massBalance: { model: 'table', points: [[2200, -5], [2800, 0], [3100, 1.2]], elaSensitivity: 90 },
    warming: [[0, 0], [50, 0.5]],
    run: { years: 200, outputEvery: 20 },
  };
}

/** A valley glacier under a degree-day model, no sliding, no initial ice. */
export function degreeDayScenario(): Json {
  return {
    format: 'firnline-scenario',
    version: 1,
    grid: { length: 20000, spacing: 200 },
    bed: [[0, 3600], [20000, 1600]],
    ice: { n: 3, A: 2.4e-24 },
    sliding: { C: 0, m: 3 },
    massBalance: {
      model: 'degree-day',
      referenceElevation: 3000,
      meanTemperature: -4,
      amplitude: 8,
      lapseRate: 0.0065,
      precipitation: 2,
      precipitationGradient: 0.0005,
      snowThreshold: 1,
      ddfSnow: 3,
      ddfIce: 8,
    },
    spinup: false,
    run: { years: 500, outputEvery: 50 },
  };
}

/** Quennock valley with invented measurements: every key of `observations`. */
export function observedScenario(): Json {
  return {
    ...valleyScenario(),
    name: 'Quennock valley (invented), with invented measurements',
    observations: {
      year: 0,
      terminus: [[-30, 11600], [-10, 11350], [0, 11200]],
      thickness: [[2500, 210, 15], [4000, 235, 15], [6000, 240, 20], [9000, 170, 20], [10500, 80, 10]],
      surfaceSpeed: [[1500, 18, 3], [3500, 32, 3], [5500, 38, 4], [7500, 30, 4], [9500, 20, 3], [10800, 8, 2]],
      elevationChange: { from: -10, to: 0, points: [[2000, -0.2], [6000, -0.8], [10000, -2.1], [11000, -3]] },
      geodeticBalance: { from: -10, to: 0, value: -0.65 },
    },
  };
}

export function validScenarios(): Json[] {
  return [valleyScenario(), tableScenario(), degreeDayScenario(), observedScenario()];
}

/** A fresh copy of `base()` after `mutate`. */
export function changed(base: () => Json, mutate: (s: Json) => void): Json {
  const s = base();
  mutate(s);
  return s;
}
