import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { invertBed, InversionInputError, type InversionScenario } from '../../../src/model/inversion/invertBed';

const demo = JSON.parse(readFileSync(new URL('../../../examples/demo-valley.json', import.meta.url), 'utf8'));
const { bed: _bed, ...withoutBed } = demo;
const base: InversionScenario = { ...withoutBed, observations: { terminus: 9000 } };

function refusal(scenario: InversionScenario): InversionInputError {
  try {
    invertBed(scenario);
  } catch (error) {
    if (error instanceof InversionInputError) return error;
    throw error;
  }
  throw new Error('the input was accepted');
}

describe('invertBed: what it refuses, with the key path', () => {
  it('no surface', () => {
    const { surface: _surface, ...rest } = base;
    expect(refusal(rest).path).toBe('/surface');
  });
  it('no terminus', () => {
    expect(refusal({ ...base, observations: {} }).path).toBe('/observations/terminus');
  });
  it('a terminus outside the domain', () => {
    const error = refusal({ ...base, observations: { terminus: 12500 } });
    expect(error.path).toBe('/observations/terminus');
    expect(error.message).toMatch(/inside the domain/);
  });
  it('a valley section (the inversion knows vertical walls only)', () => {
    const error = refusal({ ...base, section: { shape: 'trapezoidal', widening: 200 } });
    expect(error.path).toBe('/section');
    expect(error.message).toMatch(/vertical walls at the width only/);
  });
});

describe('invertBed: what it states', () => {
  it('names the steady assumption and the shift it made, and the smoothing', () => {
    const result = invertBed(base);
    expect(result.statements.join('\n')).toMatch(/steady state assumed: the balance was shifted by -?\d+\.\d{3} m w\.e\. a\^-1/);
    expect(result.statements.join('\n')).toMatch(/surface smoothed over 300 m/);
    expect(result.rateFactorMultiplier).toBe(1);
    expect(result.rateFactorMultiplierRange).toBeUndefined();
  });
  it('uses a terminus record at the observation year (default 0)', () => {
    expect(invertBed({ ...base, observations: { terminus: [[-20, 9500], [0, 8000]] } }).terminus).toBe(8000);
    expect(invertBed({ ...base, observations: { year: -20, terminus: [[-20, 9500], [0, 8000]] } }).terminus).toBe(9500);
  });
});
