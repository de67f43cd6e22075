/**
 * The built command line's experiment and merge commands, run as child processes exactly as a
 * user runs them, on a small invented cirque (short runs, no spin-up) so the file stays quick.
 */
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { csvParse } from 'd3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CAUTION_TEXT } from '../../src/outputs/caution';
import { quorrelCirque } from '../helpers/quorrelCirque';
import { ensureFreshBundles, runFirnline, STACK_FRAME } from '../helpers/cliBundle';

let work: string;

const firnline = (...args: string[]) => runFirnline(work, args);

/** The Quorrel cirque, 40 years with outputs every 10, with a sliding key for the sweep. */
const cirque = () => quorrelCirque({ sliding: { C: 0, m: 3 }, run: { years: 40, outputEvery: 10 } });

/** 2 variants x 2 values of A x 2 of C = 8 members. */
function ladder(): Record<string, unknown> {
  return {
    format: 'firnline-experiment',
    version: 1,
    name: 'Quorrel ladder',
    base: cirque(),
    variants: [
      { name: '+1 K by year 20', set: { warming: [[0, 0], [20, 1]] } },
      { name: '+2 K by year 20', set: { warming: [[0, 0], [20, 2]] } },
    ],
    sweep: { '/ice/A': [1.2e-24, 2.4e-24], '/sliding/C': [0, 1e-14] },
  };
}

function file(name: string, content: unknown): string {
  writeFileSync(join(work, name), JSON.stringify(content, null, 2));
  return name;
}

/** Every file under a directory, relative path -> bytes. */
function tree(dir: string): Map<string, Buffer> {
  const files = new Map<string, Buffer>();
  for (const entry of readdirSync(join(work, dir), { recursive: true, withFileTypes: true })) {
    if (entry.isFile()) {
      const full = join(entry.parentPath, entry.name);
      files.set(full.slice(join(work, dir).length + 1), readFileSync(full));
    }
  }
  return files;
}

const read = (dir: string, name: string) => readFileSync(join(work, dir, name), 'utf8');

beforeAll(() => {
  ensureFreshBundles();
  work = mkdtempSync(join(tmpdir(), 'firnline-experiment-'));
}, 60_000);

afterAll(() => {
  if (work) rmSync(work, { recursive: true, force: true });
});

