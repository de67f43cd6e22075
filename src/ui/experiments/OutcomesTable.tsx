/**
 * One row per member with the columns of outcomes.csv, sortable by any column (click a heading;
 * again to reverse). The member's name opens its run in the workbench.
 */
import { useMemo, useState } from 'react';
import { formatCell, outcomeColumns, sortRows, type OutcomeColumnKey, type OutcomeRowData, type SortDirection } from './outcomeColumns';

/** The nearest CSS border style to a chart line's dash pattern. */
const swatchStyle = (dash: string) => (dash === '' ? 'solid' : dash.startsWith('2 ') ? 'dotted' : 'dashed');

/** Rows shown (after sorting); outcomes.csv holds every member. */
const MAX_ROWS = 500;

export interface OutcomesTableProps {
  rows: readonly OutcomeRowData[];
  unitWidth: boolean;
  onOpenMember: (index: number) => void;
  /** Member index to chart style colour, shown as a swatch beside the name. */
  colourOf: (index: number) => { colour: string; dash: string };
}

export function OutcomesTable({ rows, unitWidth, onOpenMember, colourOf }: OutcomesTableProps) {
  const columns = useMemo(() => outcomeColumns(unitWidth), [unitWidth]);
  const [sort, setSort] = useState<{ key: OutcomeColumnKey; direction: SortDirection }>({ key: 'variant', direction: 'ascending' });
  const column = columns.find((c) => c.key === sort.key) ?? columns[0];
  const sorted = useMemo(() => sortRows(rows, column, sort.direction), [rows, column, sort.direction]);

  const sortBy = (key: OutcomeColumnKey) =>
    setSort((s) => ({ key, direction: s.key === key && s.direction === 'ascending' ? 'descending' : 'ascending' }));

  return (
    <section className="outcomes" aria-labelledby="outcomes-heading">
      <h3 id="outcomes-heading">Outcomes by member</h3>
      <p className="field-help">The columns of outcomes.csv; click a heading to sort, a member to open its run in the workbench.</p>
      <div className="outcomes-scroll">
        <table className="outcomes-table" aria-labelledby="outcomes-heading">
          <thead>
            <tr>
              {columns.map((c) => (
                <th key={c.key} scope="col" aria-sort={c.key === sort.key ? sort.direction : 'none'}>
                  <button type="button" className="sort-button" onClick={() => sortBy(c.key)} title={`Sort by ${c.title} (outcomes.csv column ${c.key})`}>
                    {c.title}
                    <span aria-hidden="true">{c.key === sort.key ? (sort.direction === 'ascending' ? ' ▲' : ' ▼') : ''}</span>
                  </button>
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {sorted.slice(0, MAX_ROWS).map((row) => (
              <tr key={row.index} data-member={row.name} className={row.status === 'failed' ? 'failed' : undefined}>
                {columns.map((c) =>
                  c.key === 'variant' ? (
                    <th key={c.key} scope="row">
                      <span className="swatch" aria-hidden="true" style={{ borderTop: `3px ${swatchStyle(colourOf(row.index).dash)} ${colourOf(row.index).colour}` }} />
                      <button type="button" className="link-button" onClick={() => onOpenMember(row.index)} title="Open this member's run in the workbench">
                        {row.name}
                      </button>
                      {row.label && row.label !== row.name && <span className="member-label">{row.label}</span>}
                    </th>
                  ) : (
                    <td key={c.key} className={typeof c.value(row) === 'number' ? 'number' : undefined}>
                      {formatCell(c.value(row), c.decimals)}
                    </td>
                  ),
                )}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {sorted.length > MAX_ROWS && (
        <p className="field-help">
          The first {MAX_ROWS} of {sorted.length} rows in this order; sort to see others, or save outcomes.csv for every member.
        </p>
      )}
    </section>
  );
}
