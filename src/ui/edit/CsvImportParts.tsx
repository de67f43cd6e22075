/**
 * Parts the CSV import dialogs share: the files they accept, the distance unit (detected, with
 * the reader's reason, or chosen), and the list of rows that could not be read with the choice to
 * leave them out.
 */
import type { ReactNode } from 'react';
import type { DistanceUnit } from '../../csvImport/csvProfileImport';

/** What the CSV file inputs offer to open. */
export const CSV_FILE_ACCEPT = '.csv,.txt,.tsv,text/csv,text/plain';

const unitName = (unit: DistanceUnit) => (unit === 'km' ? 'kilometres' : 'metres');

export function DistanceUnitField({
  label,
  value,
  onChange,
  read,
  more,
}: {
  label: string;
  value: 'auto' | DistanceUnit;
  onChange: (value: 'auto' | DistanceUnit) => void;
  /** The unit the reader used and why. */
  read: { unit: DistanceUnit; unitReason: string };
  /** Said after the reason (e.g. the separator and header). */
  more?: ReactNode;
}) {
  return (
    <div className="field">
      <label>
        {label}{' '}
        <select value={value} onChange={(e) => onChange(e.target.value as 'auto' | DistanceUnit)}>
          <option value="auto">{value === 'auto' ? `${unitName(read.unit)} (detected)` : 'detect'}</option>
          <option value="m">metres</option>
          <option value="km">kilometres</option>
        </select>
      </label>
      <p className="field-help">
        Read as {unitName(read.unit)}, {read.unitReason}
        {more}.
      </p>
    </div>
  );
}

/** Rows shown at most in the list of unreadable rows. */
const LISTED_PROBLEMS = 50;

/**
 * The rows a CSV import could not read, by line, and the choice to leave them out and import the
 * rest (`intro`: said first, e.g. what to do about them).
 */
export function CsvRowProblems({
  problems,
  dropBad,
  onDropBad,
  intro,
}: {
  problems: readonly { line: number; message: string }[];
  dropBad: boolean;
  onDropBad: (drop: boolean) => void;
  intro?: ReactNode;
}) {
  const bad = problems.length;
  return (
    <div className="csv-problems" role="alert">
      {intro}
      <ul aria-label="Rows that could not be read">
        {problems.slice(0, LISTED_PROBLEMS).map((p) => (
          <li key={p.line}>
            Line {p.line}: {p.message}
          </li>
        ))}
      </ul>
      {bad > LISTED_PROBLEMS && <p>… and {bad - LISTED_PROBLEMS} more.</p>}
      <label>
        <input type="checkbox" checked={dropBad} onChange={(e) => onDropBad(e.target.checked)} /> Leave out the {bad} unreadable row
        {bad === 1 ? '' : 's'} and import the rest
      </label>
    </div>
  );
}
