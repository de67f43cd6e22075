/// <reference types="vite-plugin-pwa/client" />
/**
 * Registers the service worker that keeps the built app (pages, scripts, the model worker)
 * available offline. Production builds only: in development the worker would serve stale
 * modules. When a new version is waiting, the update store offers it; it is never forced.
 */
import { registerSW } from 'virtual:pwa-register';
import { useUpdateStore } from './updateStore';

export function registerServiceWorker(): void {
  if (!import.meta.env.PROD || typeof navigator === 'undefined' || !('serviceWorker' in navigator)) return;
  let userAsked = false;
  const reload = async () => window.location.reload();
  const updateSW = registerSW({
    immediate: true,
    onNeedRefresh() {
      useUpdateStore.getState().offerUpdate(async () => {
        userAsked = true;
        await updateSW(true);
      });
    },
    // The new version took control: reload if this tab asked for it; if another tab did, only
    // offer the reload, so work in this tab is never cut short.
    onNeedReload() {
      if (userAsked) void reload();
      else useUpdateStore.getState().offerUpdate(reload);
    },
    onRegisterError(error) {
      // Offline use is lost, the app itself works: say so in the console, not in the user's way.
      console.warn('Firnline could not register its service worker; the app will not work offline.', error);
    },
  });
}
