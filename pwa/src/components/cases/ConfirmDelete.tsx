import { useEffect, useId, useRef, useState } from 'react';
import { IonButton, IonIcon } from '@ionic/react';
import { trashOutline } from 'ionicons/icons';
import { useTranslation } from 'react-i18next';

/**
 * A delete button that asks first, in place: the question with "Yes, delete" and "Keep it". A failed
 * delete shows its reason and deletes nothing. With a `refusal` (what keeps the record), the button
 * tells that instead of asking.
 */
export function ConfirmDelete({
  question,
  onDelete,
  testId,
  consequence,
  refusal,
}: {
  question: string;
  onDelete: () => Promise<void>;
  testId: string;
  /** What else the delete means, said after the question. */
  consequence?: string;
  refusal?: string;
}) {
  const { t } = useTranslation();
  const [asking, setAsking] = useState(false);
  const [error, setError] = useState<string>();
  const questionId = useId();
  const questionRef = useRef<HTMLParagraphElement>(null);
  useEffect(() => {
    if (asking) questionRef.current?.focus();
  }, [asking]);

  async function confirm() {
    try {
      await onDelete();
      setAsking(false);
    } catch (failure) {
      setError(failure instanceof Error ? failure.message : String(failure));
    }
  }

  if (!asking) {
    return (
      <IonButton fill="outline" className="sb-delete" data-testid={testId} onClick={() => setAsking(true)}>
        <IonIcon icon={trashOutline} slot="start" aria-hidden="true" />
        {t('editing.delete')}
      </IonButton>
    );
  }
  if (refusal) {
    return (
      <div className="sb-confirm" role="group" aria-labelledby={questionId} data-testid={`${testId}-refused`}>
        <p id={questionId} ref={questionRef} tabIndex={-1}>
          {refusal}
        </p>
        <IonButton fill="outline" onClick={() => setAsking(false)}>
          {t('editing.understood')}
        </IonButton>
      </div>
    );
  }
  return (
    <div className="sb-confirm" role="group" aria-labelledby={questionId} data-testid={`${testId}-confirm`}>
      <p id={questionId} ref={questionRef} tabIndex={-1}>
        <strong>{question}</strong> {consequence && `${consequence} `}
        {t('editing.deleteHint')}
      </p>
      {error && (
        <p className="sb-error" role="alert">
          {error}
        </p>
      )}
      <div className="sb-button-row">
        <IonButton className="sb-danger" onClick={() => void confirm()}>
          {t('editing.confirmDelete')}
        </IonButton>
        <IonButton fill="outline" onClick={() => setAsking(false)}>
          {t('editing.keep')}
        </IonButton>
      </div>
    </div>
  );
}
