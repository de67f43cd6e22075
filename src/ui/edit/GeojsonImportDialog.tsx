/**
 * Import of a centreline drawn in a GIS (GeoJSON LineString with elevations) as the initial ice
 * surface, with a preview before anything changes. Positions that cannot be read are listed by
 * index, as the CSV import lists rows; the import waits until the file is clean. The imported
 * scenario goes through commitEdit, as one undoable edit; a refusal is shown here.
 */
import { useId, useMemo, useState } from 'react';
import { MAX_CSV_BYTES } from '../../csvImport/csvProfileImport';
import { parseCentrelineGeojson, type CentrelineResult } from '../../csvImport/geojsonCentreline';
import { formatMessage, validateScenario } from '../../scenario/validateScenario';
import { useScenarioStore } from '../../state/scenarioStore';
import { centrelineScenario } from './centrelineScenario';
import { commitEdit, refusalAt } from './commitEdit';
import { ProfilePreviewPlot } from './ProfilePreviewPlot';

const PREVIEW_ROWS = 12;
const km = (m: number): string => String(Number((m / 1000).toFixed(3)));

export function GeojsonImportDialog({ onClose }: { onClose: () => void }) {
  const titleId = useId();
  const [fileName, setFileName] = useState<string | null>(null);
  const [text, setText] = useState<string | null>(null);
  const [fileError, setFileError] = useState<string | null>(null);
  const [reverse, setReverse] = useState(false);
  const [domainToLine, setDomainToLine] = useState(false);
  const [refusal, setRefusal] = useState<string | null>(null);
  const current = useScenarioStore((s) => s.scenario);

  const parsed: CentrelineResult | null = useMemo(() => (text === null ? null : parseCentrelineGeojson(text, { reverse })), [text, reverse]);
  const line = parsed?.ok ? parsed : null;
  const bad = line?.problems.length ?? 0;
  const imported = useMemo(
    () => (line && line.problems.length === 0 ? centrelineScenario(current, line.points, { domainToLine }) : null),
    [line, current, domainToLine],
  );
  const validation = useMemo(() => (imported ? validateScenario(imported.scenario) : null), [imported]);
  const canImport = !!imported && validation?.ok === true;

  async function onFile(file: File | undefined) {
    setText(null);
    setFileError(null);
    setRefusal(null);
    setReverse(false);
    setDomainToLine(false);
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
    const result = commitEdit(imported.scenario, `Import centreline${fileName ? ` ${fileName}` : ''}`);
    if (result.ok) onClose();
    else setRefusal(refusalAt(result, '/surface'));
  }

  return (
    <section className="csv-import" role="dialog" aria-labelledby={titleId}>
      <h3 id={titleId}>Import a centreline (GeoJSON)</h3>
      <p className="field-help">
        One LineString (bare, as a Feature, or the only one in a FeatureCollection) with positions [longitude, latitude, elevation]: WGS 84 degrees
        and metres, from the head of the glacier down-valley. Distances along it are measured on the WGS 84 ellipsoid. The elevations become the
        ice surface; the bed is kept. Nothing changes until you press Import.
      </p>
      <label>
        GeoJSON file{' '}
        <input type="file" accept=".geojson,.json,application/geo+json,application/json" onChange={(e) => void onFile(e.target.files?.[0])} />
      </label>
      {(fileError || (parsed && !parsed.ok)) && (
        <p className="field-error" role="alert">
          Cannot import {fileName}: {fileError ?? (parsed && !parsed.ok ? parsed.error : '')}
        </p>
      )}
      {line && (
        <>
          <p>
            LineString at {line.where}
            {line.name ? ` ("${line.name}")` : ''}: {line.points.length} position{line.points.length === 1 ? '' : 's'} read
            {bad ? `, ${bad} could not be read` : ''}; {km(line.lengthM)} km long{bad ? ' through the positions read' : ''}.
          </p>
          <label>
            <input type="checkbox" checked={reverse} onChange={(e) => setReverse(e.target.checked)} /> Read the line reversed (it was drawn up-valley)
          </label>
          {bad > 0 && (
            <div className="csv-problems" role="alert">
              <p>
                {bad} position{bad === 1 ? '' : 's'} could not be read. Correct the line in the GIS and choose the file again:
              </p>
              <ul aria-label="Positions that could not be read">
                {line.problems.slice(0, 50).map((p) => (
                  <li key={`${p.index}${p.message}`}>
                    Position {p.index}: {p.message}
                  </li>
                ))}
              </ul>
              {bad > 50 && <p>… and {bad - 50} more.</p>}
            </div>
          )}
          {line.notes.map((n) => (
            <p key={n} className="field-help">
              {n}
            </p>
          ))}
          {imported && (
            <>
              {imported.longerThanDomain && (
                <p className="field-error" role="alert">
                  The line is {km(line.lengthM)} km long but the domain ends at {km(imported.scenario.grid.length)} km: the part beyond is outside the
                  model, and the ice there would run off the end of the domain. Lengthen the domain below, or trim the line.
                </p>
              )}
              {imported.domainToLineEnd !== current.grid.length && (
                <label>
                  <input type="checkbox" checked={domainToLine} onChange={(e) => setDomainToLine(e.target.checked)} /> Make the domain{' '}
                  {km(imported.domainToLineEnd)} km long, to the end of the line (whole cells of {current.grid.spacing} m)
                </label>
              )}
              {imported.notes.map((n) => (
                <p key={n} className="field-help">
                  {n}
                </p>
              ))}
              <ProfilePreviewPlot scenario={imported.scenario} />
              <table className="csv-preview">
                <caption>Positions read (first {Math.min(PREVIEW_ROWS, line.points.length)} of {line.points.length})</caption>
                <thead>
                  <tr>
                    <th scope="col">Position</th>
                    <th scope="col">Longitude (°)</th>
                    <th scope="col">Latitude (°)</th>
                    <th scope="col">Distance (km)</th>
                    <th scope="col">Surface (m a.s.l.)</th>
                  </tr>
                </thead>
                <tbody>
                  {line.points.slice(0, PREVIEW_ROWS).map((p) => (
                    <tr key={p.index}>
                      <td>{p.index}</td>
                      <td>{p.longitude}</td>
                      <td>{p.latitude}</td>
                      <td>{km(p.distanceM)}</td>
                      <td>{p.elevation}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </>
          )}
          {validation && !validation.ok && (
            <div className="field-error" role="alert">
              <p>The imported centreline would not make a valid scenario:</p>
              <ul>
                {validation.errors.slice(0, 10).map((e) => (
                  <li key={`${e.path}${e.message}`}>{formatMessage(e)}</li>
                ))}
              </ul>
            </div>
          )}
        </>
      )}
      {refusal && (
        <p className="field-error" role="alert">
          Not imported: {refusal}
        </p>
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
