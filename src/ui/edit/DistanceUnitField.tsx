/**
 * The distance unit of an imported CSV: detected (with the reason the reader gives) or chosen, and
 * the file formats the import dialogs accept. One control for the profile and observation imports.
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
