/**
 * The scenario's observations in the editor: the year they describe, the terminus (a position, or
 * a record of positions in time), and the measured thickness and surface-speed points, each in a
 * small table or read from CSV. Positions are shown in km, as everywhere in the editor. Every
 * change is a whole scenario through commitEdit (the validator checks `observations`), one
 * undoable edit; a refusal stays at the field with the validator's message.
 */
import { useEffect, useId, useMemo, useState } from 'react';
import type { ObservedPoint, Observations, Point, Scenario } from '../../model/scenario';
import { MAX_CSV_BYTES, type DistanceUnit } from '../../csvImport/csvProfileImport';
import { CSV_FILE_ACCEPT, CsvRowProblems, DistanceUnitField } from './CsvImportParts';
import { observationColumns, parseObservationCsv } from '../../csvImport/csvObservationImport';
import { SCENARIO_LIMITS } from '../../scenario/scenarioLimits';
import { useScenarioStore } from '../../state/scenarioStore';
import { commitEdit, refusalAt } from './commitEdit';
import { pointListRefusal } from './pointListRefusal';
import { NotApplied } from './NotApplied';
import { parseTypedNumber } from './parseTypedNumber';
import { PointTableEditor } from './PointTableEditor';
import { ScenarioNumberField } from './ScenarioNumberField';

/** The scenario with observations[key] set (undefined: removed); no empty observations object is left. */
export function withObservation<K extends keyof Observations>(scenario: Scenario, key: K, value: Observations[K] | undefined): Scenario {
  const observations: Observations = { ...scenario.observations };
  if (value === undefined) delete observations[key];
  else observations[key] = value;
  const next: Scenario = { ...scenario, observations };
  if (Object.keys(observations).length === 0) delete next.observations;
  return next;
}

export function ObservationsEditor() {
  const observations = useScenarioStore((s) => s.scenario.observations);
  return (
    <section className="observations-editor" aria-label="Observations">
      <h3>Observations</h3>
      <p className="field-help">
        What was measured on the glacier: drawn beside the model, compared with it (misfit), and used by the bed from the surface (Analyses). All optional.
      </p>
      <ScenarioNumberField
        label="Observation year"
        unit="a"
        path="/observations/year"
        value={observations?.year}
        build={(s, v) => withObservation(s, 'year', v)}
        optional
        help="model year the thickness, speeds and single terminus describe; empty: year 0"
      />
      <TerminusEditor />
      <ObservedPointsEditor
        listKey="thickness"
        caption="Measured ice thickness"
        what="thickness"
        unit="m"
        max={SCENARIO_LIMITS.observedThicknessMax}
        newPoint={[100, 10]}
      />
      <ObservedPointsEditor
        listKey="surfaceSpeed"
        caption="Measured surface speed"
        what="surface speed"
        valueLabel="Speed"
        unit="m a⁻¹"
        max={SCENARIO_LIMITS.observedSpeedMax}
        newPoint={[20, 2]}
      />
    </section>
  );
}

type TerminusMode = 'none' | 'position' | 'record';

function TerminusEditor() {
  const scenario = useScenarioStore((s) => s.scenario);
  const terminus = scenario.observations?.terminus;
  const mode: TerminusMode = terminus === undefined ? 'none' : typeof terminus === 'number' ? 'position' : 'record';
  const [error, setError] = useState<string | null>(null);
  const name = useId();

  function switchTo(next: TerminusMode) {
    const current = useScenarioStore.getState().scenario;
    const t = current.observations?.terminus;
    const year = current.observations?.year ?? 0;
    const position = t === undefined ? current.grid.length / 2 : typeof t === 'number' ? t : t[t.length - 1][1];
    const value = next === 'none' ? undefined : next === 'position' ? position : ([[year, position]] as Point[]);
    setError(refusalAt(commitEdit(withObservation(current, 'terminus', value), next === 'none' ? 'Remove the observed terminus' : `Observed terminus as a ${next}`), '/observations/terminus'));
  }

  return (
    <fieldset className="observed-terminus">
      <legend>Observed terminus</legend>
      <div className="preset-row" role="radiogroup" aria-label="Observed terminus">
        {(
          [
            ['none', 'None'],
            ['position', 'One position'],
            ['record', 'Record in time'],
          ] as const
        ).map(([value, label]) => (
          <label key={value}>
            <input type="radio" name={name} checked={mode === value} onChange={() => switchTo(value)} /> {label}
          </label>
        ))}
      </div>
      {mode === 'position' && (
        <ScenarioNumberField
          label="Terminus position"
          unit="km"
          path="/observations/terminus"
          value={typeof terminus === 'number' ? terminus : undefined}
          displayScale={0.001}
          build={(s, v) => withObservation(s, 'terminus', v)}
          help={`distance down-valley of the observed terminus, 0 to ${scenario.grid.length / 1000} km, in the observation year`}
        />
      )}
      {mode === 'record' && Array.isArray(terminus) && (
        <PointTableEditor
          caption="Terminus record"
          columns={[
            { label: 'Year', unit: 'a' },
            { label: 'Terminus', unit: 'km', scale: 0.001 },
          ]}
          points={terminus}
          path="/observations/terminus"
          build={(s, points) => withObservation(s, 'terminus', points)}
          minPoints={1}
          addStep={1}
        />
      )}
      <NotApplied message={error} />
    </fieldset>
  );
}

