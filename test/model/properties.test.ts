/**
 * Property-based checks (fast-check) over random valleys, widths and parameters within the
 * validator's ranges: the engine never produces NaN or negative thickness, and the mass budget
 * closes. A run may legitimately stop with a NumericalFailure (an implausibly fast glacier); it
 * must then say where and when, and never return garbage.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { NumericalFailure } from '../../src/model/numericalFailure';
import { runScenario } from '../../src/model/runScenario';
import type { Point, Scenario } from '../../src/model/scenario';

const valley = fc
  .record({
    cells: fc.integer({ min: 8, max: 60 }),
    spacing: fc.constantFrom(50, 100, 200),
    head: fc.double({ min: 1500, max: 4500, noNaN: true }),
    drops: fc.array(fc.double({ min: -80, max: 400, noNaN: true }), { minLength: 1, maxLength: 6 }),
    widths: fc.array(fc.double({ min: 50, max: 3000, noNaN: true }), { minLength: 1, maxLength: 4 }),
    iceDepth: fc.array(fc.double({ min: 0, max: 400, noNaN: true }), { minLength: 1, maxLength: 5 }),
    logA: fc.double({ min: -25, max: -23, noNaN: true }),
    n: fc.constantFrom(2, 3, 4),
    slidingC: fc.constantFrom(0, 1e-15, 1e-14, 5e-14),
    elaOffset: fc.double({ min: -300, max: 600, noNaN: true }),
    warmingEnd: fc.double({ min: -2, max: 4, noNaN: true }),
    scheme: fc.constantFrom<'implicit' | 'explicit'>('implicit', 'explicit'),
    shape: fc.constantFrom<Scenario['shapeFactor']>(1, 0.6, { crossSection: 'parabolic' }, { crossSection: 'rectangular' }),
  })
  .map((p): Scenario => {
    const length = p.cells * p.spacing;
    const spread = (k: number, count: number) => (k * length) / Math.max(1, count - 1);
    const bed: Point[] = [[0, p.head]];
    let z = p.head;
    p.drops.forEach((drop, k) => {
      z -= drop;
      bed.push([spread(k + 1, p.drops.length + 1), z]);
    });
    const width: Point[] = p.widths.map((w, k) => [spread(k, p.widths.length) + k * 1e-3, w]);
    const surface: Point[] = p.iceDepth.map((d, k) => {
      const x = spread(k, p.iceDepth.length) + k * 1e-3;
      return [x, p.head - (p.head - z) * (x / length) + d];
    });
    return {
      format: 'firnline-scenario',
      version: 1,
      grid: { length, spacing: p.spacing },
      bed,
      width: p.widths.length > 1 ? width : undefined,
      shapeFactor: p.shape,
      surface,
      ice: { n: p.n, A: 10 ** p.logA },
      sliding: { C: p.slidingC, m: 3 },
      massBalance: { model: 'linear', ela: p.head - 0.3 * (p.head - z) + p.elaOffset, ablationGradient: 0.007, maxAccumulation: 2.5 },
      warming: [[0, 0], [40, p.warmingEnd]],
      run: { years: 60, outputEvery: 20 },
      numerics: { scheme: p.scheme },
    };
  });

describe('engine properties over random valleys', () => {
  it('300 random valleys: no NaN, no negative thickness, budget residual <= 1e-9 (or a located NumericalFailure); more than 250 runs complete', () => {
    let completed = 0;
    fc.assert(
      fc.property(valley, (scenario) => {
        try {
          const report = runScenario(scenario);
          for (const frame of report.frames) {
            for (const h of frame.fields.thickness) if (!(h >= 0 && Number.isFinite(h))) return false;
          }
          completed++;
          return report.summary.massBudget.relativeResidual <= 1e-9;
        } catch (error) {
          if (!(error instanceof NumericalFailure)) throw error;
          return Number.isFinite(error.year) && error.message.includes('model year');
        }
      }),
      { numRuns: 300, seed: 20261201 },
    );
    // The generator must mostly produce runs that complete, or the property says little.
    expect(completed).toBeGreaterThan(250);
  });
});
