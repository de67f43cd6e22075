/**
 * Scenario files, in the same format as the command line: save the open scenario as a file, or
 * open one into the open project as a single undoable edit. A file that does not validate is
 * refused whole, with the validator's messages (key or line and column, and what is allowed).
 */
import { useRef, useState, type ChangeEvent } from 'react';
import { parseScenarioText } from '../../scenario/validateScenario';
import { formatMessage } from '../../scenario/validationMessage';
import { useScenarioStore } from '../../state/scenarioStore';
import { downloadScenario } from '../app/downloadScenario';
import { readChosenFile } from '../app/readChosenFile';

/** Messages listed for a refused file; the rest are counted. */
const MESSAGES_SHOWN = 5;

export function ScenarioFileButtons() {
  const input = useRef<HTMLInputElement>(null);
  const [problems, setProblems] = useState<string[]>([]);
  const [note, setNote] = useState<string | null>(null);

  async function open(event: ChangeEvent<HTMLInputElement>) {
    const chosen = await readChosenFile(event);
    if (!chosen) return;
    setNote(null);
    if (chosen.problem !== undefined) return setProblems([chosen.problem]);
    const file = chosen;
    const result = parseScenarioText(chosen.text);
    if (!result.ok) {
      const listed = result.errors.slice(0, MESSAGES_SHOWN).map(formatMessage);
      const more = result.errors.length - listed.length;
      setProblems([`${file.name} was not opened:`, ...listed, ...(more > 0 ? [`… and ${more} more`] : [])]);
      return;
    }
    setProblems([]);
    useScenarioStore.getState().apply(result.scenario, `Open ${file.name}`);
    const warnings = result.warnings.length;
    setNote(`Opened ${file.name}${warnings ? ` with ${warnings} warning${warnings > 1 ? 's' : ''}: ${result.warnings.map(formatMessage).join('; ')}` : ''}. Undo returns to the previous scenario.`);
  }

  return (
    <div className="scenario-files">
      <div className="button-row">
        <button type="button" onClick={() => input.current?.click()}>
          Open scenario file…
        </button>
        <button type="button" onClick={() => downloadScenario(useScenarioStore.getState().scenario)}>
          Save scenario file
        </button>
      </div>
      <input
        ref={input}
        type="file"
        accept=".json,application/json"
        aria-label="Scenario file to open"
        hidden
        onChange={(event) => void open(event)}
      />
      {problems.length > 0 && (
        <div className="field-error" role="alert">
          {problems.map((line, k) => (
            <p key={k}>{line}</p>
          ))}
        </div>
      )}
      {note && <p role="status">{note}</p>}
    </div>
  );
}
