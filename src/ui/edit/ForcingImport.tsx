/**
 * The climate forcing [year, warming K, precipitation factor] (scenario key `forcing`), read from
 * a CSV file. Nothing is imported until every row reads; each bad row is listed by line number.
 * The forcing replaces the warming curve, so importing one clears `warming` in the same edit.
 */
import { useState } from 'react';
import { parseForcingCsv, type CsvForcingProblem } from '../../csvImport/csvForcingImport';
import { MAX_CSV_BYTES } from '../../csvImport/csvProfileImport';
import type { ForcingRow, Scenario } from '../../model/scenario';
import { useScenarioStore } from '../../state/scenarioStore';
import { commitEdit, refusalAt } from './commitEdit';
import { NotApplied } from './NotApplied';
import { withKey } from './withKey';
import { CSV_FILE_ACCEPT } from './CsvImportParts';

function withForcing(s: Scenario, rows: ForcingRow[] | undefined): Scenario {
  return withKey(rows ? withKey(s, 'warming', undefined) : s, 'forcing', rows);
}

export function ForcingImport() {
  const forcing = useScenarioStore((s) => s.scenario.forcing);
  const [error, setError] = useState<string | null>(null);
  const [problems, setProblems] = useState<CsvForcingProblem[]>([]);

  function importText(text: string) {
    const result = parseForcingCsv(text);
    if (!result.ok) {
      setError(result.error);
      setProblems(result.problems);
      return;
    }
    setProblems([]);
    const s = useScenarioStore.getState().scenario;
    setError(refusalAt(commitEdit(withForcing(s, result.rows), `Forcing: ${result.rows.length} rows from CSV`), '/forcing'));
  }
  async function onFile(file: File | undefined) {
    if (!file) return;
    if (file.size > MAX_CSV_BYTES) return setError('the file is larger than 20 MB');
    importText(await file.text());
  }

  return (
    <fieldset className="param-group">
      <legend>Climate forcing from a file</legend>
      <p className="field-help">
        CSV rows: year (a), warming (K, −50 to 50), precipitation factor (above 0, at most 10; 1 = unchanged), years strictly
        increasing. Replaces the warming curve; the factor multiplies the accumulation (or the degree-day precipitation).
      </p>
      <label>
        Forcing CSV <input type="file" accept={CSV_FILE_ACCEPT} onChange={(e) => void onFile(e.target.files?.[0])} />
      </label>
      {forcing && (
        <p>
          Forcing of {forcing.length} row{forcing.length === 1 ? '' : 's'}, years {forcing[0][0]} to {forcing[forcing.length - 1][0]}.{' '}
          <button
            type="button"
            onClick={() => setError(refusalAt(commitEdit(withForcing(useScenarioStore.getState().scenario, undefined), 'No forcing'), '/forcing'))}
          >
            Remove forcing
          </button>
        </p>
      )}
      <NotApplied message={error} />
      {problems.length > 0 && (
        <ul className="field-error" aria-label="Rows that could not be read">
          {problems.map((p) => (
            <li key={p.line}>
              Line {p.line}: {p.message}
            </li>
          ))}
        </ul>
      )}
    </fieldset>
  );
}
