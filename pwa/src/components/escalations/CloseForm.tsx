import { useState, type FormEvent } from 'react';
import type { UseMutationResult } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { refusalMessage } from '../../features/escalations/mutationMessage';
import type { CloseInput } from '../../features/escalations/types';
import { FormFooter, TextAreaField } from './FormParts';

/** Closes an acknowledged escalation with a required comment. */
export function CloseForm({ baseVersion, mutation }: { baseVersion: number; mutation: UseMutationResult<unknown, Error, CloseInput> }) {
  const { t } = useTranslation();
  const [comment, setComment] = useState('');
  const [problem, setProblem] = useState<string>();

  function submit(event: FormEvent) {
    event.preventDefault();
    setProblem(undefined);
    const text = comment.trim();
    if (!text) return setProblem(t('escalations.close.needComment'));
    mutation.mutate({ comment: text, baseVersion }, { onError: (error) => setProblem(refusalMessage(t, error)) });
  }

  return (
    <form onSubmit={submit} noValidate aria-labelledby="close-heading" data-testid="close-form">
      <h2 id="close-heading" className="sb-panel__heading">
        {t('escalations.close.heading')}
      </h2>
      <TextAreaField label={t('escalations.close.comment')} value={comment} onChange={setComment} maxLength={2000} />
      <FormFooter problem={problem} pending={mutation.isPending} label={t('escalations.close.submit')} pendingLabel={t('escalations.close.sending')} />
    </form>
  );
}