describe('firnline experiment', () => {
  let one: ReturnType<typeof firnline>;
  let two: ReturnType<typeof firnline>;

  beforeAll(() => {
    const path = file('ladder.json', ladder());
    one = firnline('experiment', path, '--out', 'jobs1', '--jobs', '1', '--quiet');
    two = firnline('experiment', path, '--out', 'jobs2', '--jobs', '2', '--quiet');
  }, 120_000);

  it('succeeds quietly with one line on stdout', () => {
    for (const r of [one, two]) {
      expect(r.status, r.stderr).toBe(0);
      expect(r.stderr).toBe('');
      expect(r.stdout).toMatch(/^firnline: experiment "Quorrel ladder" ran 8 of 8 members: 8 ok, 0 failed; .*jobs\d\n$/);
    }
  });

  it('writes experiment.csv with one row per member per output time, in member order', () => {
    const text = read('jobs1', 'experiment.csv');
    expect(text.split('\n')[0]).toBe('variant,t_yr,volume_m3,area_m2,length_m,terminus_m');
    const rows = csvParse(text);
    expect(rows).toHaveLength(8 * 5);
    const members = JSON.parse(read('jobs1', 'manifest.json')).members as string[];
    expect(members).toHaveLength(8);
    expect(members[0]).toBe('1_+1-K-by-year-20_ice.A=1.2e-24_sliding.C=0');
    expect(rows.map((r) => r.variant)).toEqual(members.flatMap((m) => Array(5).fill(m)));
    expect(rows.slice(0, 5).map((r) => Number(r.t_yr))).toEqual([0, 10, 20, 30, 40]);
  });

  it('writes each member\'s run outputs in its own folder, equal to firnline run on the member\'s scenario', () => {
    const members = JSON.parse(read('jobs1', 'manifest.json')).members as string[];
    // Member 8: +2 K, A = 2.4e-24, C = 1e-14, built by hand from the base.
    const scenario = { ...cirque(), warming: [[0, 0], [20, 2]], ice: { n: 3, A: 2.4e-24 }, sliding: { C: 1e-14, m: 3 } };
    const run = firnline('run', file('member8.json', scenario), '--out', 'single8', '--quiet');
    expect(run.status, run.stderr).toBe(0);
    for (const name of ['profiles.csv', 'series.csv', 'summary.json']) {
      expect(read(join('jobs1', members[7]), name), name).toBe(read('single8', name));
    }
    expect(JSON.parse(read(join('jobs1', members[7]), 'summary.json')).caution).toBe(CAUTION_TEXT);
  });

  it('gives bit-identical files with two worker threads and with one', () => {
    const a = tree('jobs1');
    const b = tree('jobs2');
    expect([...b.keys()].sort()).toEqual([...a.keys()].sort());
    expect(a.size).toBe(3 + 8 * 4); // per member: three run files and the completion marker
    for (const [name, bytes] of a) expect(b.get(name)!.equals(bytes), name).toBe(true);
  });

  it('writes one outcome per member: changes, half-change times, steady state and status', () => {
    const rows = csvParse(read('jobs1', 'outcomes.csv'));
    expect(rows.columns).toEqual([
      'variant', 'status', 'length_start_m', 'length_end_m', 'length_change_m', 'length_change_pct',
      'volume_start_m3', 'volume_end_m3', 'volume_change_m3', 'volume_change_pct',
      'half_volume_change_yr', 'half_length_change_yr', 'e_folding_yr', 'steady_state', 'message',
    ]);
    expect(rows).toHaveLength(8);
    const series = csvParse(read(join('jobs1', rows[7].variant!), 'series.csv'));
    const last = series[series.length - 1];
    for (const r of rows) expect(r.status).toBe('ok');
    // The final change is the series' last volume minus its first (all digits in both files).
    expect(Number(rows[7].volume_change_m3)).toBe(Number(last.volume_m3) - Number(series[0].volume_m3));
    expect(Number(rows[7].length_change_m)).toBe(Number(last.length_m) - Number(series[0].length_m));
    // Warmer variants lose more ice than their cooler twins (same A and C).
    for (let k = 0; k < 4; k++) expect(Number(rows[k + 4].volume_change_m3)).toBeLessThan(Number(rows[k].volume_change_m3));
    // A 20-year ramp is not a step: no e-folding time.
    expect(rows.every((r) => r.e_folding_yr === '')).toBe(true);
  });

  it('writes a manifest with the caution', () => {
    const manifest = JSON.parse(read('jobs1', 'manifest.json'));
    expect(manifest).toMatchObject({ format: 'firnline-experiment-output', shard: { index: 1, count: 1, from: 0, to: 8 }, caution: CAUTION_TEXT });
  });

  it('shards merged give byte for byte the single-machine experiment.csv, outcomes.csv and manifest.json', () => {
    for (const k of [1, 2, 3]) {
      const r = firnline('experiment', 'ladder.json', '--out', `shard${k}`, '--shard', `${k}/3`, '--jobs', '1', '--quiet');
      expect(r.status, r.stderr).toBe(0);
      expect(r.stdout).toContain(`(shard ${k} of 3)`);
    }
    // Shards of 8 members in 3: members 1-2, 3-5, 6-8.
    const folders = (dir: string) => readdirSync(join(work, dir), { withFileTypes: true }).filter((e) => e.isDirectory()).length;
    expect([folders('shard1'), folders('shard2'), folders('shard3')]).toEqual([2, 3, 3]);
    const merged = firnline('merge', 'shard3', 'shard1', 'shard2', '--out', 'merged');
    expect(merged.status, merged.stderr).toBe(0);
    expect(merged.stdout).toContain('merged 3 shards (8 members, 0 failed)');
    for (const name of ['experiment.csv', 'outcomes.csv', 'manifest.json']) {
      expect(read('merged', name), name).toBe(read('jobs1', name));
    }
  });

  it('merge refuses a missing shard, a shard given twice and outputs of another experiment', () => {
    const missing = firnline('merge', 'shard1', 'shard3', '--out', 'bad');
    expect(missing.status).toBe(2);
    expect(missing.stderr).toMatch(/^firnline: 3 of 8 members are in none of the directories given, the first being 3_/);
    const twice = firnline('merge', 'shard1', 'shard1', 'shard2', 'shard3', '--out', 'bad');
    expect(twice.status).toBe(2);
    expect(twice.stderr).toMatch(/is in both/);
    const other = { ...ladder(), name: 'another' };
    expect(firnline('experiment', file('other.json', other), '--out', 'other', '--shard', '1/2', '--quiet').status).toBe(0);
    const mixed = firnline('merge', 'other', 'shard2', 'shard3', '--out', 'bad');
    expect(mixed.status).toBe(2);
    expect(mixed.stderr).toMatch(/holds a different experiment/);
    expect(mixed.stderr).not.toMatch(STACK_FRAME);
  });
});

