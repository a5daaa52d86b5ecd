import { IonIcon, IonItem, IonLabel, IonList } from '@ionic/react';
import { shapesOutline } from 'ionicons/icons';
import { useTranslation } from 'react-i18next';
import { PageShell } from '../components/PageShell';
import { PlaceholderNotice } from '../components/PlaceholderNotice';

/** The supervisor's compound library; curation comes with the library issue, the structure check lives under it. */
export default function LibraryPage() {
  const { t } = useTranslation();
  return (
    <PageShell title={t('pages.library.title')}>
      <IonList className="sb-link-list" lines="none">
        <IonItem routerLink="/tabs/library/structure" detail button className="sb-link-item">
          <IonIcon icon={shapesOutline} slot="start" aria-hidden="true" />
          <IonLabel>
            <h2>{t('pages.library.structureLink')}</h2>
            <p>{t('pages.library.structureLinkHint')}</p>
          </IonLabel>
        </IonItem>
      </IonList>
      <PlaceholderNotice>{t('pages.library.body')}</PlaceholderNotice>
    </PageShell>
  );
}
