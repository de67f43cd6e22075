import { describe, expect, it } from 'vitest';
import { observationRows } from '../../src/ui/results/observationRows';

// The hand-worked example of test/analysis/observationMisfit.test.ts: thickness RMS 8.87 m,
// bias +2 m, weighted RMS 9.85 m, RMS/uncertainty 1.30, 3 points, 1 outside.
const fields = { x: [50, 150, 250, 350], thickness: [100, 120, 80, 0], surfaceSpeed: [10, 20, 30, 0], lengthM: 400, time: 30 };

describe('observationRows', () => {
  it('words the misfit of thickness and speed with units and counts', () => {
    const rows = observationRows(
      {
        year: 30,
        thickness: [
          [100, 100, 10],
          [250, 90, 5],
          [20, 94, 20],
          [450, 50, 5],
        ],
        // Speed at x = 200 is 25; observed 27 +- 2: r = -2.
        surfaceSpeed: [[200, 27, 2]],
      },
      fields,
    );
    expect(rows).toEqual([
      {
        label: 'Thickness, model − observed',
        value: 'RMS 9 m, bias +2 m, weighted RMS 10 m, RMS/uncertainty 1.30, 3 points (1 outside the domain left out)',
      },
      { label: 'Surface speed, model − observed', value: 'RMS 2.0 m a⁻¹, bias \u22122.0 m a⁻¹, weighted RMS 2.0 m a⁻¹, RMS/uncertainty 1.00, 1 point' },
      { label: 'Observations compared', value: 'of year 30, at the same model year' },
    ]);
  });

  it('says when the observations are of another year than the one shown, and gives nothing without observations', () => {
    const rows = observationRows({ thickness: [[100, 100, 10]] }, fields);
    expect(rows[1]).toEqual({ label: 'Observations compared', value: 'of year 0, compared at model year 30: select year 0 to compare like with like' });
    expect(observationRows(undefined, fields)).toEqual([]);
    expect(observationRows({ terminus: 300 }, fields)).toEqual([]);
    expect(observationRows({ thickness: [[900, 1, 1]] }, fields)[0].value).toBe('no observation inside the domain');
  });
});
