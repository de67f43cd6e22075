import { describe, expect, it } from 'vitest';
import { checkObservedTerminus, checkSensitivityInputs, checkTolerance } from '../../../src/ui/analyses/analysisInputs';

describe('sensitivity inputs', () => {
  it('accepts the default range and a short one', () => {
    expect(checkSensitivityInputs('-2', '4', '0.5')).toEqual({ ok: true, value: { from: -2, to: 4, step: 0.5 } });
    expect(checkSensitivityInputs('\u22121', '1', '1')).toEqual({ ok: true, value: { from: -1, to: 1, step: 1 } });
    // 0.1 K steps over 4 K: 41 warmings, the most allowed (floating-point division is not exact).
    expect(checkSensitivityInputs('0', '4', '0.1').ok).toBe(true);
  });

  it('names the field and what is allowed for every mistake', () => {
    const message = (a: string, b: string, c: string) => {
      const r = checkSensitivityInputs(a, b, c);
      return r.ok ? 'accepted' : r.message;
    };
    expect(message('', '4', '0.5')).toBe('Lowest warming: enter a number.');
    expect(message('-2', 'four', '0.5')).toBe('Highest warming: "four" is not a number; write e.g. 2800, 0.007 or 2.4e-24.');
    expect(message('-2', '4', '0,5')).toBe('Step: "0,5" is not a number; write decimals with a point (2.5) and no thousands separators.');
    expect(message('-12', '4', '0.5')).toBe('Lowest warming: \u221212 K is outside the allowed \u221210 K to +10 K.');
    expect(message('4', '-2', '0.5')).toBe('Highest warming (\u22122 K) must be above the lowest (+4 K).');
    expect(message('-2', '4', '0.05')).toBe('Step: 0.05 K is outside the allowed 0.1 to 2 K.');
    expect(message('-2', '4', '0.7')).toBe('Step: 0.7 K does not divide the range of 6 K into whole steps; choose a step that does (e.g. 0.5 K).');
    expect(message('-10', '10', '0.1')).toBe('Step: 0.1 K makes 201 warmings; at most 41 are allowed, so use a step of at least 0.5 K.');
  });
});

describe('observed terminus and tolerance', () => {
  it('turns a terminus in km into metres inside the flowline', () => {
    expect(checkObservedTerminus('7.45', 12000)).toEqual({ ok: true, value: 7450 });
    expect(checkObservedTerminus(' 0.05 ', 12000)).toEqual({ ok: true, value: 50 });
  });

  it('refuses a terminus outside the flowline, naming its ends', () => {
    expect(checkObservedTerminus('15', 12000)).toEqual({
      ok: false,
      message: 'Observed terminus: 15 km is at or beyond the end of the flowline; give a position between 0 and 12 km down-valley (both ends excluded).',
    });
    expect(checkObservedTerminus('0', 12000)).toMatchObject({ ok: false, message: expect.stringContaining('at or above the head of the valley') });
    expect(checkObservedTerminus('12', 12000).ok).toBe(false);
    expect(checkObservedTerminus('', 12000)).toEqual({ ok: false, message: 'Observed terminus: enter a number.' });
    expect(checkObservedTerminus('7.4 km', 12000)).toMatchObject({ ok: false, message: expect.stringMatching(/^Observed terminus: "7.4 km" is not a number/) });
  });

  it('keeps the tolerance between half a grid cell and a quarter of the flowline', () => {
    expect(checkTolerance('25', 50, 12000)).toEqual({ ok: true, value: 25 });
    expect(checkTolerance('3000', 50, 12000)).toEqual({ ok: true, value: 3000 });
    expect(checkTolerance('10', 50, 12000)).toEqual({
      ok: false,
      message: 'Tolerance: 10 m is outside the allowed 25 to 3000 m (from half a grid cell, as the terminus moves in whole 50 m cells, to a quarter of the flowline).',
    });
    expect(checkTolerance('5000', 50, 12000).ok).toBe(false);
  });
});
