/**
 * The report sheet's outcome and mass-budget rows: wording, units and arithmetic checked against
 * numbers worked by hand from a made-up series.
 */
import { describe, expect, it } from 'vitest';
import type { GlacierNumbers } from '../../../src/model/diagnostics';
import type { RunSummary } from '../../../src/model/runScenario';
import { massBudgetRows, outcomeRows } from '../../../src/ui/export/reportRows';

const numbers = (time: number, length: number, volume: number): GlacierNumbers => ({
  time,
  volume,
  area: 0,
  length,
  terminus: length,
  ela: 2800,
  aar: 0.6,
  maxThickness: 200,
  maxSurfaceSpeed: 42.25,
  warming: 0,
  frontalAblation: 0,
});

const summary = {
  massBudget: {
    initialVolume: 2e9,
    finalVolume: 1.5e9,
    appliedBalance: -5e8,
    outflow: 0,
    grossAccumulation: 1e9,
    residual: 1.2e-4,
    relativeResidual: 1.2e-13,
    clippedRoundOff: 0,
    solverResidual: 0,
  },
  numerics: { scheme: 'implicit', maxStepYears: 1 },
  steps: 100,
  smallestStep: 1,
  largestStep: 1,
  endsInSteadyState: false,
  warnings: [],
} as unknown as RunSummary;

// Length 10 -> 8 -> 6 km over years 0, 50, 100; volume 2.0 -> 1.5 -> 1.5 km^3.
const frames = [numbers(0, 10_000, 2e9), numbers(50, 8_000, 1.5e9), numbers(100, 6_000, 1.5e9)].map((n) => ({ time: n.time, numbers: n }));

describe('report rows', () => {
  const rows = Object.fromEntries(outcomeRows(frames, summary, false, []).map((r) => [r.label, r.value]));

  it('gives the changes in length and volume, absolute and per cent of the start', () => {
    expect(rows['Length, year 0 → 100']).toBe('10.00 → 6.00 km');
    expect(rows['Length change']).toBe('−4.00 km (−40.0 %)');
    expect(rows['Volume, year 0 → 100']).toBe('2.000 km³ → 1.500 km³');
    expect(rows['Volume change']).toBe('−0.500 km³ (−25.0 %)');
  });

  it('finds when half of each change was made (linear between outputs)', () => {
    // Half of -4 km is -2 km, reached exactly at year 50; half of -0.5 km^3 (-0.25) at year 25.
    expect(rows['Half of the length change by']).toBe('year 50');
    expect(rows['Half of the volume change by']).toBe('year 25');
  });

  it('states the end state, and lakes only when there are any', () => {
    expect(rows['Terminus, year 100']).toBe('6.00 km from the head');
    expect(rows['Largest surface speed, year 100']).toBe('42.3 m a⁻¹');
    expect(rows['Steady state at the end']).toBe('no (still changing)');
    expect(Object.keys(rows).some((l) => l.startsWith('Lakes in'))).toBe(false);
    const lake = { start: 5000, end: 6000, length: 1000, waterLevel: 2400, maxDepth: 31.6, deepestAt: 5500, volume: 1.25e7, touchesIce: false };
    const withLake = outcomeRows(frames, summary, false, [lake]).find((r) => r.label.startsWith('Lakes in'));
    // The same heading and volume as the numbers panel and the figures use.
    expect(withLake).toEqual({ label: 'Lakes in exposed overdeepenings, year 100', value: '1 lake, up to 32 m deep, together ≈ 13 × 10⁶ m³' });
    const perWidth = outcomeRows(frames, summary, true, [{ ...lake, volume: 48_000 }]).find((r) => r.label.startsWith('Lakes in'));
    expect(perWidth?.value).toBe('1 lake, up to 32 m deep, together ≈ 48 × 10³ m³ per m of width');
  });

  it('lists the mass budget in the units of the run (per m of width for a unit-width flowline)', () => {
    expect(massBudgetRows(summary, true)).toEqual([
      { label: 'Ice volume at start / end', value: '2000.000 × 10⁶ m³ per m of width / 1500.000 × 10⁶ m³ per m of width' },
      { label: 'Surface balance applied', value: '−500.000 × 10⁶ m³ per m of width' },
      { label: 'Outflow at the domain end', value: '0.000 × 10⁶ m³ per m of width' },
      { label: 'Residual (relative)', value: '1.2e-4 m³ per m of width (1.2e-13)' },
    ]);
  });

  it('lists the mass budget in 10⁶ m³ with the relative residual', () => {
    expect(massBudgetRows(summary, false)).toEqual([
      { label: 'Ice volume at start / end', value: '2000.000 × 10⁶ m³ / 1500.000 × 10⁶ m³' },
      { label: 'Surface balance applied', value: '−500.000 × 10⁶ m³' },
      { label: 'Outflow at the domain end', value: '0.000 × 10⁶ m³' },
      { label: 'Residual (relative)', value: '1.2e-4 m³ (1.2e-13)' },
    ]);
  });
});
