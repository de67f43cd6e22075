/**
 * Says that another tab saves the open project and this one is read-only, with the way to make
 * this tab's version the one that is kept.
 */
import { useProjects, useProjectsStore } from './projects/ProjectsContext';
import './notices.css';

export function TabNotice() {
  const readOnly = useProjects((s) => s.readOnly);
  const projects = useProjectsStore();
  if (!readOnly) return null;
  return (
    <p className="storage-warning storage-notice" role="alert">
      {readOnly}
      <button type="button" onClick={() => void projects.getState().takeOver()}>
        Take over
      </button>
    </p>
  );
}
