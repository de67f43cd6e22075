/**
 * Which run client the controls talk to: the real worker client in the app, a fake in component
 * tests. The worker itself is created on the first run, not on page load.
 */
import { createContext, useContext } from 'react';
import { runStoreSink } from '../../state/runStore';
import { WorkerClient, type RunClient } from '../../worker/workerClient';

export const RunClientContext = createContext<RunClient | null>(null);

let appClient: RunClient | undefined;

export function useRunClient(): RunClient {
  const provided = useContext(RunClientContext);
  return provided ?? (appClient ??= new WorkerClient(runStoreSink));
}
