/** A sweep of one parameter over a range, stored in the experiment as a JSON Pointer sweep. */
import { useState } from 'react';
import type { ValidExperiment } from '../../experiment/validateExperiment';
import type { Scenario } from '../../model/scenario';
import { LocalNumberInput } from '../edit/LocalNumberInput';
import { readFormNumbers } from '../edit/readFormNumbers';
import { useSetForm } from './useSetForm';
import { parameterSweep, SWEEP_PARAMETERS, type SweepParameter, type SetResult } from './experimentSets';
import { FieldMessages } from './FieldMessages';
import { unitFor } from './variantFields';

function defaults(parameter: SweepParameter, base: Scenario) {
  if (parameter === 'A') return { from: '1.2e-24', to: '4.8e-24', count: '3', spacing: 'logarithmic' as const };
  if (parameter === 'C') return { from: '0', to: '6e-14', count: '3', spacing: 'linear' as const };
  const ela = base.massBalance.model === 'linear' ? base.massBalance.ela : 3000;
  return { from: String(ela - 100), to: String(ela + 100), count: '3', spacing: 'linear' as const };
}

export function SweepForm({ experiment, disabled }: { experiment: ValidExperiment; disabled: boolean }) {
  const base = experiment.base;
  const [parameter, setParameter] = useState<SweepParameter>('A');
  const [f, setF] = useState<{ from: string; to: string; count: string; spacing: 'linear' | 'logarithmic' }>(() => defaults('A', base));
  const unit = unitFor(SWEEP_PARAMETERS[parameter].unit, base);

  function choose(next: SweepParameter) {
    setParameter(next);
    setF(defaults(next, base));
    form.clearErrors();
  }

  function make(): SetResult | string[] {
    const read = readFormNumbers({
      from: { label: 'From', unit: unit, text: f.from },
      to: { label: 'To', unit: unit, text: f.to },
      count: { label: 'Values', text: f.count, min: 2, max: 10_000 },
    });
    if (!read.ok) return read.errors;
    return parameterSweep(experiment, { parameter, ...read.values, spacing: f.spacing });
  }
  const form = useSetForm(make);

  return (
    <form className="set-form" aria-label="Parameter sweep" onSubmit={form.onSubmit}>
      <h3>Sweep one parameter</h3>
      <div className="field">
        <label htmlFor="sweep-parameter">Parameter</label>
        <select id="sweep-parameter" value={parameter} onChange={(e) => choose(e.target.value as SweepParameter)}>
          {(Object.keys(SWEEP_PARAMETERS) as SweepParameter[]).map((p) => (
            <option key={p} value={p}>
              {SWEEP_PARAMETERS[p].label}
            </option>
          ))}
        </select>
      </div>
      <div className="field-grid">
        <LocalNumberInput label="From" unit={unit} value={f.from} onChange={(t) => setF({ ...f, from: t })} />
        <LocalNumberInput label="To" unit={unit} value={f.to} onChange={(t) => setF({ ...f, to: t })} />
        <LocalNumberInput label="Values" unit="count" value={f.count} onChange={(t) => setF({ ...f, count: t })} />
        <div className="field">
          <label htmlFor="sweep-spacing">Spacing</label>
          <select id="sweep-spacing" value={f.spacing} onChange={(e) => setF({ ...f, spacing: e.target.value as 'linear' | 'logarithmic' })}>
            <option value="linear">linear</option>
            <option value="logarithmic">logarithmic</option>
          </select>
        </div>
      </div>
      <p className="field-help">Every variant (or the base) runs with each value; the charts show the spread.</p>
      <button type="submit" disabled={disabled}>
        Set sweep
      </button>
      <FieldMessages errors={form.errors} note={form.note} />
    </form>
  );
}
