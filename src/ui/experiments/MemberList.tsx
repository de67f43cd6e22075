/**
 * What the experiment holds: its variants (each removable), its sweep and the member count, with
 * the limit. Removing goes through the validator like every edit.
 */
import { memberCount } from '../../experiment/experimentMembers';
import { EXPERIMENT_LIMITS, type Experiment } from '../../experiment/experimentSchema';
import { formatNumber } from '../../scenario/formatNumber';
import { applyExperimentEdit } from './applyExperimentEdit';
import { describePatch } from './describePatch';

function without<T>(list: readonly T[], k: number): T[] {
  return list.filter((_, i) => i !== k);
}

export function MemberList({ experiment, disabled, onProblem }: { experiment: Experiment; disabled: boolean; onProblem: (lines: string[]) => void }) {
  const variants = experiment.variants ?? [];
  const sweep = Object.entries(experiment.sweep ?? {});
  const count = memberCount(variants.length, experiment.sweep);

  const removeVariant = (k: number) => {
    const rest = without(variants, k);
    const { variants: _v, ...others } = experiment;
    void applyExperimentEdit(rest.length ? { ...experiment, variants: rest } : others).then(onProblem);
  };
  const removeSweep = (pointer: string) => {
    const rest = Object.fromEntries(sweep.filter(([p]) => p !== pointer));
    const { sweep: _s, ...others } = experiment;
    void applyExperimentEdit(Object.keys(rest).length ? { ...experiment, sweep: rest } : others).then(onProblem);
  };
  const removeAll = () => {
    const { variants: _v, sweep: _s, ...others } = experiment;
    void applyExperimentEdit(others).then(onProblem);
  };

  return (
    <section className="panel" aria-labelledby="members-heading">
      <h2 id="members-heading">Members</h2>
      <p className="member-count" role="status">
        {formatNumber(count)} member{count === 1 ? '' : 's'}
        {variants.length ? ` (${variants.length} variant${variants.length === 1 ? '' : 's'}` : ' (the base'}
        {sweep.length ? ` × ${sweep.map(([, v]) => v.length).join(' × ')} sweep values)` : ')'}; at most {formatNumber(EXPERIMENT_LIMITS.maxMembers)}.
      </p>
      {variants.length === 0 && <p className="field-help">No variants: the base runs alone. Add a variant or a set below.</p>}
      {variants.length > 0 && (
        <ol className="variant-list" aria-label="Variants">
          {variants.map((v, k) => (
            <li key={v.name}>
              <span className="variant-name">{v.name}</span>
              <span className="variant-set">{describePatch(v.set)}</span>
              <button type="button" className="small" onClick={() => removeVariant(k)} disabled={disabled} aria-label={`Remove variant ${v.name}`}>
                Remove
              </button>
            </li>
          ))}
        </ol>
      )}
      {sweep.length > 0 && (
        <ul className="variant-list" aria-label="Sweep">
          {sweep.map(([pointer, values]) => (
            <li key={pointer}>
              <span className="variant-name">Sweep {pointer}</span>
              <span className="variant-set">{values.map((v) => JSON.stringify(v)).join(', ')}</span>
              <button type="button" className="small" onClick={() => removeSweep(pointer)} disabled={disabled} aria-label={`Remove sweep ${pointer}`}>
                Remove
              </button>
            </li>
          ))}
        </ul>
      )}
      {(variants.length > 0 || sweep.length > 0) && (
        <button type="button" onClick={removeAll} disabled={disabled}>
          Remove all variants and sweeps
        </button>
      )}
    </section>
  );
}
