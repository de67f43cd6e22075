/**
 * A small, non-blocking notice that a new version of the app is ready. Reloading is the user's
 * choice, so a run or an unsaved drag is never cut short.
 */
import { useUpdateStore } from '../pwa/updateStore';
import './notices.css';

export function UpdateNotice() {
  const { updateReady, applyUpdate, dismissed, dismiss } = useUpdateStore();
  if (!updateReady || dismissed || !applyUpdate) return null;
  return (
    <div className="update-notice" role="status">
      <span>A new version is ready — Reload when convenient.</span>
      <button type="button" onClick={() => void applyUpdate()}>
        Reload
      </button>
      <button type="button" onClick={dismiss}>
        Later
      </button>
    </div>
  );
}
