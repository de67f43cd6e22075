/** A warming ladder: one variant per warming from a first to a last value in equal steps, reached by one year. */
import { useState } from 'react';
import type { ValidExperiment } from '../../experiment/validateExperiment';
import { LocalNumberInput } from '../edit/LocalNumberInput';
import { readFormNumbers } from '../edit/readFormNumbers';
import { useSetForm } from './useSetForm';
import { warmingLadder, type SetResult } from './experimentSets';
import { FieldMessages } from './FieldMessages';

export function LadderForm({ experiment, disabled }: { experiment: ValidExperiment; disabled: boolean }) {
  const [f, setF] = useState(() => ({ from: '1', to: '3', step: '1', year: String(Math.min(80, experiment.base.run.years)) }));
  const set = (key: keyof typeof f) => (text: string) => setF({ ...f, [key]: text });

  function make(): SetResult | string[] {
    const read = readFormNumbers({
      from: { label: 'From', unit: 'K', text: f.from, min: -50, max: 50 },
      to: { label: 'To', unit: 'K', text: f.to, min: -50, max: 50 },
      step: { label: 'Step', unit: 'K', text: f.step, min: 0, above: true, max: 100 },
      year: { label: 'By year', unit: 'a', text: f.year, min: 0, above: true, max: 1_000_000 },
    });
    if (!read.ok) return read.errors;
    const { from, to, step, year } = read.values;
    return warmingLadder(experiment, { fromK: from, toK: to, stepK: step, year });
  }
  const form = useSetForm(make);

  return (
    <form className="set-form" aria-label="Warming ladder" onSubmit={form.onSubmit}>
      <h3>Warming ladder</h3>
      <div className="field-grid">
        <LocalNumberInput label="From" unit="K" value={f.from} onChange={set('from')} />
        <LocalNumberInput label="To" unit="K" value={f.to} onChange={set('to')} />
        <LocalNumberInput label="Step" unit="K" value={f.step} onChange={set('step')} />
        <LocalNumberInput label="By year" unit="a" value={f.year} onChange={set('year')} />
      </div>
      <p className="field-help">One variant per warming, each rising linearly from 0 K at year 0 and held after.</p>
      <button type="submit" disabled={disabled}>
        Add ladder
      </button>
      <FieldMessages errors={form.errors} note={form.note} />
    </form>
  );
}
