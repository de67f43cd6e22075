/**
 * Whether a new version of the app is waiting, and how to switch to it. The service worker
 * registration fills this in; the notice reads it. Nothing here reloads on its own: a reload in
 * the middle of a run or an edit would throw away work, so the user chooses when.
 */
import { create } from 'zustand';

export interface UpdateState {
  /** A new service worker is installed and waiting for this page to let it take over. */
  updateReady: boolean;
  /** Activates the waiting version and reloads the page; set by the registration. */
  applyUpdate: (() => Promise<void>) | null;
  /** The user closed the notice for this page load. */
  dismissed: boolean;
  offerUpdate: (apply: () => Promise<void>) => void;
  dismiss: () => void;
}

export const useUpdateStore = create<UpdateState>()((set) => ({
  updateReady: false,
  applyUpdate: null,
  dismissed: false,
  offerUpdate: (apply) => set({ updateReady: true, applyUpdate: apply, dismissed: false }),
  dismiss: () => set({ dismissed: true }),
}));
