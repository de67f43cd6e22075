/**
 * The Analyses panel in the results column: committed change, steady-state sensitivity curve and
 * calibration (to an observed terminus, and a fit to the scenario's observations) and the bed from the surface,
 * one at a time behind tabs. Each runs in the analysis
 * worker, off the main thread, with progress and Cancel.
 */
import { useId, useState } from 'react';
import { useAnalysisStore } from '../../state/analysisStore';
import { TabStrip, tabPanelProps } from '../layout/TabStrip';
import type { AnalysisKind } from '../../worker/analysisProtocol';
import { CalibrationSection } from './CalibrationSection';
import { CommittedChangeSection } from './CommittedChangeSection';
import { InversionSection } from './InversionSection';
import { SensitivitySection } from './SensitivitySection';
import './analyses.css';

const TABS: { kind: AnalysisKind; label: string }[] = [
  { kind: 'committed', label: 'Committed change' },
  { kind: 'sensitivity', label: 'Sensitivity' },
  { kind: 'calibration', label: 'Calibration' },
  { kind: 'inversion', label: 'Bed from the surface' },
];

/** The tab an analysis lives under: the fit to the observations is part of Calibration. */
const tabOf = (kind: AnalysisKind | null): AnalysisKind | null => (kind === 'fit' ? 'calibration' : kind);

export function AnalysesPanel() {
  const [shown, setShown] = useState<AnalysisKind>('committed');
  const active = tabOf(useAnalysisStore((s) => s.active));
  const id = useId();
  const tabs = TABS.map((tab) => ({ key: tab.kind, label: `${tab.label}${active === tab.kind ? ' …' : ''}` }));
  return (
    <section className="panel analyses" aria-labelledby={`${id}-heading`}>
      <h2 id={`${id}-heading`}>Analyses</h2>
      {/* One tab stop; the arrows, Home and End move between the analyses (TabStrip). */}
      <TabStrip tabs={tabs} selected={shown} onSelect={setShown} idBase={id} label="Analyses" className="analysis-tabs" />
      {TABS.map((tab) => (
        // Every section stays mounted, so typed inputs survive switching tabs.
        <div key={tab.kind} {...tabPanelProps(id, tab.kind, shown)}>
          {tab.kind === 'committed' ? <CommittedChangeSection /> : tab.kind === 'sensitivity' ? <SensitivitySection /> : tab.kind === 'calibration' ? <CalibrationSection /> : <InversionSection />}
        </div>
      ))}
      {active && active !== shown && <p className="analysis-note">{TABS.find((t) => t.kind === active)!.label} is being computed; one analysis runs at a time.</p>}
    </section>
  );
}
