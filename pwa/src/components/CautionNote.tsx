import { IonIcon } from '@ionic/react';
import { warningOutline } from 'ionicons/icons';
import { useTranslation } from 'react-i18next';

/** The standing cautions shown wherever a screen leads to handling or identifying a substance. */
export function CautionNote({ laser = false }: { laser?: boolean }) {
  const { t } = useTranslation();
  return (
    <aside className="sb-caution" aria-labelledby="caution-heading">
      <h2 id="caution-heading" className="sb-caution__heading">
        <IonIcon icon={warningOutline} aria-hidden="true" /> {t('caution.heading')}
      </h2>
      <ul>
        <li>{t('caution.presumptive')}</li>
        <li>{t('caution.procedures')}</li>
        {laser && <li>{t('caution.laser')}</li>}
      </ul>
    </aside>
  );
}
