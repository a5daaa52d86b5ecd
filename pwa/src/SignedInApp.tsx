import { IonApp, IonRouterOutlet, setupIonicReact } from '@ionic/react';
import { IonReactRouter } from '@ionic/react-router';
import { useEffect, type ReactNode } from 'react';
import { Navigate, Route } from 'react-router-dom';
import { AreaHandover } from './components/AreaHandover';
import { entryPath } from './features/navigation/roleTabs';
import { useSession } from './features/session/SessionProvider';
import TabsLayout from './pages/TabsLayout';

// Ionic is set up with the area that uses it, before its first component renders.
setupIonicReact({ mode: 'md' });

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

/** The signed-in area: Ionic's app, router and the tabs, loaded as one chunk when first needed. */
export default function SignedInApp() {
  return (
    <IonApp>
      <IonReactRouter>
        <IonRouterOutlet>
          <Route
            path="/tabs/*"
            element={
              <RequireSession>
                <TabsLayout />
              </RequireSession>
            }
          />
          {/* Sign-in and set-password belong to the area drawn without Ionic. */}
          <Route path="/signin" element={<AreaHandover />} />
          <Route path="/set-password" element={<AreaHandover />} />
          <Route path="/" element={<HomeRedirect />} />
          <Route path="*" element={<HomeRedirect />} />
        </IonRouterOutlet>
      </IonReactRouter>
    </IonApp>
  );
}
