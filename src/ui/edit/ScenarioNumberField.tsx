/**
 * A labelled number field bound to one value of the scenario. The typed text is applied when the
 * field is left or Enter is pressed, as one undoable edit, but only if the complete scenario with
 * the new value passes the validator; otherwise the text stays as typed and the validator's
 * reason is shown under the field. Escape puts the current value back.
 */
import { useEffect, useId, useState, type KeyboardEvent } from 'react';
import type { Scenario } from '../../model/scenario';
import { useScenarioStore } from '../../state/scenarioStore';
import { commitEdit, errorsAt } from './commitEdit';
import { parseTypedNumber } from './parseTypedNumber';
import { NotApplied } from './NotApplied';
import { refusalShown } from './refusalShown';

export interface ScenarioNumberFieldProps {
  label: string;
  /** Unit as shown after the field, e.g. "m a.s.l." */
  unit: string;
  /** JSON pointer of the value, for picking the validator's messages. */
  path: string;
  /** Current value in the scenario's unit; undefined when the key is absent. */
  value: number | undefined;
  /** The complete scenario with the value set (undefined: key removed). */
  build: (scenario: Scenario, value: number | undefined) => Scenario;
  /** One line: what it is, the allowed range and the default's source. */
  help: string;
  /** Empty text removes the key (the model's default applies). */
  optional?: boolean;
  /** Shown value = scenario value * displayScale (e.g. 100 for "per 100 m"). */
  displayScale?: number;
}

function show(value: number | undefined, scale: number): string {
  if (value === undefined) return '';
  // Round away binary noise from the scaling (0.007 * 100 = 0.7000000000000001).
  return String(Number((value * scale).toPrecision(12)));
}

export function ScenarioNumberField({ label, unit, path, value, build, help, optional, displayScale = 1 }: ScenarioNumberFieldProps) {
  const id = useId();
  const [text, setText] = useState(show(value, displayScale));
  const [error, setError] = useState<string | null>(null);

  // Undo, redo or another edit changed the value: show it and forget any refused text.
  useEffect(() => {
    setText(show(value, displayScale));
    setError(null);
  }, [value, displayScale]);

  function commit() {
    const typed = text.trim();
    let next: number | undefined;
    if (typed === '') {
      if (!optional) {
        setError(`${label} needs a value; ${help}`);
        return;
      }
      next = undefined;
    } else {
      const parsed = parseTypedNumber(typed);
      if (!parsed.ok) {
        setError(parsed.message);
        return;
      }
      // Undo the display scaling without binary noise (0.9 / 100 = 0.009000000000000001).
      next = displayScale === 1 ? parsed.value : Number((parsed.value / displayScale).toPrecision(12));
    }
    if (next === value) {
      setError(null);
      return;
    }
    const scenario = useScenarioStore.getState().scenario;
    const result = commitEdit(build(scenario, next), next === undefined ? `Clear ${label}` : `Set ${label}`);
    if (result.ok) setError(null);
    // Refused in the field's own unit and scale, not the file's.
    else setError(errorsAt(result.errors, path).map((e) => (e.path === path ? refusalShown(e.message, displayScale, unit) : e.message)).join('; '));
  }

  function onKeyDown(event: KeyboardEvent<HTMLInputElement>) {
    if (event.key === 'Enter') commit();
    if (event.key === 'Escape') {
      setText(show(value, displayScale));
      setError(null);
    }
  }

  return (
    <div className={`field${error ? ' field-invalid' : ''}`}>
      <label htmlFor={id}>{label}</label>
      <span className="field-input">
        <input
          id={id}
          type="text"
          inputMode="decimal"
          value={text}
          placeholder={optional ? 'default' : undefined}
          aria-invalid={error !== null}
          aria-describedby={`${id}-help${error ? ` ${id}-error` : ''}`}
          onChange={(e) => setText(e.target.value)}
          onBlur={commit}
          onKeyDown={onKeyDown}
        />
        <span className="unit">{unit}</span>
      </span>
      <p id={`${id}-help`} className="field-help">
        {help}
      </p>
      <NotApplied message={error} id={`${id}-error`} />
    </div>
  );
}
