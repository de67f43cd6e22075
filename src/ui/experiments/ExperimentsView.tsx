/**
 * The experiments view: build an experiment from the workbench scenario (variants by typed
 * values, or a ladder, a sweep or a spread), run its members on a pool of workers, and compare
 * them. The caution stays on screen beside the results.
 */
import { useEffect, useState } from 'react';
import { useExperimentStore } from '../../state/experimentStore';
import { useScenarioStore } from '../../state/scenarioStore';
import { MEMBERS_CHECKED_HERE } from '../../worker/experimentCheckClient';
import { CautionNotice } from '../CautionNotice';
import { ExperimentBasePanel } from './ExperimentBasePanel';
import { ExperimentFileButtons } from './ExperimentFileButtons';
import { ExperimentResults } from './ExperimentResults';
import { ExperimentRunPanel } from './ExperimentRunPanel';
import { FieldMessages } from './FieldMessages';
import { LadderForm } from './LadderForm';
import { MemberList } from './MemberList';
import { SpreadForm } from './SpreadForm';
import { SweepForm } from './SweepForm';
import { VariantForm } from './VariantForm';
import '../edit/edit.css';
import './experiments.css';

export function ExperimentsView() {
  const experiment = useExperimentStore((s) => s.experiment);
  const members = useExperimentStore((s) => s.members);
  // Nothing changes the experiment while it runs or while a change is being checked.
  const busy = useExperimentStore((s) => s.runStatus === 'running' || s.checking > 0);
  const checking = useExperimentStore((s) => s.checking);
  const [problems, setProblems] = useState<string[]>([]);

  // The first visit makes an experiment whose base is the workbench scenario.
  useEffect(() => {
    if (!useExperimentStore.getState().experiment) useExperimentStore.getState().startFrom(useScenarioStore.getState().scenario);
  }, [experiment]);

  if (!experiment) return null;
  return (
    <main className="experiments" aria-label="Experiments">
      <div className="experiments-build">
        <ExperimentBasePanel experiment={experiment} disabled={busy} onProblem={setProblems} />
        <MemberList experiment={experiment} disabled={busy} onProblem={setProblems} />
        {checking > MEMBERS_CHECKED_HERE && (
          <p className="experiment-note" role="status">
            Checking {checking.toLocaleString('en-GB')} members with the validator…
          </p>
        )}
        <FieldMessages errors={problems} />
        <VariantForm experiment={experiment} disabled={busy} />
        <section className="panel" aria-labelledby="sets-heading">
          <h2 id="sets-heading">Add a common set</h2>
          <LadderForm experiment={experiment} disabled={busy} />
          <SweepForm experiment={experiment} disabled={busy} />
          <SpreadForm experiment={experiment} disabled={busy} />
        </section>
        <ExperimentFileButtons experiment={experiment} disabled={busy} />
      </div>
      <div className="experiments-results">
        <h2 className="experiment-title">{experiment.name ?? 'Experiment'}</h2>
        <ExperimentRunPanel />
        <CautionNotice />
        <ExperimentResults experiment={experiment} members={members} />
      </div>
    </main>
  );
}
