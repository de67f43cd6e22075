/** A low / central / high spread of one quantity, as three variants. */
import { useState } from 'react';
import type { ValidExperiment } from '../../experiment/validateExperiment';
import { LocalNumberInput } from '../edit/LocalNumberInput';
import { readFormNumbers } from '../edit/readFormNumbers';
import { useSetForm } from './useSetForm';
import { spread, type SpreadQuantity, type SetResult } from './experimentSets';
import { FieldMessages } from './FieldMessages';
import { unitFor } from './variantFields';

const QUANTITIES: Record<SpreadQuantity, { label: string; unit: string; low: string; central: string; high: string }> = {
  warming: { label: 'Warming reached', unit: 'K', low: '1', central: '2', high: '4' },
  elaShift: { label: 'ELA shift', unit: 'm', low: '50', central: '100', high: '200' },
  rateFactor: { label: 'Rate factor A', unit: 'Pa⁻ⁿ s⁻¹', low: '1.2e-24', central: '2.4e-24', high: '4.8e-24' },
  slidingC: { label: 'Sliding coefficient C', unit: 'm a⁻¹ Pa⁻ᵐ', low: '0', central: '3e-14', high: '6e-14' },
};

export function SpreadForm({ experiment, disabled }: { experiment: ValidExperiment; disabled: boolean }) {
  const [quantity, setQuantity] = useState<SpreadQuantity>('warming');
  const q = { ...QUANTITIES[quantity], unit: unitFor(QUANTITIES[quantity].unit, experiment.base) };
  const [f, setF] = useState(() => ({ low: q.low, central: q.central, high: q.high, year: String(Math.min(80, experiment.base.run.years)) }));

  function choose(next: SpreadQuantity) {
    setQuantity(next);
    const d = QUANTITIES[next];
    setF({ ...f, low: d.low, central: d.central, high: d.high });
    form.clearErrors();
  }

  function make(): SetResult | string[] {
    const read = readFormNumbers({
      low: { label: 'Low', unit: q.unit, text: f.low },
      central: { label: 'Central', unit: q.unit, text: f.central },
      high: { label: 'High', unit: q.unit, text: f.high },
      year: { label: 'By year', unit: 'a', text: f.year, min: 0, above: true, max: 1_000_000 },
    });
    if (!read.ok) return read.errors;
    return spread(experiment, { quantity, ...read.values });
  }
  const form = useSetForm(make);

  return (
    <form className="set-form" aria-label="Low, central and high spread" onSubmit={form.onSubmit}>
      <h3>Low / central / high</h3>
      <div className="field">
        <label htmlFor="spread-quantity">Quantity</label>
        <select id="spread-quantity" value={quantity} onChange={(e) => choose(e.target.value as SpreadQuantity)}>
          {(Object.keys(QUANTITIES) as SpreadQuantity[]).map((k) => (
            <option key={k} value={k}>
              {QUANTITIES[k].label}
            </option>
          ))}
        </select>
      </div>
      <div className="field-grid">
        <LocalNumberInput label="Low" unit={q.unit} value={f.low} onChange={(t) => setF({ ...f, low: t })} />
        <LocalNumberInput label="Central" unit={q.unit} value={f.central} onChange={(t) => setF({ ...f, central: t })} />
        <LocalNumberInput label="High" unit={q.unit} value={f.high} onChange={(t) => setF({ ...f, high: t })} />
        {quantity === 'warming' && <LocalNumberInput label="By year" unit="a" value={f.year} onChange={(t) => setF({ ...f, year: t })} />}
      </div>
      <button type="submit" disabled={disabled}>
        Add spread
      </button>
      <FieldMessages errors={form.errors} note={form.note} />
    </form>
  );
}
