import type { Scenario } from '../../src/model/scenario';

/**
 * An invented valley for the analysis tests: 6 km at 100 m cells, an evenly falling bed with a
 * 40 m riegel at 3.2 km (an overdeepening behind it), a linear balance. Small, so that the many
 * spin-ups of a calibration or a sensitivity curve take seconds.
 */
export function testValley(overrides: Partial<Scenario> = {}): Scenario {
  return {
    format: 'firnline-scenario',
    version: 1,
    name: 'Thrummel (invented)',
    grid: { length: 6000, spacing: 100 },
    bed: [[0, 3200], [2600, 2750], [3000, 2660], [3200, 2700], [6000, 2250]],
    width: [[0, 900], [6000, 500]],
    ice: { n: 3, A: 2.4e-24 },
    sliding: { C: 1e-14, m: 3 },
    massBalance: { model: 'linear', ela: 2900, ablationGradient: 0.007, accumulationGradient: 0.004, maxAccumulation: 2 },
    spinup: true,
    run: { years: 100, outputEvery: 10 },
    ...overrides,
  };
}
