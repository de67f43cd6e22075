import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { fileSafe } from '../../src/experiment/experimentMembers';
import { parseExperimentText, validateExperiment } from '../../src/experiment/validateExperiment';

/** A small valid scenario (invented cirque) to use as the base. */
function base(): Record<string, unknown> {
  return {
    format: 'firnline-scenario',
    version: 1,
    grid: { length: 3000, spacing: 100 },
    bed: [[0, 3000], [3000, 2500]],
    ice: { n: 3, A: 2.4e-24 },
    sliding: { C: 0, m: 3 },
    massBalance: { model: 'linear', ela: 2880, ablationGradient: 0.007 },
    run: { years: 20, outputEvery: 10 },
  };
}

function experiment(extra: Record<string, unknown> = {}): Record<string, unknown> {
  return { format: 'firnline-experiment', version: 1, name: 'test', base: base(), ...extra };
}

function errorsOf(input: unknown) {
  const result = validateExperiment(input);
  if (result.ok) throw new Error('expected errors');
  return result.errors;
}

describe('validateExperiment: expansion into members', () => {
  it('runs every sweep combination for every variant, first sweep key slowest, with stable file-safe names', () => {
    const result = validateExperiment(
      experiment({
        variants: [
          { name: '+1 K by year 80', set: { warming: [[0, 0], [80, 1]] } },
          { name: 'cold/ice', set: { ice: { A: 1e-24 } } },
        ],
        sweep: { '/ice/A': [1.2e-24, 4.8e-24], '/sliding/C': [0, 1e-14, 2e-14] },
      }),
    );
    if (!result.ok) throw new Error(JSON.stringify(result.errors));
    expect(result.members).toHaveLength(2 * 2 * 3);
    expect(result.members.slice(0, 4).map((m) => m.name)).toEqual([
      '01_+1-K-by-year-80_ice.A=1.2e-24_sliding.C=0',
      '02_+1-K-by-year-80_ice.A=1.2e-24_sliding.C=1e-14',
      '03_+1-K-by-year-80_ice.A=1.2e-24_sliding.C=2e-14',
      '04_+1-K-by-year-80_ice.A=4.8e-24_sliding.C=0',
    ]);
    expect(result.members[6].name).toBe('07_cold-ice_ice.A=1.2e-24_sliding.C=0');
    for (const m of result.members) expect(m.name).toMatch(/^[A-Za-z0-9._=+-]+$/);
    // The sweep is applied after the variant's patch, so it wins over the variant's A.
    expect(result.members[6].scenario.ice.A).toBe(1.2e-24);
    expect(result.members[0].scenario.warming).toEqual([[0, 0], [80, 1]]);
    expect(result.members[4].scenario.sliding).toEqual({ C: 1e-14, m: 3 });
  });

  it('is the base alone without variants or sweep', () => {
    const result = validateExperiment(experiment());
    expect(result.ok && result.members.map((m) => m.name)).toEqual(['1_base']);
  });

  it('names list and object sweep values by their place in the list', () => {
    const result = validateExperiment(experiment({ sweep: { '/warming': [[[0, 0]], [[0, 0], [10, 1]]] } }));
    expect(result.ok && result.members.map((m) => m.name)).toEqual(['1_base_warming=v1', '2_base_warming=v2']);
  });

  it('fileSafe keeps letters, digits and . + = - only', () => {
    expect(fileSafe('a b/c\\d:e*f?"g<h>i|j')).toBe('a-b-c-d-e-f-g-h-i-j');
    expect(fileSafe('..hidden')).toBe('hidden');
  });
});

