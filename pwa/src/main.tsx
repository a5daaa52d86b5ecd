import { startTransition, StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { QueryClient } from '@tanstack/react-query';
import { registerSW } from 'virtual:pwa-register';
import i18next from 'i18next';

// Only the Ionic CSS the shell needs (Ionic's code loads with the signed-in area); the palette and layout are our own (theme/).
import '@ionic/react/css/core.css';
import '@ionic/react/css/normalize.css';
import '@ionic/react/css/structure.css';
import '@fontsource/atkinson-hyperlegible/400.css';
import '@fontsource/atkinson-hyperlegible/700.css';
import './theme/variables.css';
import './theme/shell.css';

import { App } from './App';
import { appConfig } from './config/appConfig';
import { readSessionRow } from './db/sessionTable';
import { entryPath } from './features/navigation/roleTabs';
import { createApiClient } from './features/api/client';
import { applyThemePreference } from './features/preferences/themePreference';
import { sessionStatus } from './features/session/offlineGrace';
import { createSessionStore } from './features/session/sessionStore';
import { initI18n } from './i18n';

/** Restores the session and renders; nothing waits on the network. */
async function start(): Promise<void> {
  applyThemePreference();
  // The first screen needs only the session row: it is read without Dexie, which loads and opens
  // the whole database (with the field records' tables) on the session's first write or first use.
  const sessionStore = createSessionStore({
    read: () => readSessionRow(),
    table: async () => (await import('./features/cases/captureDb')).captureDb().session,
  });
  await Promise.all([sessionStore.load(), initI18n()]);
  // "/" is where the installed app starts. Resolving it before the first render draws the first
  // screen once, instead of drawing the redirect and then the screen it leads to.
  if (window.location.pathname === '/') {
    const session = sessionStore.current();
    const status = sessionStatus({ session, now: Date.now(), online: navigator.onLine, offlineSessionHours: appConfig.offlineSessionHours });
    window.history.replaceState(window.history.state, '', `${entryPath(session, status)}${window.location.search}${window.location.hash}`);
  }
  const apiClient = createApiClient({ tokens: sessionStore });
  const queryClient = new QueryClient({
    defaultOptions: { queries: { networkMode: 'online', retry: 1 } },
  });
  const root = createRoot(document.getElementById('root')!);
  // As a transition, React renders the first screen in slices and yields to the browser between
  // them, instead of one long task that would block a slow tablet's input until it is done.
  startTransition(() =>
    root.render(
      <StrictMode>
        <App
          queryClient={queryClient}
          apiClient={apiClient}
          sessionStore={sessionStore}
          offlineSessionHours={appConfig.offlineSessionHours}
          idleLockMinutes={appConfig.idleLockMinutes}
        />
      </StrictMode>,
    ),
  );
  // The service worker precaches the shell so a reload without network still renders it. It is
  // registered at the window's load event, so its precache downloads do not compete with first paint.
  registerSW();
}

start().catch((error: unknown) => {
  const message = error instanceof Error ? error.message : String(error);
  const root = document.getElementById('root');
  // The language files may be what failed to load, so English stands in when i18next is not ready.
  if (root) root.textContent = i18next.isInitialized ? i18next.t('app.startFailed', { message }) : `Siteband could not start: ${message}`;
  console.error(error);
});
