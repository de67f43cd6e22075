/**
 * Says at the top of the page when a saved project could not be opened (or was opened from its
 * previous version): the side column's project list is below the fold on most screens, and this
 * must be seen before the user works on.
 */
import { useProjects, useProjectsStore } from './projects/ProjectsContext';
import './notices.css';

export function ProjectNotice() {
  const error = useProjects((s) => s.error);
  const projects = useProjectsStore();
  if (!error) return null;
  return (
    <p className="storage-notice project-notice" role="alert">
      <span className="notice-text">{error}</span>
      <button type="button" onClick={() => projects.setState({ error: null })}>
        Dismiss
      </button>
    </p>
  );
}