describe('firnline experiment with a failing member', () => {
  it('keeps the other members, records the failure in outcomes.csv and exits with 3', () => {
    // A 200 m domain of 1 m cells under 300-500 m of very soft ice: the explicit step collapses.
    const broken = {
      grid: { length: 200, spacing: 1 },
      bed: [[0, 3000], [200, 2900]],
      surface: [[0, 3500], [200, 3300]],
      ice: { A: 1e-20 },
      numerics: { scheme: 'explicit' },
    };
    const path = file('failing.json', { ...ladder(), sweep: undefined, variants: [{ name: 'fine', set: {} }, { name: 'broken', set: broken }] });
    const r = firnline('experiment', path, '--out', 'failing', '--jobs', '2', '--quiet');
    expect(r.status, r.stderr).toBe(3);
    expect(r.stderr).toMatch(/^firnline: member 2_broken: numerical failure in the run \(model year 0.00, x = /);
    expect(r.stderr).not.toMatch(STACK_FRAME);
    const rows = csvParse(read('failing', 'outcomes.csv'));
    expect(rows.map((x) => [x.variant, x.status])).toEqual([['1_fine', 'ok'], ['2_broken', 'failed']]);
    expect(rows[1].message).toMatch(/^numerical failure in the run \(model year 0.00, x = \d+ m\): time step collapsed/);
    expect(rows[1].length_change_m).toBe('');
    expect(existsSync(join(work, 'failing', '1_fine', 'series.csv'))).toBe(true);
    expect(existsSync(join(work, 'failing', '2_broken'))).toBe(false);
    expect(csvParse(read('failing', 'experiment.csv')).every((x) => x.variant === '1_fine')).toBe(true);
  });
});

describe('firnline experiment: invalid input exits with 2 and one line naming the path', () => {
  it('an invalid member names the variant and the path in the experiment file', () => {
    const bad = { ...ladder(), variants: [{ name: 'hot', set: { warming: [[0, 0], [20, 99]] } }] };
    const r = firnline('experiment', file('bad.json', bad), '--out', 'bad');
    expect(r.status).toBe(2);
    expect(r.stderr.split('\n')[0]).toMatch(
      /^firnline: invalid experiment: \/variants\/0\/set\/warming\/1\/1: in variant "hot" \(member 1_hot_ice.A=1.2e-24_sliding.C=0\): \/warming\/1\/1: 99 is not allowed/,
    );
    expect(existsSync(join(work, 'bad'))).toBe(false);
  });

  it('bad options', () => {
    for (const args of [['--jobs', '0'], ['--shard', '4/3'], ['--shard', '1of3']]) {
      const r = firnline('experiment', 'ladder.json', '--out', 'x', ...args);
      expect(r.status, args.join(' ')).toBe(2);
      expect(r.stderr).toMatch(new RegExp(`^firnline: ${args[0]} needs`));
    }
    expect(firnline('experiment', 'ladder.json').stderr).toMatch(/^firnline: experiment needs --out/);
    expect(firnline('merge', '--out', 'x').stderr).toMatch(/^firnline: merge needs the shard output directories/);
  });

  it('a missing file', () => {
    const r = firnline('experiment', 'nope.json', '--out', 'x');
    expect(r.status).toBe(2);
    expect(r.stderr).toBe('firnline: cannot read experiment file "nope.json": no such file or directory\n');
  });
});
