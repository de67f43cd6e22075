/**
 * The scenario editor beside the long profile: geometry, ice-and-flow, climate-and-run and observations panels
 * as tabs (the tools that act on the profile itself are in ProfileEditToolbar, under it). Every change is one
 * undoable edit of a scenario that passes the validator.
 */
import { useId, useState } from 'react';
import { panelId, tabId, TabStrip } from '../layout/TabStrip';
import { CsvImportDialog } from './CsvImportDialog';
import { GeojsonImportDialog } from './GeojsonImportDialog';
import { IceParameters } from './IceParameters';
import { MassBalanceParameters } from './MassBalanceParameters';
import { ObservationsEditor } from './ObservationsEditor';
import { RunParameters } from './RunParameters';
import { SlidingParameters } from './SlidingParameters';
import { SurfaceTools } from './SurfaceTools';
import { ValleyGenerator } from './ValleyGenerator';
import { WarmingEditor } from './WarmingEditor';
import { ForcingImport } from './ForcingImport';
import { DebrisEditor } from './DebrisEditor';
import { FrontalAblationEditor } from './FrontalAblationEditor';
import { VariabilityEditor } from './VariabilityEditor';
import { WidthEditor } from './WidthEditor';
import './edit.css';

const TABS = [
  { key: 'geometry', label: 'Geometry' },
  { key: 'ice', label: 'Ice and flow' },
  { key: 'climate', label: 'Climate and run' },
  { key: 'observations', label: 'Observations' },
] as const;
type Tab = (typeof TABS)[number]['key'];

export function EditorPanels() {
  const id = useId();
  const [tab, setTab] = useState<Tab>('geometry');
  const [importing, setImporting] = useState<'csv' | 'geojson' | null>(null);

  return (
    <section className="editor-panels" aria-label="Scenario editor">
      <TabStrip tabs={TABS} selected={tab} onSelect={setTab} idBase={id} label="Scenario settings" />
      <div role="tabpanel" id={panelId(id, tab)} aria-labelledby={tabId(id, tab)} className="tab-panel">
        {tab === 'geometry' && (
          <>
            {importing === 'csv' ? (
              <CsvImportDialog onClose={() => setImporting(null)} />
            ) : importing === 'geojson' ? (
              <GeojsonImportDialog onClose={() => setImporting(null)} />
            ) : (
              <div className="preset-row">
                <button type="button" onClick={() => setImporting('csv')}>
                  Import profile from CSV…
                </button>
                <button type="button" onClick={() => setImporting('geojson')}>
                  Import centreline from GeoJSON…
                </button>
              </div>
            )}
            <WidthEditor />
            <SurfaceTools />
            <ValleyGenerator />
          </>
        )}
        {tab === 'ice' && (
          <>
            <IceParameters />
            <SlidingParameters />
          </>
        )}
        {tab === 'climate' && (
          <>
            <MassBalanceParameters />
            <DebrisEditor />
            <FrontalAblationEditor />
            <WarmingEditor />
            <ForcingImport />
            <VariabilityEditor />
            <RunParameters />
          </>
        )}
        {tab === 'observations' && <ObservationsEditor />}
      </div>
    </section>
  );
}
