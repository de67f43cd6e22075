/** The preview's words in every case, with the numbers formatted as the numbers panel does. */
import { describe, expect, it } from 'vitest';
import type { SteadyGlacier } from '../../src/model/steadyGlacier';
import { steadyPreviewText } from '../../src/ui/results/steadyPreviewText';

const glacier = (patch: Partial<SteadyGlacier>): SteadyGlacier => ({
  x: new Float64Array(0),
  thickness: new Float64Array(0),
  surface: new Float64Array(0),
  years: 520,
  converged: true,
  maxYears: 5000,
  terminus: 9350,
  volume: 1.5653e9,
  iceFree: false,
  ...patch,
});

describe('steadyPreviewText', () => {
  it('gives the terminus in km and the volume in km³ with widths, per metre of width without', () => {
    expect(steadyPreviewText({ kind: 'glacier', glacier: glacier({}), unitWidth: false })).toBe('Steady glacier for this climate: terminus 9.35 km, 1.565 km³');
    expect(steadyPreviewText({ kind: 'glacier', glacier: glacier({ volume: 2.4e6 }), unitWidth: true })).toBe(
      'Steady glacier for this climate: terminus 9.35 km, 2.400 × 10⁶ m³ per m of width',
    );
  });

  it('says honestly when the spin-up stopped before a steady state', () => {
    expect(steadyPreviewText({ kind: 'glacier', glacier: glacier({ converged: false, years: 5000 }), unitWidth: false })).toBe(
      'Not yet steady after 5,000 model years under this climate: so far terminus 9.35 km, 1.565 km³, still changing.',
    );
  });

  it('says when no glacier survives', () => {
    const none = glacier({ iceFree: true, terminus: Number.NaN, volume: 0 });
    expect(steadyPreviewText({ kind: 'glacier', glacier: none, unitWidth: false })).toBe('No glacier survives in this valley under this climate.');
    expect(steadyPreviewText({ kind: 'glacier', glacier: { ...none, converged: false, years: 5000 }, unitWidth: false })).toBe(
      'No glacier in this valley after 5,000 model years under this climate (not yet steady).',
    );
  });

  it('words the other states', () => {
    expect(steadyPreviewText({ kind: 'off' })).toBe('');
    expect(steadyPreviewText({ kind: 'computing' })).toMatch(/^Working out the steady glacier/);
    expect(steadyPreviewText({ kind: 'paused' })).toMatch(/waits while the run goes on/);
    expect(steadyPreviewText({ kind: 'refused' })).toMatch(/^No steady glacier shown: the last edit was not applied \(the reason is at the field\)/);
    expect(steadyPreviewText({ kind: 'failed', message: 'the flux diverged' })).toBe('The steady glacier could not be worked out: the flux diverged.');
  });
});
