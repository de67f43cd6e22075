/**
 * The built command line on an uncertainty ensemble (an invented cirque, short runs): seed
 * determinism byte for byte, percentiles.csv, shards merged, and --resume after an interrupted
 * run (a simulated partial directory and a real kill of the process) giving the bytes of an
 * uninterrupted run.
 */
import { spawn } from 'node:child_process';
import { cpSync, existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, truncateSync, unlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { quorrelCirque } from '../helpers/quorrelCirque';
import { ensureFreshBundles, ROOT, runFirnline } from '../helpers/cliBundle';

let work: string;
const firnline = (...args: string[]) => runFirnline(work, args);
const read = (dir: string, name: string) => readFileSync(join(work, dir, name));

function ensembleExperiment(seed: number, members = 12): Record<string, unknown> {
  return {
    format: 'firnline-experiment',
    version: 1,
    name: 'Quorrel ensemble',
    base: quorrelCirque({ sliding: { C: 0, m: 3 }, run: { years: 40, outputEvery: 10 }, warming: [[0, 0], [20, 2]] }),
    variants: [
      { name: 'warm', set: {} },
      { name: 'hot', set: { warming: [[0, 0], [20, 4]] } },
    ],
    ensemble: {
      members,
      seed,
      parameters: {
        '/ice/A': { distribution: 'lognormal', median: 2.4e-24, sigma: 0.3 },
        '/sliding/C': { distribution: 'uniform', min: 0, max: 1e-14 },
        '/massBalance/ela': { distribution: 'normal', mean: 2880, sd: 20, min: 2840, max: 2920 },
      },
    },
  };
}

function file(name: string, content: unknown): string {
  writeFileSync(join(work, name), JSON.stringify(content, null, 2));
  return name;
}

const TABLES = ['experiment.csv', 'outcomes.csv', 'percentiles.csv', 'manifest.json'];

beforeAll(() => {
  ensureFreshBundles();
  work = mkdtempSync(join(tmpdir(), 'firnline-ensemble-'));
}, 60_000);

afterAll(() => {
  if (work) rmSync(work, { recursive: true, force: true });
});

describe('firnline experiment with an ensemble', () => {
  beforeAll(() => {
    file('seed1.json', ensembleExperiment(1));
    file('seed2.json', ensembleExperiment(2));
    for (const [path, out, jobs] of [['seed1.json', 'a', '2'], ['seed1.json', 'b', '1'], ['seed2.json', 'c', '2']]) {
      const r = firnline('experiment', path, '--out', out, '--jobs', jobs, '--quiet');
      expect(r.status, r.stderr).toBe(0);
    }
  }, 120_000);

  it('the same seed gives byte-identical outputs; another seed other ones', () => {
    for (const name of TABLES) expect(read('b', name).equals(read('a', name)), name).toBe(true);
    for (const name of ['experiment.csv', 'outcomes.csv', 'percentiles.csv']) expect(read('c', name).equals(read('a', name)), name).toBe(false);
  });

  it('writes percentiles.csv: one row per variant and quantity, over its 12 members', () => {
    const text = read('a', 'percentiles.csv').toString();
    console.log(text);
    const lines = text.trimEnd().split('\n');
    expect(lines[0]).toBe('group,label,quantity,members,p5,p17,p50,p83,p95');
    expect(lines.slice(1).map((l) => l.split(',').slice(0, 4).join(','))).toEqual([
      '1,warm,length_end_m,12', '1,warm,volume_end_m3,12', '1,warm,terminus_end_m,12', '1,warm,half_volume_lost_yr,12',
      // +4 K melts some members away: the terminus of an ice-free valley does not exist and is left out.
      '2,hot,length_end_m,12', '2,hot,volume_end_m3,12', '2,hot,terminus_end_m,7', '2,hot,half_volume_lost_yr,12',
    ]);
    const outcomes = read('a', 'outcomes.csv').toString().trimEnd().split('\n').slice(1);
    expect(outcomes.filter((row) => row.includes('_hot_') && row.split(',')[3] !== '0')).toHaveLength(7);
    for (const line of lines.slice(1, 4)) {
      const p = line.split(',').slice(4).map(Number);
      expect([...p].sort((x, y) => x - y)).toEqual(p);
    }
    const members = JSON.parse(read('a', 'manifest.json').toString()).members as string[];
    expect(members[0]).toBe('01_warm_e01');
    expect(members[23]).toBe('24_hot_e12');
  });

  it('shards merged give the same tables and percentiles.csv', () => {
    for (const k of [1, 2, 3]) {
      const r = firnline('experiment', 'seed1.json', '--out', `shard${k}`, '--shard', `${k}/3`, '--quiet');
      expect(r.status, r.stderr).toBe(0);
      expect(existsSync(join(work, `shard${k}`, 'percentiles.csv'))).toBe(false);
    }
    const m = firnline('merge', 'shard1', 'shard2', 'shard3', '--out', 'merged');
    expect(m.status, m.stderr).toBe(0);
    for (const name of TABLES) expect(read('merged', name).equals(read('a', name)), name).toBe(true);
  });

  it('--resume after a simulated interruption reruns only unfinished members and gives the same bytes', () => {
    cpSync(join(work, 'a'), join(work, 'partial'), { recursive: true });
    for (const name of TABLES) unlinkSync(join(work, 'partial', name));
    const members = JSON.parse(read('a', 'manifest.json').toString()).members as string[];
    // Member 3 stopped before its marker; member 5 left a truncated file and a partial one; member 7
    // never started; member 9's marker belongs to another experiment.
    unlinkSync(join(work, 'partial', members[2], 'member-done.json'));
    truncateSync(join(work, 'partial', members[4], 'series.csv'), 10);
    unlinkSync(join(work, 'partial', members[4], 'member-done.json'));
    writeFileSync(join(work, 'partial', members[4], 'summary.json.partial'), '{');
    rmSync(join(work, 'partial', members[6]), { recursive: true });
    const marker = join(work, 'partial', members[8], 'member-done.json');
    writeFileSync(marker, readFileSync(marker, 'utf8').replace(/"experimentDigest":"[0-9a-f]+"/, '"experimentDigest":"00"'));
    const r = firnline('experiment', 'seed1.json', '--out', 'partial', '--resume');
    expect(r.status, r.stderr).toBe(0);
    expect(r.stdout).toMatch(/ran 24 of 24 members: 24 ok, 0 failed; 20 found done, wrote/);
    for (const name of TABLES) expect(read('partial', name).equals(read('a', name)), name).toBe(true);
    for (const k of [2, 4, 6, 8]) {
      for (const name of ['profiles.csv', 'series.csv', 'summary.json', 'member-done.json']) {
        expect(read(join('partial', members[k]), name).equals(read(join('a', members[k]), name)), `${members[k]}/${name}`).toBe(true);
      }
    }
  });

  it('--resume after killing the process mid-way gives the bytes of an uninterrupted run; shards too', async () => {
    file('long.json', ensembleExperiment(1, 60));
    const whole = firnline('experiment', 'long.json', '--out', 'whole', '--jobs', '1', '--quiet');
    expect(whole.status, whole.stderr).toBe(0);
    const done = (dir: string) =>
      existsSync(join(work, dir)) ? readdirSync(join(work, dir)).filter((m) => existsSync(join(work, dir, m, 'member-done.json'))).length : 0;
    const killAfter = async (dir: string, extra: string[]) => {
      const child = spawn(process.execPath, [join(ROOT, 'bin/firnline.mjs'), 'experiment', 'long.json', '--out', dir, '--jobs', '1', '--quiet', ...extra], {
        cwd: work,
        stdio: 'ignore',
      });
      const exited = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)));
      for (let k = 0; k < 600 && done(dir) < 5; k++) await new Promise((r) => setTimeout(r, 50));
      child.kill('SIGKILL');
      const code = await exited;
      const count = done(dir);
      console.log(`${dir}: killed (exit ${code}) with ${count} members done`);
      expect(existsSync(join(work, dir, 'experiment.csv'))).toBe(false);
      expect(count).toBeGreaterThanOrEqual(5);
      return count;
    };
    const count = await killAfter('killed', []);
    expect(count).toBeLessThan(120);
    const r = firnline('experiment', 'long.json', '--out', 'killed', '--jobs', '2', '--resume', '--quiet');
    expect(r.status, r.stderr).toBe(0);
    for (const name of TABLES) expect(read('killed', name).equals(read('whole', name)), name).toBe(true);

    // Shard 2 of 2 killed and resumed, merged with shard 1: the whole run's bytes.
    expect(firnline('experiment', 'long.json', '--out', 'ks1', '--shard', '1/2', '--quiet').status).toBe(0);
    await killAfter('ks2', ['--shard', '2/2']);
    expect(firnline('experiment', 'long.json', '--out', 'ks2', '--shard', '2/2', '--resume', '--quiet').status).toBe(0);
    const m = firnline('merge', 'ks1', 'ks2', '--out', 'kmerged');
    expect(m.status, m.stderr).toBe(0);
    for (const name of TABLES) expect(read('kmerged', name).equals(read('whole', name)), name).toBe(true);
  }, 240_000);
});
