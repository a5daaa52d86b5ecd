import { useId, useState, type FormEvent } from 'react';
import { IonButton, IonIcon } from '@ionic/react';
import { createOutline } from 'ionicons/icons';
import { useTranslation } from 'react-i18next';
import type { NoteRow } from '../../db/notesTable';
import { captureDb } from '../../features/cases/captureDb';
import { editNote } from '../../features/notes/addNote';
import { recordDelete } from '../../features/sync/recordChange';
import { formatDateTime } from '../../i18n/format';
import { ConfirmDelete } from './ConfirmDelete';
import { SyncBadge } from './SyncBadge';

/** One site note: its time, text and sync state; on an open case, edited in place or deleted after asking. */
export function NoteItem({ note, editable }: { note: NoteRow; editable: boolean }) {
  const { t, i18n } = useTranslation();
  const [draft, setDraft] = useState<string>();
  const [error, setError] = useState<string>();
  const inputId = useId();

  async function save(event: FormEvent) {
    event.preventDefault();
    try {
      await editNote(captureDb(), note, draft ?? '');
      setDraft(undefined);
      setError(undefined);
    } catch (failure) {
      setError(failure instanceof Error ? failure.message : String(failure));
    }
  }

  return (
    <li data-testid="site-note" data-note-id={note.id}>
      <p className="sb-note-list__meta">
        <time dateTime={note.data.recordedAt}>{formatDateTime(Date.parse(note.data.recordedAt), i18n.language)}</time>
        <SyncBadge state={note.sync} />
      </p>
      {draft === undefined ? (
        <p>{note.data.text}</p>
      ) : (
        <form onSubmit={save} noValidate>
          <div className="sb-field">
            <label htmlFor={inputId}>{t('editing.notes.editLabel')}</label>
            <textarea id={inputId} className="sb-text sb-text--area" rows={3} value={draft} onChange={(e) => setDraft(e.target.value)} />
          </div>
          {error && (
            <p className="sb-error" role="alert">
              {error}
            </p>
          )}
          <div className="sb-button-row">
            <IonButton type="submit" className="sb-primary">
              {t('editing.notes.save')}
            </IonButton>
            <IonButton fill="outline" onClick={() => setDraft(undefined)}>
              {t('editing.notes.cancel')}
            </IonButton>
          </div>
        </form>
      )}
      {note.rejectedReason && <p className="sb-error">{t('capture.sync.rejected', { reason: note.rejectedReason })}</p>}
      {editable && draft === undefined && (
        <div className="sb-button-row">
          <IonButton fill="outline" data-testid="edit-note" onClick={() => setDraft(note.data.text)}>
            <IonIcon icon={createOutline} slot="start" aria-hidden="true" />
            {t('editing.notes.edit')}
          </IonButton>
          <ConfirmDelete question={t('editing.notes.confirm')} testId="delete-note" onDelete={() => recordDelete(captureDb(), 'note', note.id)} />
        </div>
      )}
    </li>
  );
}
