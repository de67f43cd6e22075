/**
 * Which workers the experiments view runs members on: the browser's module workers in the app,
 * fakes in component tests.
 */
import { createContext, useContext } from 'react';
import type { PoolOptions } from '../../state/experimentStore';
import { browserPoolSize, createExperimentMemberWorker } from '../../worker/experimentPoolBrowser';

export const ExperimentPoolContext = createContext<PoolOptions | null>(null);

const browserPool: PoolOptions = { createWorker: createExperimentMemberWorker, size: browserPoolSize };

export function useExperimentPool(): PoolOptions {
  return useContext(ExperimentPoolContext) ?? browserPool;
}
