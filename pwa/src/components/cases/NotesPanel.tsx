import { useCallback, useId, useState, type FormEvent } from 'react';
import { IonButton, IonIcon } from '@ionic/react';
import { micOutline, stopCircleOutline } from 'ionicons/icons';
import { useTranslation } from 'react-i18next';
import { captureDb } from '../../features/cases/captureDb';
import { addNote } from '../../features/notes/addNote';
import { useNotes } from '../../features/notes/useNotes';
import { useSpeechInput } from '../../features/notes/useSpeechInput';
import { NoteItem } from './NoteItem';

/** Timestamped site notes of a case or of one sample: the list, a text box and optional dictation. */
export function NotesPanel({ caseId, sampleId, editable }: { caseId: string; sampleId?: string; editable: boolean }) {
  const { t, i18n } = useTranslation();
  const notes = useNotes(caseId, sampleId);
  const [text, setText] = useState('');
  const [error, setError] = useState<string>();
  const inputId = useId();
  const headingId = useId();
  const append = useCallback((spoken: string) => setText((current) => (current ? `${current} ${spoken}` : spoken)), []);
  const speech = useSpeechInput(i18n.language, append);
  const shown = sampleId === undefined ? notes?.filter((n) => n.data.sampleId === null) : notes;

  async function submit(event: FormEvent) {
    event.preventDefault();
    try {
      await addNote(captureDb(), caseId, sampleId ?? null, text);
      setText('');
      setError(undefined);
    } catch (failure) {
      setError(failure instanceof Error ? failure.message : String(failure));
    }
  }

  return (
    <section className="sb-panel" aria-labelledby={headingId}>
      <h2 id={headingId} className="sb-panel__heading">
        {sampleId ? t('capture.notes.sampleHeading') : t('capture.notes.heading')}
      </h2>
      {shown && shown.length === 0 && <p className="sb-muted">{t('capture.notes.none')}</p>}
      <ol className="sb-note-list">
        {shown?.map((note) => <NoteItem key={note.id} note={note} editable={editable} />)}
      </ol>
      {editable && (
        <form onSubmit={submit} noValidate>
          <div className="sb-field">
            <label htmlFor={inputId}>{t('capture.notes.add')}</label>
            <textarea id={inputId} className="sb-text sb-text--area" rows={3} value={text} onChange={(e) => setText(e.target.value)} />
          </div>
          {error && (
            <p className="sb-error" role="alert">
              {error}
            </p>
          )}
          {speech.error && <p className="sb-error">{t('capture.notes.dictationFailed', { reason: speech.error })}</p>}
          <div className="sb-button-row">
            <IonButton type="submit" className="sb-primary">
              {t('capture.notes.save')}
            </IonButton>
            {speech.supported && (
              <IonButton fill="outline" onClick={speech.toggle} aria-pressed={speech.listening}>
                <IonIcon icon={speech.listening ? stopCircleOutline : micOutline} slot="start" aria-hidden="true" />
                {speech.listening ? t('capture.notes.stopDictation') : t('capture.notes.dictate')}
              </IonButton>
            )}
          </div>
        </form>
      )}
    </section>
  );
}
