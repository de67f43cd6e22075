/**
 * The workbench on one screen: the parameters in a column of their own, the run controls, long
 * profile, editing tools and model-year slider in the middle, and the supporting views (numbers,
 * plots, analyses, export, projects) behind tabs below or beside it. Every results view reads the
 * same selected frame.
 */
import { useEffect, useRef } from 'react';
import { useScenarioStore } from '../state/scenarioStore';
import { CautionNotice } from './CautionNotice';
import { EditorPanels } from './edit/EditorPanels';
import { ProfileEditToolbar } from './edit/ProfileEditToolbar';
import { UndoRedoBar } from './edit/UndoRedoBar';
import { ProjectNotice } from './ProjectNotice';
import { useProjects, useProjectsStore } from './projects/ProjectsContext';
import { ProfilePanel } from './results/ProfilePanel';
import { StorageNotice } from './StorageNotice';
import { TabNotice } from './TabNotice';
import { UpdateNotice } from './UpdateNotice';
import { PlaybackControls } from './run/PlaybackControls';
import { useRunClient } from './run/RunClientContext';
import { RunControls } from './run/RunControls';
import { useKeyboardShortcuts } from './run/useKeyboardShortcuts';
import { useViewStore } from '../state/viewStore';
import { ExperimentsView } from './experiments/ExperimentsView';
import { ViewSwitch } from './experiments/ViewSwitch';
import { SecondaryViews } from './layout/SecondaryViews';
import { SplitHandle, useViewsShare } from './layout/SplitHandle';

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

export function App() {
  useProjectsOnce();
  usePreparedRunClient();
  useKeyboardShortcuts();
  const scenario = useScenarioStore((s) => s.scenario);
  const projectName = useProjects((s) => s.projects.find((p) => p.id === s.currentId)?.name);
  const view = useViewStore((s) => s.view);
  const workbench = useRef<HTMLElement>(null);
  const [viewsShare, setViewsShare] = useViewsShare(workbench);

  return (
    <div className="app">
      <header className="app-header">
        <h1>Firnline</h1>
        <p className="project-title" aria-label="Project">
          {projectName ?? scenario.name ?? 'Untitled scenario'}
        </p>
        <StorageNotice />
        <TabNotice />
        <ProjectNotice />
        <ViewSwitch />
      </header>
      {/* Hidden, not unmounted, while the experiments are shown: the workbench keeps its state.
          One screen: parameters, the profile with its controls, and the supporting views. */}
      <main className="workbench" hidden={view !== 'workbench'} ref={workbench}>
        <section className="parameter-column" aria-label="Parameters">
          <EditorPanels />
        </section>
        <div className="stage">
          <div className="stage-bar">
            <RunControls />
            <UndoRedoBar />
          </div>
          <ProfilePanel />
          <div className="profile-tools">
            <ProfileEditToolbar />
            <PlaybackControls />
          </div>
        </div>
        <SplitHandle share={viewsShare} onShare={setViewsShare} container={workbench} controls="secondary-views" />
        <SecondaryViews />
      </main>
      {view === 'experiments' && <ExperimentsView />}
      <UpdateNotice />
      <footer className="app-footer">
        <CautionNotice />
      </footer>
    </div>
  );
}
