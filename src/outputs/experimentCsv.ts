/**
 * The experiment's two tables, with the number rules of csvWriters.ts (volumes and areas with all
 * digits, other model fields at 7 significant figures, times at 10, empty for "does not exist").
 *
 * experiment.csv: one row per member per output time. outcomes.csv: one row per member. Only the
 * outcomes' last field, the failure message, can contain a comma or a quote; it is then quoted as
 * RFC 4180 section 2 says (double quotes around it, inner quotes doubled). Member names never need it.
 * Every row starts with the member's name, so shard files can be joined member by member.
 */
import type { GlacierNumbers } from '../model/diagnostics';
import type { RunOutcome } from '../model/analysis/runOutcome';
import { COORDINATE_DIGITS, csvNumber, FIELD_DIGITS } from './csvWriters';

export const EXPERIMENT_HEADER = ['variant', 't_yr', 'volume_m3', 'area_m2', 'length_m', 'terminus_m'] as const;

export const OUTCOMES_HEADER = [
  'variant',
  'status',
  'length_start_m',
  'length_end_m',
  'length_change_m',
  'length_change_pct',
  'volume_start_m3',
  'volume_end_m3',
  'volume_change_m3',
  'volume_change_pct',
  'half_volume_change_yr',
  'half_length_change_yr',
  'e_folding_yr',
  'steady_state',
  'message',
] as const;

export const experimentHeaderLine = (): string => EXPERIMENT_HEADER.join(',') + '\n';
export const outcomesHeaderLine = (): string => OUTCOMES_HEADER.join(',') + '\n';

const field = (v: number) => csvNumber(v, FIELD_DIGITS);

/** The experiment.csv rows of one member, each ending in "\n". */
export function experimentRows(member: string, numbers: readonly Pick<GlacierNumbers, 'time' | 'volume' | 'area' | 'length' | 'terminus'>[]): string {
  let text = '';
  for (const g of numbers) {
    text += [member, csvNumber(g.time, COORDINATE_DIGITS), csvNumber(g.volume), csvNumber(g.area), field(g.length), field(g.terminus)].join(',') + '\n';
  }
  return text;
}

/** A text field, quoted per RFC 4180 when it holds a comma, a quote or a line break. */
export function csvText(text: string): string {
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

export type MemberStatus = 'ok' | 'failed';

/** One outcomes.csv row (with its "\n"); a failed member has only its status and message. */
export function outcomeRow(member: string, status: MemberStatus, outcome: RunOutcome | undefined, message: string): string {
  const o = outcome;
  const numbers = o
    ? [
        field(o.lengthStart),
        field(o.lengthEnd),
        field(o.lengthChange),
        field(o.lengthChangePercent),
        csvNumber(o.volumeStart),
        csvNumber(o.volumeEnd),
        csvNumber(o.volumeChange),
        field(o.volumeChangePercent),
        field(o.halfVolumeChangeYears),
        field(o.halfLengthChangeYears),
        field(o.eFoldingYears),
        String(o.endsInSteadyState),
      ]
    : Array.from({ length: 12 }, () => '');
  return [member, status, ...numbers, csvText(message)].join(',') + '\n';
}
