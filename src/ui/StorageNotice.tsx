/**
 * Says when projects are not being kept by the browser (no IndexedDB, storage full, a failed
 * save) and offers the way out: save the open scenario as a file.
 */
import { useProjects } from './projects/ProjectsContext';
import { useScenarioStore } from '../state/scenarioStore';
import { downloadScenario } from './app/downloadScenario';
import './notices.css';

export function StorageNotice() {
  const warning = useProjects((s) => s.storageWarning);
  if (!warning) return null;
  return (
    <p className="storage-warning storage-notice" role="alert">
      {warning}
      <button type="button" onClick={() => downloadScenario(useScenarioStore.getState().scenario)}>
        Save scenario file
      </button>
    </p>
  );
}
