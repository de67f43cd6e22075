/**
 * The inversion's input: the scenario schema with the bed left optional, plus the keys and the
 * geometry the inversion cannot start without. Every refusal names the key path.
 */
import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { formatMessage, validateScenario, type ValidationMessage } from '../../src/scenario/validateScenario';
import { parseInversionInputText, validateInversionInput } from '../../src/scenario/validateInversionInput';
import { applyMutation, mutation } from './jsonMutations';
import { pointerTarget } from './pointerResolves';
import { changed, observedScenario, type Json } from './scenarioFixtures';

const COMMAND_LINE_DOC = readFileSync(fileURLToPath(new URL('../../docs/command-line.md', import.meta.url)), 'utf8');
const EXAMPLE_PATH = fileURLToPath(new URL('../../examples/zindleton-survey.json', import.meta.url));
const EXAMPLE_TEXT = readFileSync(EXAMPLE_PATH, 'utf8');
const example = (): Json => JSON.parse(EXAMPLE_TEXT);

/** The Quennock fixture with its measurements and without its bed. */
function survey(): Json {
  const s = observedScenario();
  delete s.bed;
  return s;
}

function errorsOf(input: unknown): ValidationMessage[] {
  const result = validateInversionInput(input);
  if (result.ok) throw new Error('expected the input to be refused');
  return result.errors;
}

