// The service worker (built by vite-plugin-pwa's injectManifest into /sw.js): every file of the
// app precached, so a cold load with no signal opens the driver home, the start screen and a
// running walk-around. Types are declared here because the client compiles against the DOM library.
import { clientsClaim } from 'workbox-core';
import {
  cleanupOutdatedCaches,
  createHandlerBoundToURL,
  precacheAndRoute,
  type PrecacheEntry,
} from 'workbox-precaching';
import { NavigationRoute, registerRoute } from 'workbox-routing';

interface ServiceWorkerScope {
  __WB_MANIFEST: (string | PrecacheEntry)[];
  skipWaiting(): Promise<void>;
  addEventListener(type: 'message', listener: (event: { data: unknown }) => void): void;
}

declare const self: ServiceWorkerScope;

// Must match the server's route for the light run page (server/src/app.module.ts).
export const RUN_PAGE_ROUTE = /^\/driver\/inspections\/[^/]+\/?$/;

precacheAndRoute(self.__WB_MANIFEST);
cleanupOutdatedCaches();

// A walk-around's run route gets the glove screen's own page, as the server sends it; every other
// page of the app gets the app. The API is never answered from here.
registerRoute(new NavigationRoute(createHandlerBoundToURL('/driver-run/index.html'), { allowlist: [RUN_PAGE_ROUTE] }));
registerRoute(new NavigationRoute(createHandlerBoundToURL('/index.html'), { denylist: [/^\/api(\/|$)/] }));

// The first install takes the open page at once (nothing runs yet to interrupt). A new version
// waits until the driver accepts it between walk-arounds (the app posts SKIP_WAITING), or until
// every tab of the app is closed.
clientsClaim();
self.addEventListener('message', (event) => {
  const data = event.data as { type?: unknown } | null;
  if (data?.type === 'SKIP_WAITING') void self.skipWaiting();
});
