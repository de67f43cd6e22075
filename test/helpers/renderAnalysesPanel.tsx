/**
 * The Analyses panel with a client whose worker is the real analysis driver in the test process
 * (inProcessAnalysisWorker.ts); `tab`: the analysis tab to open first.
 */
import { fireEvent, render, screen } from '@testing-library/react';
import { analysisStoreSink } from '../../src/state/analysisStore';
import { AnalysesPanel } from '../../src/ui/analyses/AnalysesPanel';
import { AnalysisClientContext } from '../../src/ui/analyses/AnalysisClientContext';
import { AnalysisWorkerClient } from '../../src/worker/analysisClient';
import { InProcessAnalysisWorker } from './inProcessAnalysisWorker';

export function renderAnalysesPanel(tab?: string): void {
  const client = new AnalysisWorkerClient(analysisStoreSink, () => new InProcessAnalysisWorker());
  render(
    <AnalysisClientContext.Provider value={client}>
      <AnalysesPanel />
    </AnalysisClientContext.Provider>,
  );
  if (tab) fireEvent.click(screen.getByRole('tab', { name: tab }));
}
