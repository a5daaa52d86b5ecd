import { useId } from 'react';
import { IonIcon } from '@ionic/react';
import { warningOutline } from 'ionicons/icons';
import { useTranslation } from 'react-i18next';
import './caution.css';

/** The cautions every result carries: presumptive identification, laboratory confirmation, SDS and codes. */
export function ResultCautions({ cautions }: { cautions: readonly string[] }) {
  const { t } = useTranslation();
  const headingId = useId();
  return (
    <aside className="sb-caution" aria-labelledby={headingId} data-testid="result-cautions">
      <h3 id={headingId} className="sb-caution__heading">
        <IonIcon icon={warningOutline} aria-hidden="true" /> {t('identify.cautions.heading')}
      </h3>
      <ul>
        {cautions.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </aside>
  );
}
