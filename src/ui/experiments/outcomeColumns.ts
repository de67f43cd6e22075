/**
 * The outcomes table's columns: the columns of outcomes.csv, in its order, with readable titles
 * and units (volumes in km³, or 10⁶ m³ per metre of width for a unit-width flowline). Sorting
 * compares numbers, with missing values ("does not exist", failed members) always last. Pure.
 */
import { OUTCOMES_HEADER } from '../../outputs/experimentCsv';
import type { RunOutcome } from '../../model/analysis/runOutcome';
import { volumeScale } from './finishedMembers';

export interface OutcomeRowData {
  index: number;
  name: string;
  /** The member in words (variant name, swept values); optional. */
  label?: string;
  status: 'ok' | 'failed' | 'waiting' | 'running' | 'cancelled';
  outcome: RunOutcome | null;
  message: string;
}

export type OutcomeColumnKey = (typeof OUTCOMES_HEADER)[number];

export interface OutcomeColumn {
  key: OutcomeColumnKey;
  title: string;
  /** Number shown (in the column's unit), text, or null for "none". */
  value: (row: OutcomeRowData) => number | string | null;
  decimals?: number;
}

const num = (pick: (o: RunOutcome) => number, scale = 1) => (row: OutcomeRowData) => {
  if (!row.outcome) return null;
  const v = pick(row.outcome);
  return Number.isFinite(v) ? v / scale : null;
};

export function outcomeColumns(unitWidth: boolean): OutcomeColumn[] {
  const { divisor, unit } = volumeScale(unitWidth);
  const columns: OutcomeColumn[] = [
    { key: 'variant', title: 'Member', value: (r) => r.name },
    { key: 'status', title: 'Status', value: (r) => r.status },
    { key: 'length_start_m', title: 'Length at year 0 (m)', value: num((o) => o.lengthStart), decimals: 0 },
    { key: 'length_end_m', title: 'Length at end (m)', value: num((o) => o.lengthEnd), decimals: 0 },
    { key: 'length_change_m', title: 'Length change (m)', value: num((o) => o.lengthChange), decimals: 0 },
    { key: 'length_change_pct', title: 'Length change (%)', value: num((o) => o.lengthChangePercent), decimals: 1 },
    { key: 'volume_start_m3', title: `Volume at year 0 (${unit})`, value: num((o) => o.volumeStart, divisor), decimals: 3 },
    { key: 'volume_end_m3', title: `Volume at end (${unit})`, value: num((o) => o.volumeEnd, divisor), decimals: 3 },
    { key: 'volume_change_m3', title: `Volume change (${unit})`, value: num((o) => o.volumeChange, divisor), decimals: 3 },
    { key: 'volume_change_pct', title: 'Volume change (%)', value: num((o) => o.volumeChangePercent), decimals: 1 },
    { key: 'half_volume_change_yr', title: 'Half the volume change by (a)', value: num((o) => o.halfVolumeChangeYears), decimals: 0 },
    { key: 'half_length_change_yr', title: 'Half the length change by (a)', value: num((o) => o.halfLengthChangeYears), decimals: 0 },
    { key: 'e_folding_yr', title: 'e-folding time (a)', value: num((o) => o.eFoldingYears), decimals: 0 },
    { key: 'steady_state', title: 'Ends steady', value: (r) => (r.outcome ? (r.outcome.endsInSteadyState ? 'yes' : 'no') : null) },
    { key: 'message', title: 'Message', value: (r) => r.message || null },
  ];
  // The table and the file must not drift apart.
  if (columns.map((c) => c.key).join() !== OUTCOMES_HEADER.join()) throw new Error('outcome columns differ from outcomes.csv');
  return columns;
}

export type SortDirection = 'ascending' | 'descending';

/** Rows sorted by a column; ties and the member column keep member order; missing values last. */
export function sortRows(rows: readonly OutcomeRowData[], column: OutcomeColumn, direction: SortDirection): OutcomeRowData[] {
  const sign = direction === 'ascending' ? 1 : -1;
  return [...rows].sort((a, b) => {
    if (column.key === 'variant') return sign * (a.index - b.index);
    const va = column.value(a);
    const vb = column.value(b);
    if (va === null || vb === null) return va === vb ? a.index - b.index : va === null ? 1 : -1;
    const order = typeof va === 'number' && typeof vb === 'number' ? va - vb : String(va).localeCompare(String(vb));
    return order !== 0 ? sign * order : a.index - b.index;
  });
}

const formats = new Map<number, Intl.NumberFormat>();

export function formatCell(value: number | string | null, decimals = 0): string {
  if (value === null) return '—';
  if (typeof value === 'string') return value;
  let format = formats.get(decimals);
  if (!format) {
    format = new Intl.NumberFormat('en-GB', { minimumFractionDigits: decimals, maximumFractionDigits: decimals, useGrouping: 'min2' as unknown as boolean });
    formats.set(decimals, format);
  }
  return format.format(value).replace('-', '\u2212');
}
