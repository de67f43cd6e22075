/**
 * The workbench: run controls, the long profile and the along-flow plots at the selected model
 * year in the middle; the numbers and time series beside them; the editor, projects and
 * parameters in the side column. Every results view reads the same selected frame.
 */
import { useEffect, type ReactNode } from 'react';
import { useRunStore } from '../state/runStore';
import { useScenarioStore } from '../state/scenarioStore';
import { CautionNotice } from './CautionNotice';
import { EditorPanels } from './edit/EditorPanels';
import { ProfileEditToolbar } from './edit/ProfileEditToolbar';
import { ParameterSummary } from './ParameterSummary';
import { ProjectNotice } from './ProjectNotice';
import { useProjects, useProjectsStore } from './projects/ProjectsContext';
import { ProjectsPanel } from './projects/ProjectsPanel';
import { ExportPanel } from './export/ExportPanel';
import { FlowFieldsView } from './results/FlowFieldsView';
import { NumbersPanel } from './results/NumbersPanel';
import { ProfilePanel } from './results/ProfilePanel';
import { TimeSeriesView } from './results/TimeSeriesView';
import { AnalysesPanel } from './analyses/AnalysesPanel';
import { StorageNotice } from './StorageNotice';
import { TabNotice } from './TabNotice';
import { UpdateNotice } from './UpdateNotice';
import { useStaggeredMount } from './results/useStaggeredMount';
import { PlaybackControls } from './run/PlaybackControls';
import { useRunClient } from './run/RunClientContext';
import { RunControls } from './run/RunControls';
import { useKeyboardShortcuts } from './run/useKeyboardShortcuts';
import { useViewStore } from '../state/viewStore';
import { ExperimentsView } from './experiments/ExperimentsView';
import { ViewSwitch } from './experiments/ViewSwitch';

/**
 * Opens saved projects (init runs once per store, so StrictMode's second effect only waits for
 * the first); from then on the store saves edits, also when the page is hidden or closed.
 */
function useProjectsOnce() {
  const projects = useProjectsStore();
  useEffect(() => {
    void projects.getState().init();
  }, [projects]);
}

/** Starts the model worker and compiles the engine shortly after the page opens, so the first
 * Run does not pay for it. */
function usePreparedRunClient() {
  const client = useRunClient();
  useEffect(() => {
    const id = setTimeout(() => client.prepare?.(), 300);
    return () => clearTimeout(id);
  }, [client]);
}

/**
 * Shows its children once a run has a frame, `delay` animation frames after the first (see
 * useStaggeredMount). It subscribes on its own, so the arrival of results re-renders these
 * few wrappers and not the whole page.
 */
function WithResults({ delay, children }: { delay: number; children: ReactNode }) {
  // A narrow selector: true from the first frame on, not a new value with every frame.
  const hasFrame = useRunStore((s) => s.frames.length > 0);
  return useStaggeredMount(hasFrame, delay) ? children : null;
}

export function App() {
  useProjectsOnce();
  usePreparedRunClient();
  useKeyboardShortcuts();
  const scenario = useScenarioStore((s) => s.scenario);
  const projectName = useProjects((s) => s.projects.find((p) => p.id === s.currentId)?.name);
  const view = useViewStore((s) => s.view);

  return (
    <div className="app">
      <header className="app-header">
        <h1>Firnline</h1>
        <p className="project-title" role="group" aria-label="Project">
          {projectName ?? scenario.name ?? 'Untitled scenario'}
        </p>
        <StorageNotice />
        <TabNotice />
        <ProjectNotice />
        <ViewSwitch />
      </header>
      {/* Hidden, not unmounted, while the experiments are shown: the workbench keeps its state. */}
      <main className="workbench" hidden={view !== 'workbench'}>
        <div className="main-column">
          <RunControls />
          <ProfilePanel />
          <ProfileEditToolbar />
          <PlaybackControls />
          <WithResults delay={1}>
            <FlowFieldsView />
          </WithResults>
          <WithResults delay={2}>
            <ExportPanel />
          </WithResults>
        </div>
        <aside className="results-column" aria-label="Results">
          <NumbersPanel />
          <WithResults delay={2}>
            <section className="panel" aria-labelledby="series-heading">
              <h2 id="series-heading">Through time</h2>
              <TimeSeriesView />
            </section>
          </WithResults>
          <AnalysesPanel />
          <CautionNotice />
        </aside>
        <div className="side-column">
          <EditorPanels />
          <ProjectsPanel />
          <ParameterSummary scenario={scenario} />
        </div>
      </main>
      {view === 'experiments' && <ExperimentsView />}
      <UpdateNotice />
      <footer className="app-footer">
        <CautionNotice />
      </footer>
    </div>
  );
}
