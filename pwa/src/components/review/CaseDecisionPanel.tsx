import { useState } from 'react';
import { IonButton } from '@ionic/react';
import { useTranslation } from 'react-i18next';
import { Field } from '../cases/Field';
import type { CaseActions } from '../../features/review/caseReview';
import type { DecisionInput } from '../../features/review/types';

export interface CaseDecisionPanelProps {
  actions: CaseActions;
  baseVersion: number;
  busy: boolean;
  onDecide: (input: DecisionInput) => void;
}

/** The case's own decisions: return it to the inspector with a comment, sign it off, or reopen a signed-off case with a reason. */
export function CaseDecisionPanel({ actions, baseVersion, busy, onDecide }: CaseDecisionPanelProps) {
  const { t } = useTranslation();
  const [comment, setComment] = useState('');
  const [reason, setReason] = useState('');
  if (!actions.returnCase && !actions.signOff && !actions.reopen) {
    return <p className="sb-muted">{t('review.case.nothingToDecide')}</p>;
  }
  return (
    <div className="sb-case-decisions">
      {actions.returnCase && (
        <div className="sb-field">
          <Field label={t('review.case.returnComment')} value={comment} onChange={setComment} multiline required />
          <IonButton
            fill="outline"
            disabled={busy || !comment.trim()}
            onClick={() => onDecide({ kind: 'return', comment: comment.trim(), baseVersion })}
            data-testid="return-case"
          >
            {t('review.case.return')}
          </IonButton>
        </div>
      )}
      {actions.returnCase && (
        <div className="sb-field">
          {actions.undecidedScanIds.length > 0 && <p className="sb-notice">{t('review.case.undecided', { count: actions.undecidedScanIds.length })}</p>}
          <IonButton className="sb-primary" disabled={busy || !actions.signOff} onClick={() => onDecide({ kind: 'sign_off', baseVersion })} data-testid="sign-off">
            {t('review.case.signOff')}
          </IonButton>
        </div>
      )}
      {actions.reopen && (
        <div className="sb-field">
          <Field label={t('review.case.reopenReason')} value={reason} onChange={setReason} multiline required />
          <IonButton fill="outline" disabled={busy || !reason.trim()} onClick={() => onDecide({ kind: 'reopen', reason: reason.trim(), baseVersion })} data-testid="reopen-case">
            {t('review.case.reopen')}
          </IonButton>
        </div>
      )}
    </div>
  );
}
