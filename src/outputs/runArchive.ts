/**
 * A run's data as one ZIP file for the browser's download: profiles.csv (all output years or a
 * chosen few), series.csv and summary.json exactly as the command line writes them, the scenario
 * file that reproduces the run, and a README stating the version, the date, the columns' units
 * and the caution. One file, so the version statement can never be separated from the numbers.
 */
import { strToU8, zipSync } from 'fflate';
import type { GlacierNumbers, ProfileFields } from '../model/diagnostics';
import type { RunSummary } from '../model/runScenario';
import type { Scenario } from '../model/scenario';
import { CAUTION_TEXT } from './caution';
import { profileRows, profilesHeaderLine, seriesCsv } from './csvWriters';
import { runSummaryJson } from './runOutputs';
import type { ValidationMessage } from '../scenario/validationMessage';

export interface ArchiveFrame {
  time: number;
  fields: Omit<ProfileFields, 'x' | 'bed' | 'width'>;
  numbers: GlacierNumbers;
}

export interface RunArchiveInput {
  scenario: Scenario;
  grid: { x: Float64Array; bed: Float64Array; width: Float64Array };
  frames: readonly ArchiveFrame[];
  summary: RunSummary;
  validatorWarnings: readonly ValidationMessage[];
  firnlineVersion: string;
  /** Years whose profiles go into profiles.csv; undefined: every output year. */
  profileYears?: readonly number[];
  /** ISO date of the export, e.g. "2026-12-02". */
  date: string;
  scenarioFileName: string;
}

export function archiveProfilesCsv(input: Pick<RunArchiveInput, 'grid' | 'frames' | 'profileYears'>): string {
  const wanted = input.profileYears ? new Set(input.profileYears) : undefined;
  let text = profilesHeaderLine();
  for (const frame of input.frames) {
    if (wanted && !wanted.has(frame.time)) continue;
    text += profileRows(frame.time, { ...frame.fields, x: input.grid.x, bed: input.grid.bed, width: input.grid.width });
  }
  return text;
}

export function archiveReadme(input: RunArchiveInput): string {
  const years = input.profileYears ? input.profileYears.join(', ') : 'every output year';
  return [
    `Firnline ${input.firnlineVersion}: data of one model run, exported ${input.date}.`,
    `Scenario: ${input.scenario.name ?? '(unnamed)'} (${input.scenarioFileName} reproduces the run: firnline run ${input.scenarioFileName} --out <dir>).`,
    '',
    `profiles.csv  one row per cell and output year (${years}); columns as the command line writes them:`,
    '              t_yr (a), x_m (m from the head), bed_m and surface_m (m a.s.l.), thickness_m, width_m (m; the',
    '              valley-floor width with a valley section) and surface_width_m (m, the width of the ice surface),',
    '              u_surface_m_a and u_sliding_m_a (m a-1), tau_d_kPa (kPa: the driving stress, taken before',
    '              the shape factor, i.e. the basal shear stress divided by it), strain_rate_a (a-1),',
    '              crevasse_depth_m (m), balance_mwe_a (m w.e. a-1).',
    'series.csv    one row per output year: volume_m3, area_m2, length_m, terminus_m, ela_m, aar, max_thickness_m,',
    '              max_u_surface_m_a, warming_K, frontal_ablation_m3_a (m3 a-1 calved into a lake at the ice front).',
    '              Without widths in the scenario (a unit-width flowline) volumes are m3 per m of width and areas m2 per m of width.',
    'summary.json  mass budget, numerics, spin-up, response time, warnings, units and the caution.',
    '',
    `Caution: ${CAUTION_TEXT}`,
    '',
  ].join('\n');
}

export function runArchive(input: RunArchiveInput): Uint8Array {
  const summary = runSummaryJson(input, input.summary, input.frames.map((f) => f.time));
  // A fixed timestamp inside the archive: the same run gives the same bytes (the export date is in the README).
  const mtime = new Date(Date.UTC(2000, 0, 1));
  return zipSync(
    {
      'README.txt': [strToU8(archiveReadme(input)), { mtime }],
      'profiles.csv': [strToU8(archiveProfilesCsv(input)), { mtime }],
      'series.csv': [strToU8(seriesCsv(input.frames.map((f) => f.numbers))), { mtime }],
      'summary.json': [strToU8(JSON.stringify(summary, null, 2) + '\n'), { mtime }],
      [input.scenarioFileName]: [strToU8(`${JSON.stringify(input.scenario, null, 2)}\n`), { mtime }],
    },
    { level: 6 },
  );
}
