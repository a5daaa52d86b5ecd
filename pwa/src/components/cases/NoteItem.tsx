import { useState } from 'react';
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
import { TextEditForm } from './TextEditForm';

/** One site note: its time, text and sync state; on an open case, edited in place or deleted after asking. */
export function NoteItem({ note, editable }: { note: NoteRow; editable: boolean }) {
  const { t, i18n } = useTranslation();
  const [editing, setEditing] = useState(false);

  return (
    <li data-testid="site-note" data-note-id={note.id}>
      <p className="sb-note-list__meta">
        <time dateTime={note.data.recordedAt}>{formatDateTime(Date.parse(note.data.recordedAt), i18n.language)}</time>
        <SyncBadge state={note.sync} />
      </p>
      {editing ? (
        <TextEditForm
          label={t('editing.notes.editLabel')}
          initial={note.data.text}
          saveLabel={t('editing.notes.save')}
          cancelLabel={t('editing.notes.cancel')}
          onSave={(text) => editNote(captureDb(), note, text)}
          onDone={() => setEditing(false)}
        />
      ) : (
        <p>{note.data.text}</p>
      )}
      {note.rejectedReason && <p className="sb-error">{t('capture.sync.rejected', { reason: note.rejectedReason })}</p>}
      {editable && !editing && (
        <div className="sb-button-row">
          <IonButton fill="outline" data-testid="edit-note" onClick={() => setEditing(true)}>
            <IonIcon icon={createOutline} slot="start" aria-hidden="true" />
            {t('editing.notes.edit')}
          </IonButton>
          <ConfirmDelete question={t('editing.notes.confirm')} testId="delete-note" onDelete={() => recordDelete(captureDb(), 'note', note.id)} />
        </div>
      )}
    </li>
  );
}
