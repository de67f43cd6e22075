/**
 * `firnline merge <dir>... --out <dir>`: joins the outputs of `firnline experiment --shard K/N`
 * into one experiment.csv, outcomes.csv and manifest.json, byte for byte what one machine running
 * every member would have written. The shards must come from the same experiment file and the
 * same firnline version and together hold every member exactly once. Member folders stay where
 * they are. Exit 3 when a member failed, as the experiment itself.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { EXPERIMENT_HEADER, OUTCOMES_HEADER } from '../outputs/experimentCsv';
import { experimentManifest, manifestText, readManifest, type ExperimentManifest } from '../outputs/experimentManifest';
import { percentilesCsv } from '../outputs/ensemblePercentiles';
import { CommandFailure, fileProblem, prepareOutDir, writeOutput } from './commandFiles';
import type { CommandIo } from './experimentCommand';

interface ShardOutput {
  dir: string;
  manifest: ExperimentManifest;
  experimentRows: Map<string, string>;
  outcomeRows: Map<string, string>;
}

function readShardFile(dir: string, name: string): string {
  try {
    return readFileSync(join(dir, name), 'utf8');
  } catch (error) {
    throw new CommandFailure(`cannot read "${join(dir, name)}": ${fileProblem(error)}; is "${dir}" the output of firnline experiment?`, 2);
  }
}

/** Rows grouped by member (the first field); the header must be the expected one. */
function rowsByMember(dir: string, name: string, header: readonly string[]): Map<string, string> {
  const text = readShardFile(dir, name);
  const lines = text.split('\n');
  if (lines[0] !== header.join(',') || !text.endsWith('\n')) {
    throw new CommandFailure(`"${join(dir, name)}" is not a complete ${name} of firnline experiment (header or last line differs)`, 2);
  }
  const rows = new Map<string, string>();
  for (const line of lines.slice(1, -1)) {
    const member = line.slice(0, line.indexOf(','));
    rows.set(member, (rows.get(member) ?? '') + line + '\n');
  }
  return rows;
}

function readShard(dir: string): ShardOutput {
  let value: unknown;
  try {
    value = JSON.parse(readShardFile(dir, 'manifest.json'));
  } catch (error) {
    if (error instanceof CommandFailure) throw error;
    throw new CommandFailure(`"${join(dir, 'manifest.json')}" is not valid JSON`, 2);
  }
  const read = readManifest(value);
  if (!read.ok) throw new CommandFailure(`"${join(dir, 'manifest.json')}" cannot be used: ${read.reason}`, 2);
  return {
    dir,
    manifest: read.manifest,
    experimentRows: rowsByMember(dir, 'experiment.csv', EXPERIMENT_HEADER),
    outcomeRows: rowsByMember(dir, 'outcomes.csv', OUTCOMES_HEADER),
  };
}

export function mergeCommand(dirs: readonly string[], outDir: string, io: CommandIo): number {
  const shards = dirs.map(readShard);
  const first = shards[0].manifest;
  for (const s of shards.slice(1)) {
    if (s.manifest.experimentDigest !== first.experimentDigest) {
      throw new CommandFailure(`"${s.dir}" holds a different experiment than "${shards[0].dir}" (the experiment files differ)`, 2);
    }
    if (s.manifest.firnlineVersion !== first.firnlineVersion) {
      throw new CommandFailure(
        `"${s.dir}" was written by firnline ${s.manifest.firnlineVersion} and "${shards[0].dir}" by ${first.firnlineVersion}; rerun the shards with one version`,
        2,
      );
    }
  }
  const members = first.members;
  const holder: (ShardOutput | undefined)[] = new Array(members.length).fill(undefined);
  for (const s of shards) {
    for (let k = s.manifest.shard.from; k < s.manifest.shard.to; k++) {
      const earlier = holder[k];
      if (earlier) throw new CommandFailure(`member ${members[k]} is in both "${earlier.dir}" and "${s.dir}"; give each shard once`, 2);
      holder[k] = s;
    }
  }
  const missing = holder.findIndex((h) => h === undefined);
  if (missing >= 0) {
    const count = holder.filter((h) => h === undefined).length;
    throw new CommandFailure(`${count} of ${members.length} members are in none of the directories given, the first being ${members[missing]}; run the missing shards first`, 2);
  }
  let experimentCsv = EXPERIMENT_HEADER.join(',') + '\n';
  let outcomesCsv = OUTCOMES_HEADER.join(',') + '\n';
  let failed = 0;
  members.forEach((member, k) => {
    const s = holder[k]!;
    const outcome = s.outcomeRows.get(member);
    if (outcome === undefined) throw new CommandFailure(`"${join(s.dir, 'outcomes.csv')}" has no row for member ${member}`, 2);
    if (outcome.split(',')[1] !== 'ok') failed++;
    experimentCsv += s.experimentRows.get(member) ?? '';
    outcomesCsv += outcome;
  });
  prepareOutDir(outDir);
  writeOutput(outDir, 'experiment.csv', [experimentCsv]);
  writeOutput(outDir, 'outcomes.csv', [outcomesCsv]);
  const merged = experimentManifest({
    firnlineVersion: first.firnlineVersion,
    experimentName: first.experimentName,
    experimentDigest: first.experimentDigest,
    members,
    shard: { index: 1, count: 1, from: 0, to: members.length },
    ensemble: first.ensemble,
  });
  if (first.ensemble) writeOutput(outDir, 'percentiles.csv', [percentilesCsv(experimentCsv, members, first.ensemble)]);
  writeOutput(outDir, 'manifest.json', [manifestText(merged)]);
  io.out(`firnline: merged ${shards.length} shard${shards.length === 1 ? '' : 's'} (${members.length} members, ${failed} failed) into ${outDir}\n`);
  return failed > 0 ? 3 : 0;
}
