import { describe, expect, it } from 'vitest';
import { calibrateTerminus, spunUpTerminus, withCalibrationParameter } from '../../src/model/analysis/calibrateTerminus';
import type { Scenario } from '../../src/model/scenario';
import { testValley } from './valley';

// Identical-twin test: a terminus produced by the model with a known parameter is given as the
// "observation"; the calibration must find a parameter that reproduces it, close to the known one.
describe('calibrateTerminus', () => {
  const spacing = 100;

  it('recovers a known ELA (linear balance): terminus within 50 m, true ELA inside the matching band, answer within half the band + 0.1 m of it', () => {
    const trueEla = 2870;
    const truth = testValley({ massBalance: { model: 'linear', ela: trueEla, ablationGradient: 0.007, accumulationGradient: 0.004, maxAccumulation: 2 } });
    const observed = spunUpTerminus(truth).terminus;
    const start: Scenario = withCalibrationParameter(truth, 2750);
    const result = calibrateTerminus(start, { observedTerminus: observed, tolerance: spacing / 2 });
    console.info(
      `ELA: true ${trueEla} m, found ${result.parameter.toFixed(2)} m after ${result.iterations} spin-ups; ` +
        `terminus ${result.terminus} m vs observed ${observed} m; matching band ${result.matchBand?.map((b) => b.toFixed(2)).join(" to ")} m`,
    );
    expect(result.matched).toBe(true);
    expect(Math.abs(result.terminus - observed)).toBeLessThanOrEqual(spacing / 2);
    // The terminus moves in whole cells, so a band of ELAs gives the same terminus: the true ELA
    // must lie in the band found, and the answer (its middle) within half the band of it.
    const [low, high] = result.matchBand!;
    expect(low).toBeLessThanOrEqual(trueEla + 1e-9);
    expect(high).toBeGreaterThanOrEqual(trueEla - 1e-9);
    expect(Math.abs(result.parameter - trueEla)).toBeLessThanOrEqual(0.5 * (high - low) + 0.1);
  });

  it('recovers a known shift of a balance table: matched within 50 m, true shift inside the matching band', () => {
    const table: Scenario['massBalance'] = { model: 'table', points: [[2300, -4], [2900, 0], [3300, 1.6]] };
    const trueShift = -40;
    const truth = withCalibrationParameter(testValley({ massBalance: table }), trueShift);
    const observed = spunUpTerminus(truth).terminus;
    const result = calibrateTerminus(testValley({ massBalance: table }), { observedTerminus: observed, tolerance: spacing / 2 });
    console.info(`table shift: true ${trueShift} m, found ${result.parameter.toFixed(2)} m after ${result.iterations} spin-ups, band ${result.matchBand?.map((b) => b.toFixed(2)).join(" to ")} m`);
    expect(result.matched).toBe(true);
    const [low, high] = result.matchBand!;
    expect(low).toBeLessThanOrEqual(trueShift + 1e-9);
    expect(high).toBeGreaterThanOrEqual(trueShift - 1e-9);
  });

  it('recovers a known temperature offset of a degree-day balance: matched within 50 m, true offset inside the matching band', () => {
    // Invented but ordinary numbers: ddf snow 3 and ice 8 mm w.e. K^-1 d^-1 (common practice).
    const degreeDay: Scenario['massBalance'] = {
      model: 'degree-day',
      referenceElevation: 2900,
      meanTemperature: -5,
      amplitude: 9,
      lapseRate: 0.0065,
      precipitation: 1.6,
      precipitationGradient: 0.0005,
      snowThreshold: 1,
      ddfSnow: 3,
      ddfIce: 8,
    };
    const trueOffset = 0.4;
    const truth = withCalibrationParameter(testValley({ massBalance: degreeDay }), trueOffset);
    const observed = spunUpTerminus(truth).terminus;
    const result = calibrateTerminus(testValley({ massBalance: degreeDay }), { observedTerminus: observed, tolerance: spacing / 2 });
    console.info(
      `degree-day offset: true ${trueOffset} K, found ${result.parameter.toFixed(3)} K after ${result.iterations} spin-ups, ` +
        `band ${result.matchBand?.map((b) => b.toFixed(3)).join(' to ')} K; terminus ${observed} m`,
    );
    expect(observed).toBeGreaterThan(0);
    expect(observed).toBeLessThan(6000);
    expect(result.matched).toBe(true);
    const [low, high] = result.matchBand!;
    expect(low).toBeLessThanOrEqual(trueOffset + 1e-9);
    expect(high).toBeGreaterThanOrEqual(trueOffset - 1e-9);
  });

  it('says so when no parameter matches a tolerance finer than the grid (10 m on 100 m cells); closest terminus within 70 m', () => {
    const truth = testValley();
    const observed = spunUpTerminus(truth).terminus + 0.3 * spacing;
    const result = calibrateTerminus(truth, { observedTerminus: observed, tolerance: 0.1 * spacing });
    expect(result.matched).toBe(false);
    expect(Math.abs(result.terminus - observed)).toBeLessThanOrEqual(0.7 * spacing + 1e-9);
  });
});
