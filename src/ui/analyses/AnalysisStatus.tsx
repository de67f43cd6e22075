/**
 * The state of one analysis under its start button: progress with Cancel while it runs, the
 * failure in words, a note when cancelled, and an "out of date" tag on a result made before the
 * last change to the scenario.
 */
import { useAnalysisStore, type AnalysisSlot } from '../../state/analysisStore';
import { useScenarioStore } from '../../state/scenarioStore';
import type { AnalysisKind } from '../../worker/analysisProtocol';
import { useAnalysisClient } from './AnalysisClientContext';

export function AnalysisStatus({ kind }: { kind: AnalysisKind }) {
  const slot = useAnalysisStore((s) => s[kind]) as AnalysisSlot<AnalysisKind>;
  const revision = useScenarioStore((s) => s.revision);
  const client = useAnalysisClient();
  return (
    <div className="analysis-status">
      {slot.status === 'running' && (
        <div className="analysis-progress" role="status">
          <progress
            max={1}
            value={slot.progress?.fraction}
            aria-label={`${kind} analysis progress`}
          />
          <span className="progress-text">{slot.progress ? `Computing: ${slot.progress.message}` : 'Starting…'}</span>
          <button type="button" onClick={() => client.cancel()}>
            Cancel
          </button>
        </div>
      )}
      {slot.status === 'failed' && (
        <p className="field-error" role="alert">
          The analysis failed: {slot.failure}
        </p>
      )}
      {slot.status === 'cancelled' && <p className="analysis-note" role="status">Cancelled.{slot.result ? ' The previous result is still shown.' : ''}</p>}
      {slot.result && slot.revision !== null && slot.revision !== revision && (
        <p className="stale-tag">Out of date: made before the last change to the scenario.</p>
      )}
    </div>
  );
}
