/**
 * An ice-free starting valley for new projects: a smoothly steepening bed, constant width, a
 * linear balance with its ELA two-thirds of the way up. Invented, round numbers; it grows a
 * glacier when run.
 */
import { validScenarioOf, type ValidScenario } from './validateScenario';

export function blankValleyScenario(name = 'Blank valley'): ValidScenario {
  return validScenarioOf({
    format: 'firnline-scenario',
    version: 1,
    name,
    grid: { length: 10000, spacing: 50 },
    bed: [
      [0, 3200],
      [2000, 2900],
      [5000, 2550],
      [8000, 2300],
      [10000, 2180],
    ],
    width: [
      [0, 1200],
      [10000, 800],
    ],
    shapeFactor: { crossSection: 'parabolic' },
    ice: { n: 3, A: 2.4e-24, density: 910 },
    massBalance: { model: 'linear', ela: 2800, ablationGradient: 0.007, maxAccumulation: 2, elaSensitivity: 100 },
    warming: [[0, 0]],
    spinup: false,
    run: { years: 300, outputEvery: 5 },
  }, 'the blank valley');
}
