/**
 * Import of a surveyed profile from CSV, with a preview (table and small plot) before anything
 * changes. Rows that cannot be read are listed with their line numbers and reasons; the import
 * stays disabled until the file is clean or the user explicitly ticks "leave out" those rows.
 * The imported scenario must pass the validator too; its messages are shown if it does not.
 */
import { useId, useMemo, useState } from 'react';
import { MAX_CSV_BYTES, parseProfileCsv, separatorName, type CsvProfileResult, type DistanceUnit } from '../../csvImport/csvProfileImport';
import { CSV_FILE_ACCEPT, CsvRowProblems, DistanceUnitField } from './CsvImportParts';
import { formatMessage, validateScenario } from '../../scenario/validateScenario';
import { useScenarioStore } from '../../state/scenarioStore';
import { commitEdit } from './commitEdit';
import { importedProfileScenario } from './importedProfileScenario';
import { ProfilePreviewPlot } from './ProfilePreviewPlot';

const PREVIEW_ROWS = 12;

export function CsvImportDialog({ onClose }: { onClose: () => void }) {
  const titleId = useId();
  const [fileName, setFileName] = useState<string | null>(null);
  const [text, setText] = useState<string | null>(null);
  const [fileError, setFileError] = useState<string | null>(null);
  const [unit, setUnit] = useState<'auto' | DistanceUnit>('auto');
  const [dropBad, setDropBad] = useState(false);
  const current = useScenarioStore((s) => s.scenario);

  const parsed: CsvProfileResult | null = useMemo(() => (text === null ? null : parseProfileCsv(text, { unit })), [text, unit]);
  const profile = parsed?.ok ? parsed : null;
  const imported = useMemo(() => {
    if (!profile || profile.rows.length === 0) return null;
    return importedProfileScenario(current, profile.rows, {
      surface: profile.columns.surface !== undefined,
      width: profile.columns.width !== undefined,
    });
  }, [profile, current]);
  const validation = useMemo(() => (imported ? validateScenario(imported.scenario) : null), [imported]);
  const badRows = profile?.problems.length ?? 0;
  const canImport = !!imported && validation?.ok === true && (badRows === 0 || dropBad);

  async function onFile(file: File | undefined) {
    setText(null);
    setFileError(null);
    setDropBad(false);
    setUnit('auto');
    setFileName(file?.name ?? null);
    if (!file) return;
    if (file.size > MAX_CSV_BYTES) {
      setFileError(`${file.name} is ${(file.size / 1e6).toFixed(1)} MB; the largest profile accepted is 20 MB`);
      return;
    }
    try {
      setText(await file.text());
    } catch (error) {
      setFileError(`${file.name} could not be read (${error instanceof Error ? error.message : String(error)})`);
    }
  }

  function accept() {
    if (!canImport || !imported) return;
    const result = commitEdit(imported.scenario, `Import profile${fileName ? ` ${fileName}` : ''}`);
    if (result.ok) onClose();
  }

  return (
    <section className="csv-import" role="dialog" aria-labelledby={titleId}>
      <h3 id={titleId}>Import a surveyed profile (CSV)</h3>
      <p className="field-help">
        Columns: distance down-valley, bed elevation (m a.s.l.), optional ice-surface elevation (m a.s.l.) and width (m); separated by commas,
        semicolons or tabs; an optional header line naming them. Nothing changes until you press Import.
      </p>
      <label>
        CSV file <input type="file" accept={CSV_FILE_ACCEPT} onChange={(e) => void onFile(e.target.files?.[0])} />
      </label>
      {(fileError || (parsed && !parsed.ok)) && (
        <p className="field-error" role="alert">
          Cannot import {fileName}: {fileError ?? (parsed && !parsed.ok ? parsed.error : '')}
        </p>
      )}
      {profile && (
        <>
          <DistanceUnitField
            label="Distances in"
            value={unit}
            onChange={setUnit}
            read={profile}
            more={`. Columns separated by ${separatorName(profile.separator)}${profile.header ? `; header: ${profile.header.join(', ')}` : '; no header line'}`}
          />
          <p>
            {profile.rows.length} row{profile.rows.length === 1 ? '' : 's'} read
            {badRows ? `, ${badRows} could not be read` : ''}.
          </p>
          {badRows > 0 && (
            <CsvRowProblems
              problems={profile.problems}
              dropBad={dropBad}
              onDropBad={setDropBad}
              intro={
                <p>
                  {badRows} row{badRows === 1 ? '' : 's'} could not be read. Correct the file and choose it again, or leave {badRows === 1 ? 'it' : 'them'} out:
                </p>
              }
            />
          )}
          {[...profile.notes, ...(imported?.notes ?? [])].map((n) => (
            <p key={n} className="field-help">
              {n}
            </p>
          ))}
          {imported && (
            <>
              <p>
                Domain 0 to {imported.scenario.grid.length / 1000} km in {Math.round(imported.scenario.grid.length / imported.scenario.grid.spacing)} cells of{' '}
                {Number(imported.scenario.grid.spacing.toPrecision(6))} m.
              </p>
              <ProfilePreviewPlot scenario={imported.scenario} />
              <table className="csv-preview">
                <caption>Rows read (first {Math.min(PREVIEW_ROWS, profile.rows.length)} of {profile.rows.length})</caption>
                <thead>
                  <tr>
                    <th scope="col">Line</th>
                    <th scope="col">Distance (km)</th>
                    <th scope="col">Bed (m a.s.l.)</th>
                    {profile.columns.surface !== undefined && <th scope="col">Surface (m a.s.l.)</th>}
                    {profile.columns.width !== undefined && <th scope="col">Width (m)</th>}
                  </tr>
                </thead>
                <tbody>
                  {profile.rows.slice(0, PREVIEW_ROWS).map((r) => (
                    <tr key={r.line}>
                      <td>{r.line}</td>
                      <td>{Number((r.distanceM / 1000).toFixed(3))}</td>
                      <td>{r.bed}</td>
                      {profile.columns.surface !== undefined && <td>{r.surface ?? '–'}</td>}
                      {profile.columns.width !== undefined && <td>{r.width ?? '–'}</td>}
                    </tr>
                  ))}
                </tbody>
              </table>
            </>
          )}
          {validation && !validation.ok && (
            <div className="field-error" role="alert">
              <p>The imported profile would not make a valid scenario:</p>
              <ul>
                {validation.errors.slice(0, 10).map((e) => (
                  <li key={`${e.path}${e.message}`}>{formatMessage(e)}</li>
                ))}
              </ul>
            </div>
          )}
        </>
      )}
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
