/**
 * Run, pause/resume, stop and step one output; where the run is (spin-up in model years, then
 * the run's progress); and a marker when the results are older than the scenario.
 */
import type { ReactNode } from 'react';
import { isActive, useResultsStale, useRunStore } from '../../state/runStore';
import { useScenarioStore } from '../../state/scenarioStore';
import { useRunClient } from './RunClientContext';
import { runStatusText } from './runStatusText';

/** `tools`: controls that share the button row (the workbench puts undo and redo there). */
export function RunControls({ tools }: { tools?: ReactNode } = {}) {
  const client = useRunClient();
  const status = useRunStore((s) => s.status);
  const progress = useRunStore((s) => s.progress);
  const frameCount = useRunStore((s) => s.frames.length);
  const failure = useRunStore((s) => s.failure);
  const notice = useRunStore((s) => s.notice);
  const summary = useRunStore((s) => s.summary);
  const stale = useResultsStale();
  const active = isActive(status);
  const canPause = status === 'spinning-up' || status === 'running';

  const run = (options?: { paused: boolean }) => {
    const { scenario, revision } = useScenarioStore.getState();
    client.run(scenario, revision, options);
  };
  // With no run going on, stepping starts a new run held at its start, then steps it.
  const step = () => {
    if (!active) run({ paused: true });
    client.step();
  };

  return (
    <section className="run-controls" aria-label="Run">
      <div className="button-row">
        <button type="button" className="primary" onClick={() => run()} disabled={active}>
          {status === 'idle' ? 'Run' : 'Run again'}
        </button>
        <button
          type="button"
          onClick={() => (status === 'paused' ? client.resume() : client.pause())}
          disabled={!canPause && status !== 'paused'}
        >
          {status === 'paused' ? 'Resume' : 'Pause'}
        </button>
        <button type="button" onClick={() => client.stop()} disabled={!active}>
          Stop
        </button>
        <button type="button" onClick={step} disabled={active && status !== 'paused'}>
          Step one output
        </button>
        {tools}
      </div>
      <div className="run-status">
        <RunProgressBar />
        <p className={status === 'failed' ? 'status failed' : 'status'} role="status">
          {runStatusText(status, progress, frameCount, failure, summary)}
        </p>
        {/* In the status row, whose height is kept for it: the profile below does not jump. */}
        {stale && (
          <p className="stale" role="status">
            Results are out of date: the scenario has changed since this run. Run again to update them.
          </p>
        )}
      </div>
      {summary && summary.warnings.length > 0 && (
        // One line until opened: a list of warnings would push the profile off the screen.
        <details className="run-warnings">
          <summary>{`${summary.warnings.length} ${summary.warnings.length === 1 ? 'warning' : 'warnings'} from the run`}</summary>
          <ul aria-label="Warnings from the run">
            {summary.warnings.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
        </details>
      )}
      {notice && (
        <p className="notice" role="alert">
          {notice}
        </p>
      )}
    </section>
  );
}

function RunProgressBar() {
  const status = useRunStore((s) => s.status);
  const progress = useRunStore((s) => s.progress);
  if (!progress || (status !== 'spinning-up' && status !== 'running' && status !== 'paused')) return null;
  if (progress.phase === 'spinup') {
    // The spin-up ends at a steady state, usually long before its limit: no fraction to show.
    return <progress className="run-progress" aria-label={`Spin-up, ${progress.year} model years`} />;
  }
  return (
    <progress
      className="run-progress"
      aria-label="Run progress in model years"
      max={progress.of || 1}
      value={progress.year}
    />
  );
}
