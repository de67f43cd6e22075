/**
 * docs/scenario-format.md stays true: its worked example is the tested Quennock fixture and is
 * clean, its sample messages are what the validator says, and it names every key of the format.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { scenarioJsonSchema } from '../../src/scenario/scenarioJsonSchema';
import { formatMessage, parseScenarioText, validateScenario } from '../../src/scenario/validateScenario';
import { observedScenario, valleyScenario, type Json } from './scenarioFixtures';

const DOC = readFileSync(fileURLToPath(new URL('../../docs/scenario-format.md', import.meta.url)), 'utf8');

function allPropertyNames(schema: Json, out = new Set<string>()): Set<string> {
  if (Array.isArray(schema)) schema.forEach((s) => allPropertyNames(s, out));
  else if (typeof schema === 'object' && schema !== null) {
    for (const [key, value] of Object.entries(schema)) {
      if (key === 'properties') Object.keys(value as object).forEach((k) => out.add(k));
      allPropertyNames(value, out);
    }
  }
  return out;
}

describe('docs/scenario-format.md', () => {
  it('has the Quennock fixture as its worked example, valid with no warnings', () => {
    const block = /## Worked example[^\n]*\n+```json\n([\s\S]*?)\n```/.exec(DOC);
    expect(block).not.toBeNull();
    const example = JSON.parse(block![1]);
    expect(example).toEqual(valleyScenario());
    expect(validateScenario(example)).toEqual({ ok: true, scenario: example, warnings: [] });
  });

  it('quotes messages exactly as the validator gives them', () => {
    const errorOf = (mutate: (s: Json) => void) => {
      const s = valleyScenario();
      mutate(s);
      const r = validateScenario(s);
      return r.ok ? 'valid' : formatMessage(r.errors[0]);
    };
    const quoted = [
      errorOf((s) => (s.grid.spacing = -50)),
      errorOf((s) => (s.ice = { n: 3, A: 2.4e-24, temperature: -5 })),
      errorOf((s) => (s.bed[3][0] = 5000)),
    ];
    const s = valleyScenario();
    s.massBalance.ela = 3400;
    const r = validateScenario(s);
    quoted.push(r.ok ? formatMessage(r.warnings[0]) : 'invalid');
    const p = parseScenarioText('{\n  "grid": }');
    quoted.push(p.ok ? 'valid' : formatMessage(p.errors[0]));
    for (const line of quoted) expect(DOC).toContain(line);
  });

  it('quotes the observations messages exactly as the validator gives them', () => {
    const errorOf = (mutate: (s: Json) => void) => {
      const s = observedScenario();
      mutate(s);
      const r = validateScenario(s);
      return r.ok ? 'valid' : formatMessage(r.errors[0]);
    };
    const quoted = [
      errorOf((s) => (s.observations.thickness[1][2] = 0)),
      errorOf((s) => (s.observations.terminus = 16000)),
      errorOf((s) => (s.observations.thickness[2][0] = 4000)),
      errorOf((s) => (s.observations.geodeticBalance = { from: 0, to: -10, value: -0.5 })),
    ];
    for (const line of quoted) expect(DOC).toContain(line);
  });

  it('documents every key of the format', () => {
    const names = [...allPropertyNames(scenarioJsonSchema())];
    expect(names.length).toBeGreaterThan(30);
    expect(names.filter((name) => !DOC.includes(`\`${name}\``))).toEqual([]);
  });
});
