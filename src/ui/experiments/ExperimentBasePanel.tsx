/**
 * The experiment's base: the workbench scenario when the experiment was made (or the one in an
 * opened file). Taking the base again keeps the variants and sweeps and goes through the
 * validator: a variant that no longer fits the new base is refused with its reason.
 */
import { useMemo } from 'react';
import type { ValidExperiment } from '../../experiment/validateExperiment';
import { useScenarioStore } from '../../state/scenarioStore';
import { applyExperimentEdit } from './applyExperimentEdit';

export function ExperimentBasePanel({ experiment, disabled, onProblem }: { experiment: ValidExperiment; disabled: boolean; onProblem: (lines: string[]) => void }) {
  const workbench = useScenarioStore((s) => s.scenario);
  const base = experiment.base;
  // Compared as text: the base may come from a file, so identity says nothing.
  const differs = useMemo(() => JSON.stringify(workbench) !== JSON.stringify(base), [workbench, base]);
  const balance = base.massBalance.model === 'linear' ? `linear balance, ELA ${base.massBalance.ela} m a.s.l.` : `${base.massBalance.model} balance`;

  return (
    <section className="panel" aria-labelledby="base-heading">
      <h2 id="base-heading">Base scenario</h2>
      <p className="base-name">{base.name ?? 'Untitled scenario'}</p>
      <p className="field-help">
        {(base.grid.length / 1000).toFixed(1)} km flowline, {balance}, run of {base.run.years} a with outputs every {base.run.outputEvery} a
        {base.spinup ? ', spin-up to a steady state first' : ''}.
      </p>
      {differs && <p className="experiment-note">The workbench scenario differs from this base.</p>}
      <button type="button" onClick={() => void applyExperimentEdit({ ...experiment, base: workbench }).then(onProblem)} disabled={disabled || !differs}>
        Take the workbench scenario as base
      </button>
    </section>
  );
}
