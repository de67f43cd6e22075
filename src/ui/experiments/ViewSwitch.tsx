/** The header's switch between the workbench and the experiments, and the notice after a switch. */
import { useViewStore, type AppView } from '../../state/viewStore';

const VIEWS: { view: AppView; label: string }[] = [
  { view: 'workbench', label: 'Workbench' },
  { view: 'experiments', label: 'Experiments' },
];

export function ViewSwitch() {
  const view = useViewStore((s) => s.view);
  const notice = useViewStore((s) => s.notice);
  return (
    <>
      <nav className="view-switch" aria-label="Views">
        {VIEWS.map((v) => (
          <button key={v.view} type="button" aria-pressed={view === v.view} onClick={() => useViewStore.getState().show(v.view)}>
            {v.label}
          </button>
        ))}
      </nav>
      {notice && (
        <p className="view-notice" role="status">
          {notice}{' '}
          <button type="button" className="small" onClick={() => useViewStore.getState().dismissNotice()}>
            Dismiss
          </button>
        </p>
      )}
    </>
  );
}
