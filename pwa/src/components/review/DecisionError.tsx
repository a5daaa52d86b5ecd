import { IonButton } from '@ionic/react';
import { useTranslation } from 'react-i18next';
import { isStaleDecision } from '../../features/review/useReview';

/** Why a decision was not recorded; when someone else decided first, the way to reload the case. */
export function DecisionError({ error, onReload }: { error: unknown; onReload: () => void }) {
  const { t } = useTranslation();
  if (!error) return null;
  if (isStaleDecision(error)) {
    return (
      <div className="sb-error" role="alert" data-testid="decision-stale">
        <p>{t('review.decision.stale')}</p>
        <IonButton fill="outline" onClick={onReload}>
          {t('review.decision.reload')}
        </IonButton>
      </div>
    );
  }
  return (
    <p className="sb-error" role="alert">
      {t('review.decision.failed', { message: error instanceof Error ? error.message : String(error) })}
    </p>
  );
}
