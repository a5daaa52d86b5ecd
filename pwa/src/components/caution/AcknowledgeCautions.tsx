import { useState } from 'react';
import { IonButton, IonIcon } from '@ionic/react';
import { checkmarkDoneOutline, megaphoneOutline } from 'ionicons/icons';
import { useTranslation } from 'react-i18next';
import type { Escalation } from '@siteband/shared';
import './caution.css';

export interface AcknowledgeCautionsProps {
  readonly escalation: Escalation;
  /** True once the inspector has acknowledged this result. */
  readonly acknowledged: boolean;
  readonly onAcknowledge: () => void;
}

/**
 * The deliberate step before a scan counts as reviewed by the inspector: tick that the caution
 * cards were read, then press the button. An escalation is stated plainly, and honestly: it is
 * sent once the scan is saved to a case, not from here.
 */
export function AcknowledgeCautions({ escalation, acknowledged, onAcknowledge }: AcknowledgeCautionsProps) {
  const { t } = useTranslation();
  const [ticked, setTicked] = useState(false);
  return (
    <section className="sb-panel sb-acknowledge" aria-labelledby="acknowledge-heading">
      <h3 id="acknowledge-heading" className="sb-panel__heading">
        {t('identify.ack.heading')}
      </h3>
      {escalation.required && (
        <div className="sb-escalation" role="alert" data-testid="escalation-notice">
          <p className="sb-escalation__title">
            <IonIcon icon={megaphoneOutline} aria-hidden="true" /> {t('identify.ack.escalationTitle')}
          </p>
          <ul>
            {escalation.triggers.map((trigger) => (
              <li key={`${trigger.ruleId}-${trigger.compoundId}`}>{t('identify.ack.trigger', { name: trigger.name, reason: trigger.reason })}</li>
            ))}
          </ul>
          <p>{t('identify.ack.escalationWhen')}</p>
        </div>
      )}
      {acknowledged ? (
        <p className="sb-success" role="status" data-testid="acknowledged">
          <IonIcon icon={checkmarkDoneOutline} aria-hidden="true" /> {t('identify.ack.done')}
        </p>
      ) : (
        <>
          <label className="sb-check">
            <input type="checkbox" checked={ticked} onChange={(e) => setTicked(e.target.checked)} />
            <span>{t('identify.ack.checkbox')}</span>
          </label>
          <IonButton className="sb-primary" disabled={!ticked} onClick={onAcknowledge}>
            {t('identify.ack.button')}
          </IonButton>
        </>
      )}
    </section>
  );
}
