import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { VitePWA } from 'vite-plugin-pwa';

// The API runs beside the dev server; the built client is served by the API itself.
const reactRouterBuild = (file: string) =>
  new URL(`../node_modules/react-router/dist/development/${file}`, import.meta.url).pathname;

const apiProxy = { '/api': { target: 'http://127.0.0.1:3000', changeOrigin: false } };

// An installable app that opens with no signal: the service worker (src/lib/offline/service-worker.ts)
// precaches the shell, every screen, the fonts and the words; the run route gets its own page.
const pwa = VitePWA({
  strategies: 'injectManifest',
  srcDir: 'src/lib/offline',
  filename: 'service-worker.ts',
  // Registered by the app itself (src/lib/offline/app-update.ts), after the first screen.
  injectRegister: false,
  registerType: 'prompt',
  manifest: {
    id: '/',
    name: 'Yardcall',
    short_name: 'Yardcall',
    description: 'Spoken walk-around inspections and signed DVIRs, with or without a signal.',
    start_url: '/',
    scope: '/',
    display: 'standalone',
    orientation: 'portrait',
    theme_color: '#0b4f6c',
    background_color: '#0b4f6c',
    icons: [
      { src: '/icons/icon-192.png', sizes: '192x192', type: 'image/png', purpose: 'any' },
      { src: '/icons/icon-512.png', sizes: '512x512', type: 'image/png', purpose: 'any' },
      { src: '/icons/maskable-512.png', sizes: '512x512', type: 'image/png', purpose: 'maskable' },
      { src: '/favicon.svg', sizes: 'any', type: 'image/svg+xml', purpose: 'any' },
    ],
  },
  includeAssets: ['favicon.svg', 'icons/apple-touch-icon.png'],
  injectManifest: {
    // Fonts as woff2 only (every browser that runs a service worker reads it).
    globPatterns: ['**/*.{js,css,html,svg,png,woff2,webmanifest}'],
    // ffmpeg.wasm is for the office's audio tools, never a driver's phone with no signal.
    globIgnores: ['**/ffmpeg-core*', '**/*.wasm'],
  },
});

export default defineConfig({
  plugins: [react(), tailwindcss(), pwa],
  resolve: { alias: { '@': new URL('./src', import.meta.url).pathname } },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    target: 'es2022',
    // Two pages: the app, and the glove screen alone for a cold load of a walk-around's run route
    // (the server serves driver-run/index.html there), without the router and the app's screens.
    rolldownOptions: {
      input: {
        app: new URL('./index.html', import.meta.url).pathname,
        run: new URL('./driver-run/index.html', import.meta.url).pathname,
      },
      // The libraries every page loads, in two chunks rather than a dozen small ones (each file
      // compresses apart): React and i18next for both pages, the router and the query client for
      // the app only (the run page has neither).
      output: {
        codeSplitting: {
          groups: [
            { name: 'react', test: /node_modules[\\/](react|react-dom|scheduler|i18next|react-i18next)[\\/]/ },
            { name: 'app-libs', test: /node_modules[\\/](react-router|@tanstack[\\/](query-core|react-query))[\\/]/ },
            // The small pieces every driver screen shows (alerts, buttons, page layout, paths, how old a
            // copy is) in one file instead of seven, each of which would compress apart.
            {
              name: 'driver-common',
              test: /src[\\/](components[\\/]ui[\\/](alert|button|layout)\.tsx|lib[\\/](sign-in|display-settings|format-date|offline[\\/](copy-age|app-update))\.ts|features[\\/]walkaround[\\/](walkaround-paths|api[\\/]walkaround-keys)\.ts)$/,
            },
          ],
        },
      },
    },
  },
  server: { proxy: apiProxy },
  // ffmpeg.wasm starts its worker from `new URL('./worker.js', import.meta.url)`: pre-bundling would
  // move the module away from its worker file in the dev server.
  optimizeDeps: { exclude: ['@ffmpeg/ffmpeg'] },
  preview: { proxy: apiProxy },
  test: {
    environment: 'jsdom',
    setupFiles: ['./src/testing/setup-tests.ts'],
    include: ['src/**/*.test.{ts,tsx}'],
    css: false,
    restoreMocks: true,
    // Under Vitest, react-router resolved to its CommonJS build and react-router/dom to its ESM
    // build: two router contexts. Point both at the ESM build.
    alias: [
      { find: /^react-router$/, replacement: reactRouterBuild('index.mjs') },
      { find: /^react-router\/dom$/, replacement: reactRouterBuild('dom-export.mjs') },
    ],
  },
});
