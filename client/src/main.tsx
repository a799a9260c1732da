import '@fontsource/atkinson-hyperlegible/400.css';
import '@fontsource/atkinson-hyperlegible/700.css';
import './index.css';
import { StrictMode, startTransition } from 'react';
import { createRoot } from 'react-dom/client';
import { App } from '@/app/app';
import { applyDisplaySettings, readCachedDisplaySettings } from '@/lib/display-settings';
import { registerAppServiceWorker } from '@/lib/offline/app-update';

// Before the first paint: the last settings used on this device (text size, theme, language). The
// screens' words come with their routes.
applyDisplaySettings(readCachedDisplaySettings());

const root = document.getElementById('root');
if (!root) throw new Error('index.html has no #root element.');
registerAppServiceWorker();
// A transition: React renders the first screen in slices and lets the phone answer in between,
// rather than in one long task.
startTransition(() => {
  createRoot(root).render(
    <StrictMode>
      <App />
    </StrictMode>,
  );
});
