import '@fontsource/atkinson-hyperlegible/400.css';
import '@fontsource/atkinson-hyperlegible/700.css';
import './index.css';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { RunPage } from '@/app/run-page';
import { applyDisplaySettings, readCachedDisplaySettings } from '@/lib/display-settings';
import { loadWords } from '@/lib/i18n/load-words';
import { registerAppServiceWorker } from '@/lib/offline/app-update';

// A walk-around opened cold (a reload, a resume from a link): the glove screen alone, without the
// router and the rest of the app, so the phone loads as little as it can.
applyDisplaySettings(readCachedDisplaySettings());

const root = document.getElementById('root');
if (!root) throw new Error('driver-run/index.html has no #root element.');
// Registered here too (a cold load of a run may be the phone's first visit); a new version is
// never offered on this page, only on the homes between walk-arounds.
registerAppServiceWorker();
const page = createRoot(root);
const render = () =>
  page.render(
    <StrictMode>
      <RunPage clientId={decodeURIComponent(window.location.pathname.split('/').filter(Boolean).at(-1) ?? '')} />
    </StrictMode>,
  );
// The core words in the driver's language first (English comes with the page); a failed load
// still opens the walk-around, in English.
loadWords('core').then(render, render);
