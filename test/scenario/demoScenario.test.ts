/**
 * The shipped demo validates, and validation returns what it was given: no defaults filled in,
 * no keys added or reordered, -0 kept (so a scenario round-trips through the UI unchanged).
 */
import { describe, expect, it } from 'vitest';
import { formatMessage, parseScenarioText, validateScenario } from '../../src/scenario/validateScenario';
import { DEMO_TEXT, demo, validScenarios } from './scenarioFixtures';

describe('round trip', () => {
  it('validates examples/demo-valley.json with no errors', () => {
    const result = parseScenarioText(DEMO_TEXT);
    expect(result.ok ? [] : result.errors.map(formatMessage)).toEqual([]);
  });

  it('returns the demo deep-equal to the input, in the same key order', () => {
    const result = validateScenario(demo());
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.scenario).toStrictEqual(demo());
    expect(JSON.stringify(result.scenario)).toBe(JSON.stringify(demo()));
  });

  it('returns every fixture unchanged and fills in no defaults', () => {
    for (const input of validScenarios()) {
      const result = validateScenario(input);
      expect(result.ok).toBe(true);
      if (!result.ok) continue;
      expect(result.scenario).toStrictEqual(input);
      expect(JSON.stringify(result.scenario)).toBe(JSON.stringify(input));
    }
  });

  it('does not return the caller\'s objects, so later edits do not leak in', () => {
    const input = demo();
    const result = validateScenario(input);
    if (!result.ok) throw new Error('demo should be valid');
    expect(result.scenario).not.toBe(input);
    expect(result.scenario.grid).not.toBe(input.grid);
    expect(result.scenario.bed[0]).not.toBe(input.bed[0]);
  });

  it('keeps -0', () => {
    const input = demo();
    input.bed[0][0] = -0;
    const result = validateScenario(input);
    if (!result.ok) throw new Error('-0 is a valid x');
    expect(Object.is(result.scenario.bed[0][0], -0)).toBe(true);
  });
});
