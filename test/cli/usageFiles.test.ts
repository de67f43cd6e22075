import { describe, expect, it } from 'vitest';
import { parseArgs, USAGE } from '../../src/cli/args';
import { INVERSION_FILES } from '../../src/cli/invertCommand';
import { MEMBER_DONE_FILE } from '../../src/cli/experimentMember';

/** The usage text of one command: from its line to the next command's. */
function section(command: string): string {
  const start = USAGE.indexOf(`  firnline ${command} `);
  expect(start, command).toBeGreaterThanOrEqual(0);
  const next = USAGE.indexOf('\n  firnline ', start + 1);
  return USAGE.slice(start, next < 0 ? undefined : next);
}

// The files each command's writer writes (src/cli/*Command.ts, writeOutput/writeWhole calls).
const WRITES: Record<string, readonly string[]> = {
  run: ['profiles.csv', 'series.csv', 'summary.json', 'lakes.json', 'profile-snapshots-every-<N>a.svg', 'profile-year-<Y>.svg', 'along-flow-year-<Y>.svg', 'time-series.svg'],
  invert: INVERSION_FILES,
  experiment: ['experiment.csv', 'outcomes.csv', 'manifest.json', 'percentiles.csv', 'profiles.csv', 'series.csv', 'summary.json', MEMBER_DONE_FILE],
  merge: ['experiment.csv', 'outcomes.csv', 'manifest.json', 'percentiles.csv'],
  calibrate: ['scenario.json', 'calibration.json'],
  commit: ['committed.csv', 'committed.json', 'committed.svg'],
  sensitivity: ['sensitivity.csv', 'sensitivity.svg'],
};

describe('firnline --help', () => {
  it.each(Object.entries(WRITES))('lists every file %s writes', (command, files) => {
    const text = section(command).replace(/\s+/g, ' ');
    for (const file of files) expect(text, `${command}: ${file}`).toContain(file);
  });

  it('lists the version flag and its short form', () => {
    expect(USAGE).toMatch(/firnline --version \| -V +Show the version\./);
  });
});

describe('firnline calibrate --parameter', () => {
  it('reads the old pointer /massBalance/gradient as /massBalance/ablationGradient', () => {
    const parsed = parseArgs(['calibrate', 's.json', '-p', '/massBalance/ela', '--parameter', '/massBalance/gradient', '--out', 'x']);
    expect(parsed).toMatchObject({ ok: true, command: { kind: 'calibrate', pointers: ['/massBalance/ela', '/massBalance/ablationGradient'] } });
  });
});
