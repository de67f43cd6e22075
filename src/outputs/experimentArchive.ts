/**
 * An experiment's results as one ZIP for the browser's download: experiment.csv and outcomes.csv
 * with the command line's columns and number rules, the experiment file that reproduces them, and
 * a README stating the version, the date and the caution.
 */
import { strToU8, zipSync } from 'fflate';
import { CAUTION_TEXT } from './caution';
import { experimentHeaderLine, experimentRows, outcomesHeaderLine } from './experimentCsv';

export interface ArchivedMember {
  name: string;
  series: { times: ArrayLike<number>; volume: ArrayLike<number>; area: ArrayLike<number>; length: ArrayLike<number>; terminus: ArrayLike<number> };
}

export interface ExperimentArchiveInput {
  /** Finished members, in member order. */
  members: readonly ArchivedMember[];
  /** outcomes.csv rows of every member that has one (failed members included), in member order. */
  outcomeRows: readonly string[];
  experimentFileName: string;
  experimentFileText: string;
  firnlineVersion: string;
  /** ISO date of the export. */
  date: string;
}

export function experimentCsvText(members: readonly ArchivedMember[]): string {
  let text = experimentHeaderLine();
  for (const m of members) {
    const s = m.series;
    const numbers = Array.from(s.times, (time, k) => ({ time, volume: s.volume[k], area: s.area[k], length: s.length[k], terminus: s.terminus[k] }));
    text += experimentRows(m.name, numbers);
  }
  return text;
}

export function experimentArchive(input: ExperimentArchiveInput): Uint8Array {
  const readme = [
    `Firnline ${input.firnlineVersion}: results of an experiment, exported ${input.date}.`,
    `${input.experimentFileName} reproduces them: firnline experiment ${input.experimentFileName} --out <dir>.`,
    '',
    'experiment.csv  one row per member and output year: variant (the member name), t_yr (a), volume_m3 (m3),',
    '                area_m2 (m2), length_m and terminus_m (m).',
    'outcomes.csv    one row per member: changes in length and volume (absolute and per cent), time to half of',
    '                the change, e-folding response time where it applies, steady state reached, status.',
    '',
    `Caution: ${CAUTION_TEXT}`,
    '',
  ].join('\n');
  // A fixed timestamp inside the archive: the same results give the same bytes.
  const mtime = new Date(Date.UTC(2000, 0, 1));
  return zipSync(
    {
      'README.txt': [strToU8(readme), { mtime }],
      'experiment.csv': [strToU8(experimentCsvText(input.members)), { mtime }],
      'outcomes.csv': [strToU8(outcomesHeaderLine() + input.outcomeRows.join('')), { mtime }],
      [input.experimentFileName]: [strToU8(input.experimentFileText), { mtime }],
    },
    { level: 6 },
  );
}
