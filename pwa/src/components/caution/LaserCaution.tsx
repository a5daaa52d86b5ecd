import { IonIcon } from '@ionic/react';
import { flashOutline } from 'ionicons/icons';
import { useTranslation } from 'react-i18next';
import { RAMAN_LASER_CAUTION } from '@siteband/shared';
import './caution.css';

/** Shown before and with every Raman scan: the laser is an ignition source. */
export function LaserCaution() {
  const { t } = useTranslation();
  return (
    <aside className="sb-caution sb-caution--laser" role="note" aria-labelledby="laser-caution-heading" data-testid="laser-caution">
      <h3 id="laser-caution-heading" className="sb-caution__heading">
        <IonIcon icon={flashOutline} aria-hidden="true" /> {t('identify.laser.heading')}
      </h3>
      <p>{RAMAN_LASER_CAUTION}</p>
    </aside>
  );
}