describe('validateInversionInput', () => {
  it('accepts the example survey, which is not a runnable scenario (it has no bed)', () => {
    const result = parseInversionInputText(EXAMPLE_TEXT);
    expect(result.ok, result.ok ? '' : result.errors.map(formatMessage).join('\n')).toBe(true);
    if (result.ok) {
      expect(result.scenario).toEqual(example());
      expect(result.warnings).toEqual([]);
    }
    const asScenario = validateScenario(example());
    expect(asScenario.ok).toBe(false);
    if (!asScenario.ok) expect(asScenario.errors.map((e) => e.path)).toEqual(['/bed']);
  });

  it('accepts an input with the bed given too, with the scenario warnings', () => {
    const result = validateInversionInput(observedScenario());
    expect(result).toEqual({ ok: true, scenario: observedScenario(), warnings: [] });
  });

  it('keeps every rule and message of the scenario format', () => {
    const mutations: ((s: Json) => void)[] = [
      (s) => (s.grid.spacing = -50),
      (s) => (s.observations.thickness[1][2] = 0),
      (s) => (s.observations.terminus = 16000),
      (s) => (s.colour = 'blue'),
      (s) => (s.bed = [[0, 3000]]),
    ];
    for (const mutate of mutations) {
      const withBed = changed(observedScenario, mutate);
      const scenarioErrors = validateScenario(withBed);
      expect(scenarioErrors.ok).toBe(false);
      expect(errorsOf(withBed)).toEqual(scenarioErrors.ok ? [] : scenarioErrors.errors);
    }
  });

  /** [what, mutation, path, fragments]. */
  const cases: [string, (s: Json) => void, string, ...string[]][] = [
    ['no surface', (s) => delete s.surface, '/surface', 'this required key is missing', 'the inversion needs the observed ice surface'],
    ['no observations', (s) => delete s.observations, '/observations', 'this required key is missing', 'the inversion needs the observed terminus'],
    ['no terminus', (s) => delete s.observations.terminus, '/observations/terminus', 'this required key is missing', '"terminus" in "observations"'],
    ['a terminus beyond the domain', (s) => (s.observations.terminus = 15001), '/observations/terminus', '15001 is not allowed', 'within the domain, from 0 to 15,000 m (grid.length)'],
    ['a terminus at the head', (s) => (s.observations.terminus = 0), '/observations/terminus', 'the terminus is at x = 0 m', 'no glacier to invert', 'greater than 0'],
    ['a record at the head in the observation year', (s) => (s.observations.terminus = [[-10, 500], [0, 0]]), '/observations/terminus', 'the terminus of year 0 from the terminus record is at x = 0 m'],
    ['a surface starting down-valley of the head', (s) => (s.surface[0][0] = 200), '/surface/0/0', '200 is not allowed', 'begin at the head of the domain (x = 0)'],
    ['a surface ending short of the domain end', (s) => (s.surface[6][0] = 14000), '/surface/6/0', '14000 is not allowed', 'reach the end of the domain (x = 15,000 m, grid.length)', 'becomes the bed'],
    ['a flat surface', (s) => (s.surface = [[0, 2500], [15000, 2500]]), '/surface', 'does not fall from the head to the terminus of year 0', '2500 m a.s.l. at x = 0', 'flat or rises down-valley'],
    ['a valley section', (s) => (s.section = { shape: 'parabolic', widening: 200 }), '/section', 'vertical walls at "width" only', 'leave out "section"'],
    ['a surface rising down-valley', (s) => (s.surface = [[0, 2000], [15000, 3000]]), '/surface', 'does not fall', 'cannot carry it'],
    ['a surface that is lower at the terminus only beyond it', (s) => ((s.observations.terminus = 5000), (s.surface = [[0, 2600], [5000, 2700], [15000, 1700]])), '/surface', 'to the terminus: it is at 2600 m a.s.l. at x = 0 and 2700 m a.s.l. at x = 5000 m;'],
  ];

  it.each(cases)('refuses %s', (_what, mutate, path, ...fragments) => {
    const errors = errorsOf(changed(survey, mutate));
    const atPath = errors.filter((e) => e.path === path);
    expect(atPath, errors.map(formatMessage).join(' | ')).toHaveLength(1);
    for (const f of fragments) expect(atPath[0].message).toContain(f);
  });

  it('reports missing keys together with the other errors', () => {
    const errors = errorsOf(changed(survey, (s) => ((s.ice.n = 9), delete s.surface, delete s.observations.terminus)));
    expect(errors.map((e) => e.path).sort()).toEqual(['/ice/n', '/observations/terminus', '/surface']);
  });

  it('gives the messages docs/command-line.md quotes for the example', () => {
    const lineOf = (mutate: (s: Json) => void) => {
      const errors = errorsOf(changed(example, mutate));
      return `firnline: invalid scenario: ${formatMessage(errors[0])}`;
    };
    expect(COMMAND_LINE_DOC).toContain(lineOf((s) => delete s.observations.terminus));
    expect(COMMAND_LINE_DOC).toContain(lineOf((s) => (s.surface = [[0, 2500], [12000, 2500]])));
  });

  it('gives JSON syntax errors with line and column, as for a scenario', () => {
    const result = parseInversionInputText('{\n  "grid": }');
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors[0]).toMatchObject({ path: '', line: 2, column: 11 });
  });

  it('never throws on hostile input', () => {
    for (const input of [null, 5, [], new Proxy({}, { ownKeys: () => { throw new Error('trap'); } })]) {
      expect(validateInversionInput(input).ok).toBe(false);
    }
  });
});

describe('validateInversionInput: fuzzing', () => {
  const RUNS = 2000;
  const mutated = fc
    .record({ base: fc.nat(1), mutations: fc.array(mutation, { minLength: 1, maxLength: 3 }) })
    .map(({ base, mutations }) => mutations.reduce((s, m) => applyMutation(s, m), [survey(), example()][base]));

  it(`${RUNS} mutated surveys: never throws, input back unchanged or errors that point into it`, () => {
    fc.assert(
      fc.property(mutated, (input: Json) => {
        const result = validateInversionInput(input);
        if (result.ok) expect(result.scenario).toEqual(input);
        else expect(result.errors.length).toBeGreaterThanOrEqual(1);
        for (const m of result.ok ? result.warnings : result.errors) {
          expect(m.message.length).toBeGreaterThan(0);
          expect(m.message).not.toMatch(/Invalid input|Too small|Too big|Unrecognized key/);
          const target = pointerTarget(input, m.path);
          expect(target === 'value' || (!result.ok && target === 'missing-child'), `${m.path}: ${m.message}`).toBe(true);
        }
      }),
      { numRuns: RUNS },
    );
  });
});
