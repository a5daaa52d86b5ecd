import { useState, type FormEvent } from 'react';
import { useTranslation } from 'react-i18next';
import { refusalMessage } from '../../features/escalations/mutationMessage';
import { ESCALATION_ACTIONS, PPE_LEVELS, type AcknowledgeInput, type EscalationAction, type PpeLevel } from '../../features/escalations/types';
import type { UseMutationResult } from '@tanstack/react-query';
import { FormFooter, TextAreaField } from './FormParts';

interface Props {
  baseVersion: number;
  mutation: UseMutationResult<unknown, Error, AcknowledgeInput>;
}

/** Acknowledge with the action taken (and the PPE level when PPE is required) and an optional comment. */
export function AcknowledgeForm({ baseVersion, mutation }: Props) {
  const { t } = useTranslation();
  const [action, setAction] = useState<EscalationAction>();
  const [ppeLevel, setPpeLevel] = useState<PpeLevel>();
  const [comment, setComment] = useState('');
  const [problem, setProblem] = useState<string>();

  function submit(event: FormEvent) {
    event.preventDefault();
    setProblem(undefined);
    if (!action) return setProblem(t('escalations.ack.chooseAction'));
    if (action === 'ppe_required' && !ppeLevel) return setProblem(t('escalations.ack.choosePpe'));
    const text = comment.trim();
    mutation.mutate(
      { actionTaken: action, ...(action === 'ppe_required' ? { ppeLevel } : {}), ...(text ? { comment: text } : {}), baseVersion },
      { onError: (error) => setProblem(refusalMessage(t, error)) },
    );
  }

  return (
    <form onSubmit={submit} noValidate aria-labelledby="ack-heading" data-testid="acknowledge-form">
      <h2 id="ack-heading" className="sb-panel__heading">
        {t('escalations.ack.heading')}
      </h2>
      <fieldset className="sb-choice">
        <legend>{t('escalations.ack.actionLegend')}</legend>
        <div className="sb-choice__options">
          {ESCALATION_ACTIONS.map((a) => (
            <label key={a} className="sb-choice__option">
              <input type="radio" name="actionTaken" value={a} checked={action === a} onChange={() => setAction(a)} />
              {t(`escalations.action.${a}`)}
            </label>
          ))}
        </div>
      </fieldset>
      {action === 'ppe_required' && (
        <fieldset className="sb-choice">
          <legend>{t('escalations.ack.ppeLegend')}</legend>
          <div className="sb-choice__options">
            {PPE_LEVELS.map((level) => (
              <label key={level} className="sb-choice__option">
                <input type="radio" name="ppeLevel" value={level} checked={ppeLevel === level} onChange={() => setPpeLevel(level)} />
                {t('escalations.ppeLevel', { level })}
              </label>
            ))}
          </div>
          <p className="sb-muted">{t('escalations.ack.ppeHint')}</p>
        </fieldset>
      )}
      <TextAreaField label={t('escalations.ack.comment')} value={comment} onChange={setComment} maxLength={2000} />
      <FormFooter problem={problem} pending={mutation.isPending} label={t('escalations.ack.submit')} pendingLabel={t('escalations.ack.sending')} />
    </form>
  );
}
