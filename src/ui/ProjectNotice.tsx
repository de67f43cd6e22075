/**
 * Says at the top of the page when a saved project could not be opened (or was opened from its
 * previous version): the side column's project list is below the fold on most screens, and this
 * must be seen before the user works on.
 */
import { useProjectStore } from '../state/projectStore';
import './notices.css';

export function ProjectNotice() {
  const error = useProjectStore((s) => s.error);
  if (!error) return null;
  return (
    <p className="storage-notice project-notice" role="alert">
      <span className="notice-text">{error}</span>
      <button type="button" onClick={() => useProjectStore.setState({ error: null })}>
        Dismiss
      </button>
    </p>
  );
}
