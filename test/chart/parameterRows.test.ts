import { describe, expect, it } from 'vitest';
import { demoScenario } from '../../src/state/scenarioStore';
import { parameterRows } from '../../src/chart/parameterRows';

describe('parameterRows', () => {
  const rows = Object.fromEntries(parameterRows(demoScenario).map((r) => [r.label, r.value]));

  it('summarises the demo with units', () => {
    expect(rows['Grid spacing']).toBe('50 m (240 cells, 12 km)');
    expect(rows['Flow-law exponent n']).toBe('3');
    expect(rows['Rate factor A']).toBe('2.4 × 10⁻²⁴ Pa⁻³ s⁻¹');
    expect(rows['Sliding']).toBe('C = 3 × 10⁻¹⁴ m a⁻¹ Pa⁻³, m = 3');
    expect(rows['Mass balance']).toBe('Linear in elevation');
    expect(rows['Warming']).toBe('0 K at year 0 to +1.5 K at year 100, then held');
  });

  it('writes the rate factor and sliding units with the chosen exponents (Pa⁻⁴ s⁻¹ for n = 4)', () => {
    const four = Object.fromEntries(
      parameterRows({ ...demoScenario, ice: { ...demoScenario.ice, n: 4, A: 1e-30 }, sliding: { C: 1e-18, m: 2 } }).map((r) => [r.label, r.value]),
    );
    expect(four['Rate factor A']).toBe('1 × 10⁻³⁰ Pa⁻⁴ s⁻¹');
    expect(four['Sliding']).toBe('C = 1 × 10⁻¹⁸ m a⁻¹ Pa⁻², m = 2');
  });

  it('reads the ELA and its sensitivity from the scenario', () => {
    const mb = demoScenario.massBalance;
    if (mb.model !== 'linear') throw new Error('the demo uses the linear balance model');
    expect(rows['ELA']).toBe(`${mb.ela} m a.s.l., rising ${mb.elaSensitivity} m per K of warming`);
  });

  it('names a valley section only when given, with its widening (trapezoid: the flank angle, 200 m <-> 45 degrees)', () => {
    expect(rows['Valley section']).toBeUndefined();
    const row = (section: NonNullable<typeof demoScenario.section>) =>
      parameterRows({ ...demoScenario, section }).find((r) => r.label === 'Valley section')?.value;
    expect(row({ shape: 'trapezoidal', widening: 200 })).toBe('Trapezoidal over the floor width, surface 200 m wider than the floor at 100 m of ice (flanks at 45°)');
    expect(row({ shape: 'parabolic', widening: 350 })).toBe('Parabolic (U-shaped) over the floor width, surface 350 m wider than the floor at 100 m of ice');
    expect(row({ shape: 'rectangular' })).toBe('Rectangular: vertical walls at the width');
  });

  it('reports absent sliding and warming plainly', () => {
    const plain = Object.fromEntries(
      parameterRows({ ...demoScenario, sliding: undefined, warming: undefined }).map((r) => [r.label, r.value]),
    );
    expect(plain['Sliding']).toBe('Off');
    expect(plain['Warming']).toBe('None');
  });

  it('reports a precipitation change per kelvin only when given', () => {
    expect(rows['Accumulation change']).toBeUndefined();
    const wet = parameterRows({ ...demoScenario, massBalance: { ...demoScenario.massBalance, precipitationPerK: 7 } });
    expect(wet.find((r) => r.label === 'Accumulation change')?.value).toBe('+7 % per K of warming (compounded)');
  });

  it('shows a forcing in place of the warming', () => {
    const forced = Object.fromEntries(
      parameterRows({ ...demoScenario, warming: undefined, forcing: [[0, 0, 1], [50, 0.5, 1.05], [100, 1.5, 1.1]] }).map((r) => [r.label, r.value]),
    );
    expect(forced['Warming']).toBeUndefined();
    expect(forced['Forcing']).toBe('3 rows, year 0 (0 K, precipitation ×1) to year 100 (+1.5 K, precipitation ×1.1), then held');
  });

  it('reports year-to-year weather with its seed', () => {
    const windy = parameterRows({ ...demoScenario, variability: { temperatureSd: 0.8, precipitationSd: 0.15, seed: 42, ar1: 0.3 } });
    expect(windy.find((r) => r.label === 'Year-to-year weather')?.value).toBe(
      'temperature sd 0.8 K, precipitation sd 15 %, seed 42, lag-one correlation 0.3',
    );
  });

  it('reports a debris cover with its greatest thickness', () => {
    const covered = parameterRows({ ...demoScenario, debris: [[6000, 0], [9000, 0.4]] });
    expect(covered.find((r) => r.label === 'Debris cover')?.value).toBe('up to 0.4 m thick; ablation × 0.066 / (0.066 + h) (Anderson & Anderson 2016)');
  });

  it('reports frontal ablation with its coefficient, and none at c = 0', () => {
    const calving = parameterRows({ ...demoScenario, frontalAblation: { waterDepthCoefficient: 2.5 } });
    expect(calving.find((r) => r.label === 'Frontal ablation')?.value).toBe('calving rate 2.5 a⁻¹ × depth of the lake at the ice front (Brown, Meier & Post 1982)');
    expect(parameterRows({ ...demoScenario, frontalAblation: { waterDepthCoefficient: 0 } }).some((r) => r.label === 'Frontal ablation')).toBe(false);
  });

  it('describes a rate factor given by temperature', () => {
    const byTemperature = parameterRows({ ...demoScenario, ice: { n: 3, temperature: -2, enhancement: 3 } });
    expect(byTemperature.find((r) => r.label === 'Rate factor A')?.value).toBe('From ice temperature −2 °C, E = 3');
  });
});
