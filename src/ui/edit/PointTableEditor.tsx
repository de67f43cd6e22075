/**
 * A point list [x, y] edited as a table: each cell is applied on Enter or when left, rows are
 * added or removed with buttons; every change is one undoable edit of a scenario the validator
 * accepts, otherwise the typed text stays and the reason is shown under the table.
 */
import { useEffect, useState } from 'react';
import type { Point, Scenario } from '../../model/scenario';
import { useScenarioStore } from '../../state/scenarioStore';
import { commitEdit, errorsAt } from './commitEdit';
import { formatMessage } from '../../scenario/validateScenario';
import { refusalShown } from './refusalShown';
import { parseTypedNumber } from './parseTypedNumber';
import { NotApplied } from './NotApplied';

export interface PointTableEditorProps {
  caption: string;
  columns: [{ label: string; unit: string; scale?: number }, { label: string; unit: string; scale?: number }];
  points: readonly Point[];
  path: string;
  build: (scenario: Scenario, points: Point[]) => Scenario;
  minPoints: number;
  /** Spacing of a row added at the end, in the first column's scenario unit. */
  addStep: number;
}

const cellText = (v: number, scale = 1) => String(Number((v * scale).toPrecision(10)));

export function PointTableEditor({ caption, columns, points, path, build, minPoints, addStep }: PointTableEditorProps) {
  const [xScale, yScale] = [columns[0].scale ?? 1, columns[1].scale ?? 1];
  const [texts, setTexts] = useState(() => points.map((p) => [cellText(p[0], xScale), cellText(p[1], yScale)]));
  const [error, setError] = useState<string | null>(null);
  // Only a change of the document resets the cells, so refused text stays as typed.
  useEffect(() => {
    setTexts(points.map((p) => [cellText(p[0], xScale), cellText(p[1], yScale)]));
    setError(null);
  }, [points, xScale, yScale]);

  function commit(next: Point[], label: string) {
    const result = commitEdit(build(useScenarioStore.getState().scenario, next), label);
    if (result.ok) return setError(null);
    // A cell's range refusal in its column's unit and scale (distances typed in km, not m).
    const shown = errorsAt(result.errors, path).map((e) => {
      const cell = /\/(\d+)\/([01])$/.exec(e.path);
      if (cell === null || e.path !== `${path}/${cell[1]}/${cell[2]}`) return formatMessage(e);
      const column = columns[Number(cell[2])];
      return `${column.label}, row ${Number(cell[1]) + 1}: ${refusalShown(e.message, column.scale ?? 1, column.unit)}`;
    });
    setError(shown.join('; '));
  }

  function commitCell(row: number, col: 0 | 1) {
    const parsed = parseTypedNumber(texts[row][col]);
    const name = `${columns[col].label}, row ${row + 1}`;
    if (!parsed.ok) {
      setError(`${name}: ${parsed.message}`);
      return;
    }
    const scale = columns[col].scale ?? 1;
    const value = scale === 1 ? parsed.value : Number((parsed.value / scale).toPrecision(12));
    if (value === points[row][col]) return;
    const next = points.map((p, i) => (i === row ? (col === 0 ? [value, p[1]] : [p[0], value]) : [p[0], p[1]]) as Point);
    commit(next, `Set ${caption.toLowerCase()} ${name}`);
  }

  return (
    <div className="point-table">
      <table>
        <caption>{caption}</caption>
        <thead>
          <tr>
            {columns.map((c) => (
              <th key={c.label} scope="col">
                {c.label} ({c.unit})
              </th>
            ))}
            <th scope="col">
              <span className="visually-hidden">Remove</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {texts.map((row, i) => (
            <tr key={i}>
              {([0, 1] as const).map((col) => (
                <td key={col}>
                  <input
                    type="text"
                    inputMode="decimal"
                    aria-label={`${columns[col].label}, row ${i + 1} (${columns[col].unit})`}
                    value={row[col]}
                    onChange={(e) => setTexts(texts.map((r, j) => (j === i ? (col === 0 ? [e.target.value, r[1]] : [r[0], e.target.value]) : r)))}
                    onBlur={() => commitCell(i, col)}
                    onKeyDown={(e) => e.key === 'Enter' && commitCell(i, col)}
                  />
                </td>
              ))}
              <td>
                <button
                  type="button"
                  disabled={points.length <= minPoints}
                  aria-label={`Remove row ${i + 1}`}
                  onClick={() => commit(points.filter((_, j) => j !== i).map((p) => [p[0], p[1]]), `Remove ${caption.toLowerCase()} row ${i + 1}`)}
                >
                  ×
                </button>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <button
        type="button"
        onClick={() => {
          const last = points[points.length - 1];
          commit([...points.map((p) => [p[0], p[1]] as Point), [last[0] + addStep, last[1]]], `Add ${caption.toLowerCase()} row`);
        }}
      >
        Add row
      </button>
      <NotApplied message={error} />
    </div>
  );
}
