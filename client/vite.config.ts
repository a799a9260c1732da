import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';

// The API runs beside the dev server; the built client is served by the API itself.
const reactRouterBuild = (file: string) =>
  new URL(`../node_modules/react-router/dist/development/${file}`, import.meta.url).pathname;

const apiProxy = { '/api': { target: 'http://127.0.0.1:3000', changeOrigin: false } };

export default defineConfig({
  plugins: [react(), tailwindcss()],
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
