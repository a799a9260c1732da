/// <reference types="vite-plugin-pwa/vanillajs" />
import { useSyncExternalStore } from 'react';

// How often an open app asks whether a new version was deployed (our own practice).
export const UPDATE_CHECK_MS = 60 * 60 * 1000;

let updateReady = false;
let applyUpdate: ((reloadPage?: boolean) => Promise<void>) | null = null;
const listeners = new Set<() => void>();

function setUpdateReady(): void {
  updateReady = true;
  for (const listener of listeners) listener();
}

// Registers the service worker once per page, after the page has loaded so its precache does not
// compete with the first screen. A new version is only announced: it is applied when the driver
// accepts it (the homes offer it, never the walk-around screen).
export function registerAppServiceWorker(): void {
  if (!('serviceWorker' in navigator)) return;
  const register = () => {
    import('virtual:pwa-register')
      .then(({ registerSW }) => {
        applyUpdate = registerSW({
          immediate: true,
          onNeedRefresh: setUpdateReady,
          onRegisteredSW(_url, registration) {
            if (registration) setInterval(() => void registration.update().catch(() => undefined), UPDATE_CHECK_MS);
          },
        });
      })
      .catch(() => undefined);
  };
  if (document.readyState === 'complete') register();
  else window.addEventListener('load', register, { once: true });
}

const subscribe = (listener: () => void) => {
  listeners.add(listener);
  return () => listeners.delete(listener);
};
const snapshot = () => updateReady;

// For the "a new version is ready" offer between walk-arounds.
export function useAppUpdate(): { ready: boolean; apply: () => void } {
  const ready = useSyncExternalStore(subscribe, snapshot, snapshot);
  return { ready, apply: () => void applyUpdate?.(true) };
}
