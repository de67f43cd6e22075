/**
 * The views that support the long profile, one at a time behind tabs so that the profile, the run
 * and playback controls and the parameters all stay on one screen: the numbers at the selected
 * year, speed and stress along the flow, the series through time, the analyses, export, projects
 * and the parameter summary. Every view stays mounted (hidden when not shown): typed inputs,
 * analysis results and scroll positions survive switching.
 */
import { useId, useState, type ReactNode } from 'react';
import { useRunStore } from '../../state/runStore';
import { useScenarioStore } from '../../state/scenarioStore';
import { AnalysesPanel } from '../analyses/AnalysesPanel';
import { ExportPanel } from '../export/ExportPanel';
import { ParameterSummary } from '../ParameterSummary';
import { ProjectsPanel } from '../projects/ProjectsPanel';
import { FlowFieldsView } from '../results/FlowFieldsView';
import { NumbersPanel } from '../results/NumbersPanel';
import { TimeSeriesView } from '../results/TimeSeriesView';
import { useStaggeredMount } from '../results/useStaggeredMount';
import { TabStrip, tabPanelProps } from './TabStrip';

const VIEWS = [
  { key: 'numbers', label: 'Numbers' },
  { key: 'fields', label: 'Speed and stress' },
  { key: 'series', label: 'Through time' },
  { key: 'analyses', label: 'Analyses' },
  { key: 'export', label: 'Export' },
  { key: 'projects', label: 'Projects' },
  { key: 'summary', label: 'Summary' },
] as const;
type View = (typeof VIEWS)[number]['key'];

/**
 * Shows its children once a run has a frame, `delay` animation frames after the first (see
 * useStaggeredMount), and a short note before. It subscribes on its own, so the arrival of
 * results re-renders these few wrappers and not the whole page.
 */
function WithResults({ delay, children }: { delay: number; children: ReactNode }) {
  // A narrow selector: true from the first frame on, not a new value with every frame.
  const hasFrame = useRunStore((s) => s.frames.length > 0);
  const mounted = useStaggeredMount(hasFrame, delay);
  if (!hasFrame) return <p className="empty">No results yet. Press Run to compute them.</p>;
  return mounted ? children : null;
}

function Summary() {
  const scenario = useScenarioStore((s) => s.scenario);
  return <ParameterSummary scenario={scenario} />;
}

export function SecondaryViews() {
  const id = useId();
  const [view, setView] = useState<View>('numbers');
  return (
    <section className="secondary-views" id="secondary-views" aria-label="Results and tools">
      <TabStrip tabs={VIEWS} selected={view} onSelect={setView} idBase={id} label="Results and tools" className="tabs view-tabs" />
      <div className="secondary-body">
        <div {...tabPanelProps(id, 'numbers', view)}>
          <NumbersPanel />
        </div>
        {/* The plots are drawn only while shown: hidden, they would still redraw with every frame. */}
        <div {...tabPanelProps(id, 'fields', view)}>
          {view === 'fields' && (
            <WithResults delay={1}>
              <FlowFieldsView />
            </WithResults>
          )}
        </div>
        <div {...tabPanelProps(id, 'series', view)}>
          {view === 'series' && (
          <WithResults delay={2}>
            <section aria-labelledby="series-heading">
              <h2 id="series-heading" className="visually-hidden">
                Through time
              </h2>
              <TimeSeriesView />
            </section>
          </WithResults>
          )}
        </div>
        <div {...tabPanelProps(id, 'analyses', view)}>
          <AnalysesPanel />
        </div>
        <div {...tabPanelProps(id, 'export', view)}>
          <WithResults delay={2}>
            <ExportPanel />
          </WithResults>
        </div>
        <div {...tabPanelProps(id, 'projects', view)}>
          <ProjectsPanel />
        </div>
        <div {...tabPanelProps(id, 'summary', view)}>
          <Summary />
        </div>
      </div>
    </section>
  );
}
