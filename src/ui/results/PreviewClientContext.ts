/**
 * Which steady-glacier preview client the profile talks to: the real worker client in the app, a
 * fake in component tests. The worker itself is created on the first request.
 */
import { createContext, useContext } from 'react';
import { steadyPreviewSink } from '../../state/steadyPreviewStore';
import { PreviewWorkerClient, type PreviewClient } from '../../worker/steadyPreviewClient';

export const PreviewClientContext = createContext<PreviewClient | null>(null);

let appClient: PreviewClient | undefined;

export function usePreviewClient(): PreviewClient {
  const provided = useContext(PreviewClientContext);
  return provided ?? (appClient ??= new PreviewWorkerClient(steadyPreviewSink));
}
