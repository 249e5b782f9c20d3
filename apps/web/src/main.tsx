import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import './theme/fonts.js';
import { AppProviders } from './app/app-providers.js';
import { AppRouter } from './app/app-router.js';
import { applyToDocument } from './theme/theme-mode.js';

applyToDocument();

// The installed app's shell, kept for a start without the network (public/sw.js); not while developing,
// where Vite serves modules the worker must not keep. Browsers offer it only on HTTPS or this machine.
if (import.meta.env.PROD && 'serviceWorker' in navigator) {
  window.addEventListener('load', () => void navigator.serviceWorker.register('/sw.js'));
}

createRoot(document.getElementById('root')!).render(
  <StrictMode>
    <AppProviders>
      <AppRouter />
    </AppProviders>
  </StrictMode>,
);