interface ObservedPointsEditorProps {
  listKey: 'thickness' | 'surfaceSpeed';
  caption: string;
  /** The value's name in messages and the CSV column. */
  what: string;
  unit: string;
  max: number;
  /** Value and uncertainty of a point added by hand. */
  newPoint: [number, number];
  /** Heading of the value column (default: `what`, capitalised). */
  valueLabel?: string;
}

const COLUMN_SCALES = [0.001, 1, 1] as const;
const cellText = (v: number, scale: number) => String(Number((v * scale).toPrecision(10)));
const textsOf = (points: readonly ObservedPoint[]) => points.map((p) => p.map((v, c) => cellText(v, COLUMN_SCALES[c])));

/** Distance between a point added at the end and the last one [m]. */
const ADD_STEP_M = 500;

export function ObservedPointsEditor({ listKey, caption, what, unit, max, newPoint, valueLabel }: ObservedPointsEditorProps) {
  const points = useScenarioStore((s) => s.scenario.observations?.[listKey]);
  const length = useScenarioStore((s) => s.scenario.grid.length);
  const path = `/observations/${listKey}`;
  const [texts, setTexts] = useState(() => textsOf(points ?? []));
  const [error, setError] = useState<string | null>(null);
  const [importing, setImporting] = useState(false);
  useEffect(() => {
    setTexts(textsOf(points ?? []));
    setError(null);
  }, [points]);
  const labels = ['x', valueLabel ?? what[0].toUpperCase() + what.slice(1), 'Uncertainty'];
  const units = ['km', unit, unit];

  function commit(next: ObservedPoint[], label: string) {
    const scenario = useScenarioStore.getState().scenario;
    const result = commitEdit(withObservation(scenario, listKey, next.length ? next : undefined), label);
    setError(pointListRefusal(result, path, units.map((u, c) => ({ unit: u, scale: COLUMN_SCALES[c] }))));
  }

  function commitCell(row: number, col: 0 | 1 | 2) {
    if (!points) return;
    const name = `${labels[col]}, row ${row + 1}`;
    const parsed = parseTypedNumber(texts[row][col]);
    if (!parsed.ok) return setError(`${name}: ${parsed.message}`);
    const value = col === 0 ? Number((parsed.value / COLUMN_SCALES[0]).toPrecision(12)) : parsed.value;
    if (value === points[row][col]) return;
    const next = points.map((p, i) => (i === row ? (p.map((v, c) => (c === col ? value : v)) as ObservedPoint) : ([...p] as ObservedPoint)));
    commit(next, `Set ${caption.toLowerCase()} ${name}`);
  }

  const addRow = () => {
    const list = points ?? [];
    const last = list[list.length - 1];
    const x = last ? last[0] + ADD_STEP_M : Math.round(length / 2);
    commit([...list.map((p) => [...p] as ObservedPoint), [x, last ? last[1] : newPoint[0], last ? last[2] : newPoint[1]]], `Add ${caption.toLowerCase()} row`);
  };

  return (
    <div className="point-table observed-points" data-observations={listKey}>
      {points?.length ? (
        <table>
          <caption>{caption}</caption>
          <thead>
            <tr>
              {labels.map((l, c) => (
                <th key={l} scope="col">
                  {l} ({units[c]})
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
                {([0, 1, 2] as const).map((col) => (
                  <td key={col}>
                    <input
                      type="text"
                      inputMode="decimal"
                      aria-label={`${caption}: ${labels[col]}, row ${i + 1} (${units[col]})`}
                      value={row[col]}
                      onChange={(e) => setTexts(texts.map((r, j) => (j === i ? r.map((t, c) => (c === col ? e.target.value : t)) : r)))}
                      onBlur={() => commitCell(i, col)}
                      onKeyDown={(e) => e.key === 'Enter' && commitCell(i, col)}
                    />
                  </td>
                ))}
                <td>
                  <button
                    type="button"
                    aria-label={`Remove ${caption.toLowerCase()} row ${i + 1}`}
                    onClick={() => commit(points.filter((_, j) => j !== i).map((p) => [...p] as ObservedPoint), `Remove ${caption.toLowerCase()} row ${i + 1}`)}
                  >
                    ×
                  </button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : (
        <p className="field-help">
          {caption}: none.
        </p>
      )}
      <div className="preset-row">
        <button type="button" onClick={addRow}>
          Add {what} point
        </button>
        <button type="button" onClick={() => setImporting(!importing)} aria-expanded={importing}>
          Import {what} from CSV…
        </button>
      </div>
      <NotApplied message={error} />
      {importing && <ObservationCsvImport listKey={listKey} caption={caption} what={what} unit={unit} max={max} onClose={() => setImporting(false)} />}
    </div>
  );
}

function ObservationCsvImport({ listKey, caption, what, unit, max, onClose }: Omit<ObservedPointsEditorProps, 'newPoint' | 'valueLabel'> & { onClose: () => void }) {
  const titleId = useId();
  const textId = useId();
  const [text, setText] = useState('');
  const [fileError, setFileError] = useState<string | null>(null);
  const [distanceUnit, setDistanceUnit] = useState<'auto' | DistanceUnit>('auto');
  const [dropBad, setDropBad] = useState(false);
  const [refusal, setRefusal] = useState<string | null>(null);
  const parsed = useMemo(() => (text.trim() === '' ? null : parseObservationCsv(text, { what, unit, max, distanceUnit })), [text, what, unit, max, distanceUnit]);
  const read = parsed?.ok ? parsed : null;
  const badRows = read?.problems.length ?? 0;
  const canImport = !!read && read.points.length > 0 && (badRows === 0 || dropBad);

  async function onFile(file: File | undefined) {
    setFileError(null);
    setDropBad(false);
    if (!file) return;
    if (file.size > MAX_CSV_BYTES) return setFileError(`${file.name} is ${(file.size / 1e6).toFixed(1)} MB; the largest file accepted is 20 MB`);
    try {
      setText(await file.text());
    } catch (e) {
      setFileError(`${file.name} could not be read (${e instanceof Error ? e.message : String(e)})`);
    }
  }

  function accept() {
    if (!read || !canImport) return;
    const scenario = useScenarioStore.getState().scenario;
    const result = commitEdit(withObservation(scenario, listKey, read.points), `Import ${caption.toLowerCase()} from CSV`);
    const message = refusalAt(result, `/observations/${listKey}`);
    setRefusal(message);
    if (!message) onClose();
  }

  return (
    <section className="csv-import observation-import" role="dialog" aria-labelledby={titleId}>
      <h4 id={titleId}>Import {caption.toLowerCase()} (CSV)</h4>
      <p className="field-help">
        Columns, in this order: {observationColumns({ what, unit })}; separated by commas, semicolons or tabs; an optional header line (&quot;x (m)&quot; or
        &quot;x_km&quot; there sets the distance unit). The points replace the list; nothing changes until you press Import.
      </p>
      <label>
        CSV file <input type="file" accept={CSV_FILE_ACCEPT} onChange={(e) => void onFile(e.target.files?.[0])} />
      </label>
      <label htmlFor={textId}>or paste the rows</label>
      <textarea id={textId} rows={4} value={text} onChange={(e) => { setText(e.target.value); setDropBad(false); }} aria-label={`${caption} as CSV`} />
      {(fileError || (parsed && !parsed.ok)) && (
        <p className="field-error" role="alert">
          Cannot import: {fileError ?? (parsed && !parsed.ok ? parsed.error : '')}
        </p>
      )}
      {read && (
        <>
          <DistanceUnitField label="x in" value={distanceUnit} onChange={setDistanceUnit} read={read} />
          <p>
            {read.points.length} point{read.points.length === 1 ? '' : 's'} read{badRows ? `, ${badRows} row${badRows === 1 ? '' : 's'} could not be read` : ''}.
          </p>
          {badRows > 0 && <CsvRowProblems problems={read.problems} dropBad={dropBad} onDropBad={setDropBad} />}
        </>
      )}
      <NotApplied message={refusal} />
      <div className="preset-row">
        <button type="button" onClick={accept} disabled={!canImport}>
          Import
        </button>
        <button type="button" onClick={onClose}>
          Cancel
        </button>
      </div>
    </section>
  );
}
