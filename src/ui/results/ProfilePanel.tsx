/**
 * The long profile at the selected year (or the scenario's initial state), with the steady glacier
 * of the current climate drawn over it after every edit (useSteadyPreview) and said in words
 * underneath. The only part of the page besides the other results views that re-renders when the
 * selected frame changes.
 */
import { useRef } from 'react';
import { useResultsStale, useRunStore } from '../../state/runStore';
import { useScenarioStore } from '../../state/scenarioStore';
import { LongProfileView, type SteadyOverlay } from '../LongProfileView';
import { SteadyPreviewBar } from './SteadyPreviewBar';
import { useProfileResult } from './useProfileResult';
import { useSpinUpPreview } from './useSpinUpPreview';
import { useElementSize } from '../layout/useElementSize';
import { useSteadyPreview } from './useSteadyPreview';

export function ProfilePanel() {
  // The plot fills the space the layout gives it (the page is laid out to fit one screen).
  const frameRef = useRef<HTMLDivElement>(null);
  const frame = useElementSize(frameRef);
  const scenario = useScenarioStore((s) => s.scenario);
  const preview = useSpinUpPreview();
  const output = useProfileResult();
  const result = preview ?? output;
  const stale = useResultsStale();
  const hasFrames = useRunStore((s) => s.frames.length > 0);
  const steadyView = useSteadyPreview();
  // The glacier object itself (stable between renders), so the profile redraws it only when it changes.
  const steady: SteadyOverlay | null = steadyView.kind === 'glacier' && !steadyView.glacier.iceFree ? steadyView.glacier : null;
  const heading = preview
    ? 'Long profile during the spin-up'
    : result
    ? `Long profile at year ${result.time}`
    : stale && hasFrames
      ? 'Long profile of the edited scenario, initial state'
      : 'Long profile, initial state';
  return (
    <section className="profile" aria-labelledby="profile-heading">
      {/* The plot names the state in its corner; the heading is for screen readers. */}
      <h2 id="profile-heading" className="visually-hidden">
        {heading}
      </h2>
      <div className="profile-frame" ref={frameRef}>
        <LongProfileView scenario={scenario} result={result} frame={frame} steady={steady} />
      </div>
      <SteadyPreviewBar view={steadyView} />
    </section>
  );
}
