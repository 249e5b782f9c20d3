import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import './theme/fonts.js';
import { AppProviders } from './app/app-providers.js';
import { AppRouter } from './app/app-router.js';
import { applyToDocument } from './theme/theme-mode.js';

applyToDocument();

createRoot(document.getElementById('root')!).render(
  <StrictMode>
    <AppProviders>
      <AppRouter />
    </AppProviders>
  </StrictMode>,
);