describe('validateExperiment: errors name the path and what is allowed', () => {
  it('rejects unknown keys at the top and in a variant', () => {
    const errors = errorsOf(experiment({ variant: [], variants: [{ name: 'a', set: {}, note: 'x' }] }));
    expect(errors.map((e) => e.path)).toEqual(expect.arrayContaining(['/variant', '/variants/0/note']));
    expect(errors.find((e) => e.path === '/variant')!.message).toMatch(/unknown key .* allows only the keys/);
  });

  it('rejects a wrong format, version and types', () => {
    const errors = errorsOf({ format: 'firnline-scenario', version: 2, base: [], variants: [{ name: '', set: [] }], sweep: { '/ice/A': [] } });
    const paths = errors.map((e) => e.path);
    expect(paths).toEqual(expect.arrayContaining(['/format', '/version', '/base', '/variants/0/name', '/variants/0/set', '/sweep/~1ice~1A']));
  });

  it('rejects duplicate variant names', () => {
    const errors = errorsOf(experiment({ variants: [{ name: 'x', set: {} }, { name: 'x', set: {} }] }));
    expect(errors).toEqual([{ path: '/variants/1/name', message: expect.stringContaining('must be unique') }]);
  });

  it('rejects sweep keys that are not JSON Pointers, or that point at the format', () => {
    const errors = errorsOf(experiment({ sweep: { 'ice/A': [1], '/format': ['x'], '/a~2': [1] } }));
    expect(errors.map((e) => e.path).sort()).toEqual(['/sweep/ice~1A', '/sweep/~1a~02', '/sweep/~1format']);
  });

  it('rejects more than 10,000 members, saying how many there would be', () => {
    const values = Array.from({ length: 101 }, (_, k) => 2000 + k);
    const errors = errorsOf(experiment({ sweep: { '/massBalance/ela': values, '/run/years': values } }));
    expect(errors).toEqual([{ path: '/sweep', message: expect.stringMatching(/^10,201 members are not allowed; an experiment has at most 10,000/) }]);
  });

  it('reports an invalid base at its path under /base', () => {
    const b = base();
    (b.grid as Record<string, unknown>).spacing = -1;
    const errors = errorsOf(experiment({ base: b }));
    expect(errors[0].path).toBe('/base/grid/spacing');
  });

  it('names the variant and places a member error on the value that caused it', () => {
    const errors = errorsOf(
      experiment({
        variants: [
          { name: 'fine', set: {} },
          { name: 'hot', set: { warming: [[0, 0], [10, 99]] } },
        ],
        sweep: { '/ice/A': [2.4e-24, -1] },
      }),
    );
    // One error per cause, shown for the first member it affects.
    expect(errors).toHaveLength(2);
    const byPath = new Map(errors.map((e) => [e.path, e.message]));
    expect(byPath.get('/variants/1/set/warming/1/1')).toMatch(/^in variant "hot" \(member 3_hot_ice.A=2.4e-24\): \/warming\/1\/1: 99 is not allowed/);
    expect(byPath.get('/sweep/~1ice~1A/1')).toMatch(/^in variant "fine" \(member 2_fine_ice.A=-1\): \/ice\/A: -1 is not allowed/);
  });

  it('reports a sweep pointer whose parent does not exist', () => {
    const errors = errorsOf(experiment({ sweep: { '/numerics/scheme': ['explicit'] } }));
    expect(errors[0]).toEqual({ path: '/sweep/~1numerics~1scheme', message: expect.stringContaining('"numerics" does not exist') });
  });
});

describe('parseExperimentText', () => {
  it('gives the line and column of a JSON syntax error', () => {
    const result = parseExperimentText('{\n  "format": "firnline-experiment",\n  "version": 1,,\n}');
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors[0]).toMatchObject({ path: '', line: 3, column: 16 });
  });
  it('rejects empty text', () => {
    expect(parseExperimentText(' \n').ok).toBe(false);
  });
});

describe('examples/demo-warming-ladder.experiment.json', () => {
  it('is valid: the demo valley with variants +1, +2 and +3 K by year 80', () => {
    const text = readFileSync(new URL('../../examples/demo-warming-ladder.experiment.json', import.meta.url), 'utf8');
    const demo = JSON.parse(readFileSync(new URL('../../examples/demo-valley.json', import.meta.url), 'utf8'));
    const result = parseExperimentText(text);
    if (!result.ok) throw new Error(JSON.stringify(result.errors));
    expect(result.members.map((m) => m.scenario.warming)).toEqual([1, 2, 3].map((k) => [[0, 0], [80, k]]));
    const { name: _n, warming: _w, ...rest } = result.experiment.base;
    const { name: _dn, warming: _dw, ...demoRest } = demo;
    expect(rest).toEqual(demoRest);
  });
});
