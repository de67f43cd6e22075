/**
 * Run and Cancel, and where each member is: waiting, spinning up, running (with its progress),
 * done, failed (with the reason) or cancelled. Long experiments list only the members at work.
 */
import { useExperimentStore, type MemberRunState } from '../../state/experimentStore';
import { useExperimentPool } from './ExperimentPoolContext';

/** Most members listed one by one; beyond it only those running or failed are. */
const LISTED_MEMBERS = 60;

function memberText(run: MemberRunState): string {
  switch (run.status) {
    case 'waiting':
      return 'waiting';
    case 'running':
      if (!run.progress) return 'starting';
      return run.progress.phase === 'spinup' ? `spin-up, year ${Math.round(run.progress.year)}` : `year ${Math.round(run.progress.year)} of ${run.progress.of}`;
    case 'done':
      return 'done';
    case 'failed':
      return `failed: ${run.message}`;
    case 'cancelled':
      return 'cancelled';
  }
}

function progressValue(run: MemberRunState): number | undefined {
  if (run.status === 'done') return 1;
  if (run.status === 'running' && run.progress?.phase === 'run' && run.progress.of > 0) return run.progress.year / run.progress.of;
  return run.status === 'running' ? undefined : 0;
}

export function ExperimentRunPanel() {
  const pool = useExperimentPool();
  const members = useExperimentStore((s) => s.members);
  const runs = useExperimentStore((s) => s.runs);
  const runStatus = useExperimentStore((s) => s.runStatus);
  const workers = useExperimentStore((s) => s.workers);
  const running = runStatus === 'running';
  const checking = useExperimentStore((s) => s.checking > 0);
  const runProblem = useExperimentStore((s) => s.runProblem);
  const done = runs.filter((r) => r.status === 'done').length;
  const failed = runs.filter((r) => r.status === 'failed').length;
  const listed = runs.length <= LISTED_MEMBERS ? runs.map((r, k) => [r, k] as const) : runs.map((r, k) => [r, k] as const).filter(([r]) => r.status === 'running' || r.status === 'failed');

  const status =
    runStatus === 'idle'
      ? `${members.length} member${members.length === 1 ? '' : 's'} ready to run.`
      : `${runStatus === 'running' ? `Running on ${workers} worker${workers === 1 ? '' : 's'}` : runStatus === 'done' ? 'Finished' : 'Cancelled'}: ` +
        `${done} of ${runs.length} done${failed ? `, ${failed} failed` : ''}.`;

  return (
    <section className="experiment-run" aria-label="Run the experiment">
      <div className="button-row">
        <button type="button" className="primary" onClick={() => void useExperimentStore.getState().run(pool)} disabled={running || checking || members.length === 0}>
          {runStatus === 'idle' ? 'Run experiment' : 'Run experiment again'}
        </button>
        <button type="button" onClick={() => useExperimentStore.getState().cancel()} disabled={!running}>
          Cancel
        </button>
      </div>
      <p className="status" role="status">
        {status}
      </p>
      {runProblem && (
        <p className="field-error" role="alert">
          {runProblem}
        </p>
      )}
      {listed.length > 0 && (
        <ul className="member-progress" aria-label="Member progress">
          {listed.map(([run, k]) => (
            <li key={k} className={run.status === 'failed' ? 'failed' : undefined} data-status={run.status}>
              <span className="member-progress-name">{members[k]?.name}</span>
              <progress max={1} value={progressValue(run)} aria-label={`Progress of ${members[k]?.name}`} />
              <span className="member-progress-text">{memberText(run)}</span>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
