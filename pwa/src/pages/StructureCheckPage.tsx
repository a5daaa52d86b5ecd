import { IonButton, IonIcon } from '@ionic/react';
import { arrowBackOutline } from 'ionicons/icons';
import { useTranslation } from 'react-i18next';
import { PageShell } from '../components/PageShell';
import { PlaceholderNotice } from '../components/PlaceholderNotice';

/** The structure check inside the compound library; the symmetry engine is wired in a later issue. */
export default function StructureCheckPage() {
  const { t } = useTranslation();
  return (
    <PageShell title={t('pages.structure.title')}>
      <IonButton fill="outline" routerLink="/tabs/library" routerDirection="back" className="sb-back">
        <IonIcon icon={arrowBackOutline} slot="start" aria-hidden="true" />
        {t('pages.structure.back')}
      </IonButton>
      <PlaceholderNotice>{t('pages.structure.body')}</PlaceholderNotice>
    </PageShell>
  );
}
