/**
 * Says that another tab saves the open project and this one is read-only, with the way to make
 * this tab's version the one that is kept.
 */
import { useProjectStore } from '../state/projectStore';
import './notices.css';

export function TabNotice() {
  const readOnly = useProjectStore((s) => s.readOnly);
  if (!readOnly) return null;
  return (
    <p className="storage-warning storage-notice" role="alert">
      {readOnly}
      <button type="button" onClick={() => void useProjectStore.getState().takeOver()}>
        Take over
      </button>
    </p>
  );
}
