/** A labelled number input for a form that is applied later (generator, plastic fill): text only, checked on apply. */
import { useId } from 'react';

export interface LocalNumberInputProps {
  label: string;
  unit: string;
  value: string;
  onChange: (text: string) => void;
  help?: string;
}

export function LocalNumberInput({ label, unit, value, onChange, help }: LocalNumberInputProps) {
  const id = useId();
  return (
    <div className="field">
      <label htmlFor={id}>
        {label} ({unit})
      </label>
      <input id={id} type="text" inputMode="decimal" value={value} onChange={(e) => onChange(e.target.value)} aria-describedby={help ? `${id}-help` : undefined} />
      {help && (
        <p id={`${id}-help`} className="field-help">
          {help}
        </p>
      )}
    </div>
  );
}
