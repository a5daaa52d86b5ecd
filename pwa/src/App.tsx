import { IonApp, IonRouterOutlet } from '@ionic/react';
import { IonReactRouter } from '@ionic/react-router';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { useEffect, type ReactNode } from 'react';
import { Navigate, Route } from 'react-router-dom';
import { lazyPage } from './components/lazyPage';
import { IdleLockScreen } from './components/lock/LockScreen';
import { ApiClientProvider } from './features/api/ApiClientContext';
import type { ApiClient } from './features/api/client';
import { IdleLockProvider } from './features/lock/IdleLockProvider';
import { entryPath } from './features/navigation/roleTabs';
import { SessionProvider, useSession } from './features/session/SessionProvider';
import type { SessionStore } from './features/session/sessionStore';
// The page a signed-out visit opens first comes with the entry chunk: loading it lazily would add a
// round trip before anything is drawn. Every other screen loads when it is first opened.
import SignInPage from './pages/SignInPage';

const TabsLayout = lazyPage(() => import('./pages/TabsLayout'));
const SetPasswordPage = lazyPage(() => import('./pages/SetPasswordPage'));

/**
 * Lets a usable session (online, or offline within its period) through; everything else goes to
 * sign-in. That is a full page load on purpose: it drops the previous person's tab stacks and
 * cached server data, so the next person on a shared tablet starts clean (the shell is precached).
 */
function RequireSession({ children }: { children: ReactNode }) {
  const { status } = useSession();
  const usable = status === 'online' || status === 'offline';
  useEffect(() => {
    if (!usable) window.location.replace('/signin');
  }, [usable]);
  return usable ? children : null;
}

/** Sends "/" to the person's first tab, or to sign-in. */
function HomeRedirect() {
  const { session, status } = useSession();
  return <Navigate to={entryPath(session, status)} replace />;
}

export interface AppProps {
  queryClient: QueryClient;
  apiClient: ApiClient;
  sessionStore: SessionStore;
  offlineSessionHours: number;
  /** Minutes untouched before the app locks, unless changed on this tablet. */
  idleLockMinutes: number;
}

/** The whole app: server data, API client, session, then the routes. */
export function App({ queryClient, apiClient, sessionStore, offlineSessionHours, idleLockMinutes }: AppProps) {
  return (
    <QueryClientProvider client={queryClient}>
      <ApiClientProvider client={apiClient}>
        <SessionProvider store={sessionStore} offlineSessionHours={offlineSessionHours}>
          <IdleLockProvider defaultIdleMinutes={idleLockMinutes}>
            <IonApp>
              <IonReactRouter>
                <IonRouterOutlet>
                  <Route path="/signin" element={<SignInPage />} />
                  {/* Public: the page an invitation mail links to, for someone not signed in yet. */}
                  <Route path="/set-password" element={<SetPasswordPage />} />
                  <Route
                    path="/tabs/*"
                    element={
                      <RequireSession>
                        <TabsLayout />
                      </RequireSession>
                    }
                  />
                  <Route path="/" element={<HomeRedirect />} />
                  <Route path="*" element={<HomeRedirect />} />
                </IonRouterOutlet>
              </IonReactRouter>
            </IonApp>
            <IdleLockScreen />
          </IdleLockProvider>
        </SessionProvider>
      </ApiClientProvider>
    </QueryClientProvider>
  );
}
