/**
 * The Analyses panel in the results column: committed change, steady-state sensitivity curve and
 * calibration (to an observed terminus, and a fit to the scenario's observations) and the bed from the surface,
 * one at a time behind tabs. Each runs in the analysis
 * worker, off the main thread, with progress and Cancel.
 */
import { useId, useState, type KeyboardEvent } from 'react';
import { useAnalysisStore } from '../../state/analysisStore';
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

  // The WAI-ARIA tabs pattern: one tab stop for the row; the arrows, Home and End move between
  // tabs and show the one reached.
  function onTabKey(event: KeyboardEvent<HTMLButtonElement>) {
    const i = TABS.findIndex((t) => t.kind === shown);
    const moves: Record<string, number> = { ArrowRight: (i + 1) % TABS.length, ArrowLeft: (i + TABS.length - 1) % TABS.length, Home: 0, End: TABS.length - 1 };
    const j = moves[event.key];
    if (j === undefined) return;
    event.preventDefault();
    setShown(TABS[j].kind);
    document.getElementById(`${id}-${TABS[j].kind}-tab`)?.focus();
  }

  return (
    <section className="panel analyses" aria-labelledby={`${id}-heading`}>
      <h2 id={`${id}-heading`}>Analyses</h2>
      <div className="analysis-tabs" role="tablist" aria-label="Analyses">
        {TABS.map((tab) => (
          <button
            key={tab.kind}
            type="button"
            role="tab"
            id={`${id}-${tab.kind}-tab`}
            aria-selected={shown === tab.kind}
            aria-controls={`${id}-${tab.kind}`}
            tabIndex={shown === tab.kind ? 0 : -1}
            className={shown === tab.kind ? 'selected' : undefined}
            onClick={() => setShown(tab.kind)}
            onKeyDown={onTabKey}
          >
            {tab.label}
            {active === tab.kind ? ' …' : ''}
          </button>
        ))}
      </div>
      {TABS.map((tab) => (
        // Every section stays mounted, so typed inputs survive switching tabs.
        <div key={tab.kind} role="tabpanel" id={`${id}-${tab.kind}`} aria-labelledby={`${id}-${tab.kind}-tab`} hidden={shown !== tab.kind}>
          {tab.kind === 'committed' ? <CommittedChangeSection /> : tab.kind === 'sensitivity' ? <SensitivitySection /> : tab.kind === 'calibration' ? <CalibrationSection /> : <InversionSection />}
        </div>
      ))}
      {active && active !== shown && <p className="analysis-note">{TABS.find((t) => t.kind === active)!.label} is being computed; one analysis runs at a time.</p>}
    </section>
  );
}
