/**
 * manifest.json, written beside experiment.csv and outcomes.csv: which experiment (a SHA-256
 * digest of its parsed content), which of its members this output holds (a shard), and the
 * caution. `firnline merge` reads it to check that shards belong together and cover every member
 * once; a merged output gets the manifest of a single-machine run, byte for byte.
 */
import { CAUTION_TEXT } from './caution';
import type { EnsembleGroups } from './ensemblePercentiles';

export const MANIFEST_FORMAT = 'firnline-experiment-output';
export const MANIFEST_VERSION = 1;

export interface ExperimentManifest {
  format: typeof MANIFEST_FORMAT;
  version: typeof MANIFEST_VERSION;
  firnlineVersion: string;
  experimentName: string | null;
  /** SHA-256 (hex) of the experiment as JSON.stringify writes its parsed value. */
  experimentDigest: string;
  /** Every member of the experiment, in member order. */
  members: string[];
  /** This output's share: shard `index` of `count` (1-based), holding members from..to-1. */
  shard: { index: number; count: number; from: number; to: number };
  /** Only for an experiment with an ensemble: its groups, for percentiles.csv. */
  ensemble?: EnsembleGroups;
  caution: string;
}

export function experimentManifest(
  fields: Omit<ExperimentManifest, 'format' | 'version' | 'caution'>,
): ExperimentManifest {
  const { ensemble, ...rest } = fields;
  return { format: MANIFEST_FORMAT, version: MANIFEST_VERSION, ...rest, ...(ensemble ? { ensemble } : {}), caution: CAUTION_TEXT };
}

export function manifestText(manifest: ExperimentManifest): string {
  return JSON.stringify(manifest, null, 2) + '\n';
}

/** Members from..to-1 of shard K of N: the K-th of N near-equal consecutive shares. */
export function shardRange(memberCount: number, index: number, count: number): { from: number; to: number } {
  return { from: Math.floor(((index - 1) * memberCount) / count), to: Math.floor((index * memberCount) / count) };
}

/** A manifest read back from disk, or why it is not one. */
export function readManifest(value: unknown): { ok: true; manifest: ExperimentManifest } | { ok: false; reason: string } {
  const m = value as Partial<ExperimentManifest> | null;
  if (typeof m !== 'object' || m === null || m.format !== MANIFEST_FORMAT || m.version !== MANIFEST_VERSION) {
    return { ok: false, reason: `it is not a ${MANIFEST_FORMAT} manifest of version ${MANIFEST_VERSION}` };
  }
  const s = m.shard;
  const valid =
    typeof m.firnlineVersion === 'string' &&
    typeof m.experimentDigest === 'string' &&
    Array.isArray(m.members) &&
    m.members.every((x) => typeof x === 'string') &&
    typeof s === 'object' &&
    s !== null &&
    [s.index, s.count, s.from, s.to].every(Number.isInteger) &&
    0 <= s.from &&
    s.from <= s.to &&
    s.to <= m.members.length &&
    (m.ensemble === undefined ||
      (Number.isInteger(m.ensemble.members) &&
        m.ensemble.members >= 1 &&
        Array.isArray(m.ensemble.labels) &&
        m.ensemble.labels.every((x) => typeof x === 'string') &&
        m.ensemble.labels.length * m.ensemble.members === m.members.length));
  return valid ? { ok: true, manifest: m as ExperimentManifest } : { ok: false, reason: 'its fields are incomplete or inconsistent' };
}
