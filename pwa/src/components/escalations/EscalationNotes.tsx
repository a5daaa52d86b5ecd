import { useState, type FormEvent } from 'react';
import type { UseMutationResult } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { refusalMessage } from '../../features/escalations/mutationMessage';
import type { EscalationNote } from '../../features/escalations/types';
import { formatDateTime } from '../../i18n/format';
import { FormFooter, TextAreaField } from './FormParts';

/** The escalation's notes, oldest first, and a box to add one (the inspector's tablet pulls them). */
export function EscalationNotes({ notes, mutation }: { notes: readonly EscalationNote[]; mutation: UseMutationResult<unknown, Error, string> }) {
  const { t, i18n } = useTranslation();
  const [text, setText] = useState('');
  const [problem, setProblem] = useState<string>();

  function submit(event: FormEvent) {
    event.preventDefault();
    setProblem(undefined);
    const value = text.trim();
    if (!value) return setProblem(t('escalations.notes.empty'));
    mutation.mutate(value, { onSuccess: () => setText(''), onError: (error) => setProblem(refusalMessage(t, error)) });
  }

  return (
    <section className="sb-panel" aria-labelledby="escalation-notes-heading">
      <h2 id="escalation-notes-heading" className="sb-panel__heading">
        {t('escalations.notes.heading')}
      </h2>
      {notes.length === 0 ? (
        <p className="sb-muted">{t('escalations.notes.none')}</p>
      ) : (
        <ul className="sb-escalation-notes" data-testid="escalation-notes">
          {notes.map((note) => (
            <li key={note.id}>
              <p>{note.text}</p>
              <p className="sb-muted">{t('escalations.notes.by', { who: note.authorName, when: formatDateTime(Date.parse(note.at), i18n.language) })}</p>
            </li>
          ))}
        </ul>
      )}
      <form onSubmit={submit} noValidate>
        <TextAreaField label={t('escalations.notes.add')} value={text} onChange={setText} maxLength={4000} />
        <FormFooter problem={problem} pending={mutation.isPending} label={t('escalations.notes.submit')} pendingLabel={t('escalations.notes.sending')} primary={false} />
      </form>
    </section>
  );
}
