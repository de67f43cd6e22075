/**
 * The long profile at the selected year (or the scenario's initial state). The only part of the
 * page besides the other results views that re-renders when the selected frame changes.
 */
import { useResultsStale, useRunStore } from '../../state/runStore';
import { useScenarioStore } from '../../state/scenarioStore';
import { LongProfileView } from '../LongProfileView';
import { useProfileResult } from './useProfileResult';
import { useSpinUpPreview } from './useSpinUpPreview';

export function ProfilePanel() {
  const scenario = useScenarioStore((s) => s.scenario);
  const preview = useSpinUpPreview();
  const output = useProfileResult();
  const result = preview ?? output;
  const stale = useResultsStale();
  const hasFrames = useRunStore((s) => s.frames.length > 0);
  const heading = preview
    ? 'Long profile during the spin-up'
    : result
    ? `Long profile at year ${result.time}`
    : stale && hasFrames
      ? 'Long profile of the edited scenario, initial state'
      : 'Long profile, initial state';
  return (
    <section className="profile" aria-labelledby="profile-heading">
      <h2 id="profile-heading">{heading}</h2>
      <LongProfileView scenario={scenario} result={result} />
    </section>
  );
}
