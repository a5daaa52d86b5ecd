import type { ComponentType } from 'react';
import { IonIcon, IonLabel, IonRouterOutlet, IonTabBar, IonTabButton, IonTabs } from '@ionic/react';
import { Navigate, Route } from 'react-router-dom';
import { useTranslation } from 'react-i18next';
import { lazyPage } from '../components/lazyPage';
import { TAB_ICONS } from '../components/tabIcons';
import { homePathForRole, tabsForRole, type TabId } from '../features/navigation/roleTabs';
import { useSession } from '../features/session/SessionProvider';

/** The screens of each tab, relative to /tabs; a tab's detail routes sit under its own path. */
const TAB_ROUTES: Readonly<Record<TabId, readonly { path: string; Page: ComponentType }[]>> = {
  cases: [{ path: 'cases', Page: lazyPage(() => import('./CasesPage')) }],
  capture: [{ path: 'capture', Page: lazyPage(() => import('./CapturePage')) }],
  review: [{ path: 'review', Page: lazyPage(() => import('./ReviewQueuePage')) }],
  library: [
    { path: 'library', Page: lazyPage(() => import('./LibraryPage')) },
    { path: 'library/structure', Page: lazyPage(() => import('./StructureCheckPage')) },
  ],
  escalations: [{ path: 'escalations', Page: lazyPage(() => import('./EscalationsPage')) }],
  users: [{ path: 'users', Page: lazyPage(() => import('./UsersPage')) }],
  account: [{ path: 'account', Page: lazyPage(() => import('./AccountPage')) }],
};

/** The signed-in shell: only the tabs of the person's role, each with its own navigation stack. */
export default function TabsLayout() {
  const { t } = useTranslation();
  const { session } = useSession();
  if (!session) return <Navigate to="/signin" replace />;
  const role = session.user.role;
  const tabs = tabsForRole(role);
  const home = homePathForRole(role);
  return (
    <IonTabs>
      <IonRouterOutlet>
        {tabs.flatMap((tab) =>
          TAB_ROUTES[tab.id].map(({ path, Page }) => <Route key={path} path={path} element={<Page />} />),
        )}
        <Route index element={<Navigate to={home} replace />} />
        <Route path="*" element={<Navigate to={home} replace />} />
      </IonRouterOutlet>
      <IonTabBar slot="bottom" className="sb-tabbar" aria-label={t('nav.tabBar')}>
        {tabs.map((tab) => (
          <IonTabButton key={tab.id} tab={tab.id} href={tab.path} className="sb-tab" data-testid={`tab-${tab.id}`}>
            <IonIcon icon={TAB_ICONS[tab.id]} aria-hidden="true" />
            <IonLabel>{t(tab.labelKey)}</IonLabel>
          </IonTabButton>
        ))}
      </IonTabBar>
    </IonTabs>
  );
}
