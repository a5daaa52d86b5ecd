import { IonIcon } from '@ionic/react';
import { constructOutline } from 'ionicons/icons';
import type { ReactNode } from 'react';
import { useTranslation } from 'react-i18next';

/** States plainly what a not-yet-built screen will hold; it shows no made-up data. */
export function PlaceholderNotice({ children }: { children: ReactNode }) {
  const { t } = useTranslation();
  return (
    <section className="sb-panel sb-placeholder" aria-labelledby="placeholder-heading">
      <h2 id="placeholder-heading" className="sb-panel__heading">
        <IonIcon icon={constructOutline} aria-hidden="true" /> {t('placeholder.heading')}
      </h2>
      <p className="sb-lead">{children}</p>
      <p className="sb-muted">{t('placeholder.noData')}</p>
    </section>
  );
}
