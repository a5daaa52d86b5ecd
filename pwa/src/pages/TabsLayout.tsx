import type { ComponentType } from 'react';
import { IonIcon, IonLabel, IonRouterOutlet, IonTabBar, IonTabButton, IonTabs } from '@ionic/react';
import { Navigate, Route } from 'react-router-dom';
import { useTranslation } from 'react-i18next';
import { TAB_ICONS } from '../components/tabIcons';
import { addSignedInStrings } from '../i18n/signedInStrings';
import { homePathForRole, tabsForRole, type TabId } from '../features/navigation/roleTabs';
import { useSession } from '../features/session/SessionProvider';
import { EventsProvider } from '../features/events/EventsProvider';
import { SyncProvider } from '../features/sync/SyncProvider';
import { SyncOnLiveEvents } from '../features/sync/SyncOnLiveEvents';
// Tab pages are imported here, not lazily: a lazy page inside Ionic's nested tab outlet was seen
// to stay at opacity 0 after its first entry (Ionic 9.0.4). The whole signed-in area is one chunk
// loaded after sign-in instead, which keeps it out of the first paint all the same.
import CasesPage from './CasesPage';
import CaseEditPage from './CaseEditPage';
import CasePage from './CasePage';
import SamplePage from './SamplePage';
import SampleScanPage from './SampleScanPage';
import CapturePage from './CapturePage';
import InstrumentCheckPage from './InstrumentCheckPage';
import SharedFilesPage from './SharedFilesPage';
import ReviewQueuePage from './ReviewQueuePage';
import CaseReviewPage from './CaseReviewPage';
import LibraryPage from './LibraryPage';
import StructureCheckPage from './StructureCheckPage';
import CompoundDetailPage from './CompoundDetailPage';
import CompoundEditPage from './CompoundEditPage';
import EscalationsPage from './EscalationsPage';
import EscalationPage from './EscalationPage';
import UsersPage from './UsersPage';
import AuditPage from './AuditPage';
import AccountPage from './AccountPage';

// This chunk brings the signed-in screens' strings; they are in place before any of them renders.
addSignedInStrings();

/** The screens of each tab, relative to /tabs; a tab's detail routes sit under its own path. */
const TAB_ROUTES: Readonly<Record<TabId, readonly { path: string; Page: ComponentType }[]>> = {
  cases: [
    { path: 'cases', Page: CasesPage },
    { path: 'cases/new', Page: CaseEditPage },
    { path: 'cases/:id', Page: CasePage },
    { path: 'cases/:id/edit', Page: CaseEditPage },
    { path: 'cases/:id/samples/new', Page: SamplePage },
    { path: 'cases/:id/samples/:sampleId', Page: SamplePage },
    { path: 'cases/:id/samples/:sampleId/scans/:scanId', Page: SampleScanPage },
  ],
  capture: [
    { path: 'capture', Page: CapturePage },
    { path: 'capture/instrument-check', Page: InstrumentCheckPage },
    { path: 'capture/shared', Page: SharedFilesPage },
  ],
  review: [
    { path: 'review', Page: ReviewQueuePage },
    { path: 'review/cases/:caseId', Page: CaseReviewPage },
  ],
  library: [
    { path: 'library', Page: LibraryPage },
    { path: 'library/structure', Page: StructureCheckPage },
    { path: 'library/new', Page: CompoundEditPage },
    { path: 'library/:id', Page: CompoundDetailPage },
    { path: 'library/:id/edit', Page: CompoundEditPage },
  ],
  escalations: [
    { path: 'escalations', Page: EscalationsPage },
    { path: 'escalations/:id', Page: EscalationPage },
  ],
  users: [{ path: 'users', Page: UsersPage }],
  audit: [{ path: 'audit', Page: AuditPage }],
  account: [
    { path: 'account', Page: AccountPage },
    // Every role reads the compound library and runs structure checks here; only supervisors curate.
    { path: 'account/library', Page: LibraryPage },
    { path: 'account/library/structure', Page: StructureCheckPage },
    { path: 'account/library/:id', Page: CompoundDetailPage },
  ],
};

/** The signed-in shell: only the tabs of the person's role, each with its own navigation stack. */
export default function TabsLayout() {
  const { t } = useTranslation();
  const { session } = useSession();
  // The route guard in App only renders this with a session; it can vanish for a moment on sign-out.
  if (!session) return null;
  const role = session.user.role;
  const tabs = tabsForRole(role);
  const home = homePathForRole(role);
  return (
    <SyncProvider>
      <EventsProvider>
        <SyncOnLiveEvents enabled={role === 'inspector'} />
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
      </EventsProvider>
    </SyncProvider>
  );
}
