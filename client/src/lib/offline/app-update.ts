import { useSyncExternalStore } from 'react';

// Where vite-plugin-pwa writes the service worker (vite.config.ts).
export const SERVICE_WORKER_URL = '/service-worker.js';
// How often an open app asks whether a new version was deployed (our own practice).
export const UPDATE_CHECK_MS = 60 * 60 * 1000;

let waiting: ServiceWorker | null = null;
const listeners = new Set<() => void>();

function offer(worker: ServiceWorker): void {
  waiting = worker;
  for (const listener of listeners) listener();
}

// A new version installed while this one controls the page waits: it is only announced.
function watch(registration: ServiceWorkerRegistration): void {
  if (registration.waiting && navigator.serviceWorker.controller) offer(registration.waiting);
  registration.addEventListener('updatefound', () => {
    const installing = registration.installing;
    installing?.addEventListener('statechange', () => {
      if (installing.state === 'installed' && navigator.serviceWorker.controller) offer(installing);
    });
  });
}

// Registers the service worker once per page, after the page has loaded so its precache does not
// compete with the first screen. The browser's own API, not workbox-window: the same few steps
// without 3 KB more on the driver's first load. A new version is applied only when the driver
// accepts it (the homes offer it, never the walk-around screen).
export function registerAppServiceWorker(): void {
  if (!('serviceWorker' in navigator)) return;
  const register = () => {
    navigator.serviceWorker
      .register(SERVICE_WORKER_URL, { scope: '/' })
      .then((registration) => {
        watch(registration);
        setInterval(() => void registration.update().catch(() => undefined), UPDATE_CHECK_MS);
      })
      .catch(() => undefined);
  };
  if (document.readyState === 'complete') register();
  else window.addEventListener('load', register, { once: true });
}

// The waiting version takes over (the service worker listens for SKIP_WAITING), then the page
// reloads into it.
function applyUpdate(): void {
  if (!waiting) return;
  navigator.serviceWorker.addEventListener('controllerchange', () => window.location.reload(), { once: true });
  waiting.postMessage({ type: 'SKIP_WAITING' });
}

const subscribe = (listener: () => void) => {
  listeners.add(listener);
  return () => listeners.delete(listener);
};
const snapshot = () => waiting !== null;

// For the "a new version is ready" offer between walk-arounds.
export function useAppUpdate(): { ready: boolean; apply: () => void } {
  const ready = useSyncExternalStore(subscribe, snapshot, snapshot);
  return { ready, apply: applyUpdate };
}
