/**
 * Makes one variant from the base: a name and the values that differ (empty fields keep the
 * base's value). The variant's scenario is checked by the one scenario validator and the whole
 * experiment by the experiment validator; a refusal names the field and what is allowed, and
 * nothing is added.
 */
import { useState } from 'react';
import type { ValidExperiment } from '../../experiment/validateExperiment';
import { LocalNumberInput } from '../edit/LocalNumberInput';
import { parseTypedNumber } from '../edit/parseTypedNumber';
import { applyExperimentEdit } from './applyExperimentEdit';
import { FieldMessages } from './FieldMessages';
import { describeValues, unitFor, VARIANT_FIELDS, variantPatch, type VariantFieldKey, type VariantValues } from './variantFields';

const EMPTY: Record<VariantFieldKey, string> = { warmingEnd: '', warmingYear: '', elaShift: '', rateFactor: '', slidingC: '' };

export function VariantForm({ experiment, disabled }: { experiment: ValidExperiment; disabled: boolean }) {
  const [name, setName] = useState('');
  const [texts, setTexts] = useState(EMPTY);
  const [errors, setErrors] = useState<string[]>([]);
  const [note, setNote] = useState<string | null>(null);

  async function add() {
    setNote(null);
    const values: VariantValues = {};
    const problems: string[] = [];
    for (const f of VARIANT_FIELDS) {
      const text = texts[f.key].trim();
      if (text === '') continue;
      const parsed = parseTypedNumber(text);
      if (parsed.ok) values[f.key] = parsed.value;
      else problems.push(`${f.label}: ${parsed.message}`);
    }
    if (problems.length) return setErrors(problems);
    const patch = variantPatch(experiment.base, values);
    if (!patch.ok) return setErrors(patch.errors.map((e) => `${e.field}: ${e.message}`));
    const variantName = name.trim() || describeValues(values);
    const refused = await applyExperimentEdit({ ...experiment, variants: [...(experiment.variants ?? []), { name: variantName, set: patch.set }] });
    setErrors(refused);
    if (refused.length === 0) {
      setNote(`Added variant "${variantName}".`);
      setName('');
    }
  }

  return (
    <section className="panel" aria-labelledby="variant-form-heading">
      <h2 id="variant-form-heading">Add a variant</h2>
      <p className="field-help">Fill in only what differs from the base; empty fields keep the base's value.</p>
      <form
        className="variant-form"
        onSubmit={(event) => {
          event.preventDefault();
          void add();
        }}
      >
        <div className="field">
          <label htmlFor="variant-name">Name</label>
          <input id="variant-name" type="text" value={name} maxLength={200} placeholder="from the values" onChange={(e) => setName(e.target.value)} />
        </div>
        {VARIANT_FIELDS.map((f) => (
          <LocalNumberInput key={f.key} label={f.label} unit={unitFor(f.unit, experiment.base)} value={texts[f.key]} help={f.help} onChange={(text) => setTexts({ ...texts, [f.key]: text })} />
        ))}
        <button type="submit" disabled={disabled}>
          Add variant
        </button>
      </form>
      <FieldMessages errors={errors} note={note} />
    </section>
  );
}
