import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { useSyncExternalStore } from 'react';
import { BrowserRouter, Route, Routes } from 'react-router-dom';
import { AreaHandover } from './components/AreaHandover';
import { lazyPage } from './components/lazyPage';
import { IdleLockScreen } from './components/lock/LockScreen';
import { ApiClientProvider } from './features/api/ApiClientContext';
import type { ApiClient } from './features/api/client';
import { IdleLockProvider } from './features/lock/IdleLockProvider';
import { currentArea, loadSignedInArea, subscribeArea } from './features/navigation/appArea';
import { SessionProvider } from './features/session/SessionProvider';
import type { SessionStore } from './features/session/sessionStore';
// The page a signed-out visit opens first comes with the entry chunk: loading it lazily would add a
// round trip before anything is drawn. Every other screen loads when it is first opened.
import SignInPage from './pages/SignInPage';

const SetPasswordPage = lazyPage(() => import('./pages/SetPasswordPage'));
const SignedInApp = lazyPage(loadSignedInArea);

/** The pages of a signed-out visit, drawn without Ionic; any other path is the signed-in area's. */
function PublicArea() {
  return (
    <BrowserRouter>
      <Routes>
        <Route path="/signin" element={<SignInPage />} />
        {/* Public: the page an invitation mail links to, for someone not signed in yet. */}
        <Route path="/set-password" element={<SetPasswordPage />} />
        <Route path="*" element={<AreaHandover />} />
      </Routes>
    </BrowserRouter>
  );
}

export interface AppProps {
  queryClient: QueryClient;
  apiClient: ApiClient;
  sessionStore: SessionStore;
  offlineSessionHours: number;
  /** Minutes untouched before the app locks, unless changed on this tablet. */
  idleLockMinutes: number;
}

/** The whole app: server data, API client, session, idle lock, then the area the address belongs to. */
export function App({ queryClient, apiClient, sessionStore, offlineSessionHours, idleLockMinutes }: AppProps) {
  const area = useSyncExternalStore(subscribeArea, currentArea);
  return (
    <QueryClientProvider client={queryClient}>
      <ApiClientProvider client={apiClient}>
        <SessionProvider store={sessionStore} offlineSessionHours={offlineSessionHours}>
          <IdleLockProvider defaultIdleMinutes={idleLockMinutes}>
            {/* What the idle lock hides and makes inert, whichever area is drawn. */}
            <div className="sb-app">{area === 'public' ? <PublicArea /> : <SignedInApp />}</div>
            <IdleLockScreen />
          </IdleLockProvider>
        </SessionProvider>
      </ApiClientProvider>
    </QueryClientProvider>
  );
}
