/**
 * Which analysis client the panel talks to: the real worker client in the app, an in-process one
 * or a fake in component tests. The worker itself is created on the first analysis.
 */
import { createContext, useContext } from 'react';
import { analysisStoreSink } from '../../state/analysisStore';
import { AnalysisWorkerClient, type AnalysisClient } from '../../worker/analysisClient';

export const AnalysisClientContext = createContext<AnalysisClient | null>(null);

let appClient: AnalysisClient | undefined;

export function useAnalysisClient(): AnalysisClient {
  const provided = useContext(AnalysisClientContext);
  return provided ?? (appClient ??= new AnalysisWorkerClient(analysisStoreSink));
}
