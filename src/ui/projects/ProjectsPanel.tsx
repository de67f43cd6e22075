/**
 * The project list: open, rename, duplicate and delete projects, and start new ones from the demo
 * or a blank valley. Deleting asks once, inline, because it cannot be undone.
 */
import { useState, type FormEvent } from 'react';
import type { ProjectMeta } from '../../state/projectStore';
import { useProjects, useProjectsStore } from './ProjectsContext';
import { useRunClient } from '../run/RunClientContext';
import { ScenarioFileButtons } from './ScenarioFileButtons';

export function ProjectsPanel() {
  const projects = useProjects((s) => s.projects);
  const currentId = useProjects((s) => s.currentId);
  const ready = useProjects((s) => s.ready);
  const client = useRunClient();
  const { create } = useProjectsStore().getState();
  // Results belong to the project they were made from; a run going on is stopped first.
  const stopThen = (action: () => Promise<void>) => () => {
    client.stop();
    void action();
  };

  return (
    <section className="projects panel" aria-labelledby="projects-heading">
      <h2 id="projects-heading">Projects</h2>
      {!ready && <p>Opening saved projects…</p>}
      <ul className="project-list">
        {projects.map((p) => (
          <ProjectRow key={p.id} project={p} current={p.id === currentId} stopThen={stopThen} />
        ))}
      </ul>
      <div className="button-row">
        <button type="button" onClick={stopThen(() => create('demo'))} disabled={!ready}>
          New from demo
        </button>
        <button type="button" onClick={stopThen(() => create('blank'))} disabled={!ready}>
          New blank valley
        </button>
      </div>
      <ScenarioFileButtons />
    </section>
  );
}

function ProjectRow({
  project,
  current,
  stopThen,
}: {
  project: ProjectMeta;
  current: boolean;
  stopThen: (action: () => Promise<void>) => () => void;
}) {
  const [mode, setMode] = useState<'view' | 'rename' | 'delete'>('view');
  const [draft, setDraft] = useState(project.name);
  const [problem, setProblem] = useState<string | null>(null);
  const { open, rename, duplicate, remove } = useProjectsStore().getState();

  const submitRename = async (event: FormEvent) => {
    event.preventDefault();
    const message = await rename(project.id, draft);
    setProblem(message);
    if (!message) setMode('view');
  };

  if (mode === 'rename') {
    const inputId = `rename-${project.id}`;
    const errorId = `rename-error-${project.id}`;
    return (
      <li className="project editing">
        <form onSubmit={submitRename}>
          <label htmlFor={inputId}>New name for “{project.name}”</label>
          <input
            id={inputId}
            value={draft}
            autoFocus
            maxLength={200}
            aria-invalid={problem ? true : undefined}
            aria-describedby={problem ? errorId : undefined}
            onChange={(e) => setDraft(e.target.value)}
            onKeyDown={(e) => e.key === 'Escape' && setMode('view')}
          />
          {problem && (
            <p id={errorId} className="field-error" role="alert">
              {problem}
            </p>
          )}
          <div className="button-row">
            <button type="submit">Save name</button>
            <button type="button" onClick={() => (setMode('view'), setProblem(null), setDraft(project.name))}>
              Cancel
            </button>
          </div>
        </form>
      </li>
    );
  }

  if (mode === 'delete') {
    return (
      <li className="project confirming" role="group" aria-label={`Delete ${project.name}?`}>
        <p>Delete “{project.name}”? This cannot be undone.</p>
        <div className="button-row">
          <button type="button" className="danger" onClick={stopThen(() => remove(project.id))}>
            Delete project
          </button>
          <button type="button" autoFocus onClick={() => setMode('view')}>
            Keep it
          </button>
        </div>
      </li>
    );
  }

  return (
    <li className={current ? 'project current' : 'project'} aria-current={current ? 'true' : undefined}>
      <button
        type="button"
        className="project-name"
        onClick={current ? undefined : stopThen(() => open(project.id))}
        aria-label={`Open ${project.name}`}
      >
        {project.name}
        {current && <span className="current-tag"> (open)</span>}
      </button>
      <span className="project-actions">
        <button type="button" onClick={() => (setDraft(project.name), setMode('rename'))} aria-label={`Rename ${project.name}`}>
          Rename
        </button>
        <button type="button" onClick={stopThen(() => duplicate(project.id))} aria-label={`Duplicate ${project.name}`}>
          Duplicate
        </button>
        <button type="button" onClick={() => setMode('delete')} aria-label={`Delete ${project.name}`}>
          Delete
        </button>
      </span>
    </li>
  );
}
