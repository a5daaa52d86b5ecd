import { useState, type FormEvent } from 'react';
import { IonButton } from '@ionic/react';
import { useTranslation } from 'react-i18next';
import type { CaseData } from '../../db/casesTable';
import { caseDataOf, type CaseDraft } from '../../features/cases/caseDraft';
import { caseProblems } from '../../features/cases/saveCase';
import { Field } from './Field';
import { LocationFields } from './LocationFields';

/** The new-case / edit-case form; hands a valid case record to `onSave` and keeps the typing on errors. */
export function CaseForm({ initial, status, onSave }: { initial: CaseDraft; status: CaseData['status']; onSave: (data: CaseData) => Promise<void> }) {
  const { t } = useTranslation();
  const [draft, setDraft] = useState(initial);
  const [problems, setProblems] = useState<string[]>([]);
  const [busy, setBusy] = useState(false);
  const patch = (next: Partial<CaseDraft>) => setDraft((d) => ({ ...d, ...next }));

  async function submit(event: FormEvent) {
    event.preventDefault();
    const data = caseDataOf(draft, status);
    const found = caseProblems(data);
    setProblems(found);
    if (found.length > 0) return;
    setBusy(true);
    try {
      await onSave(data);
    } catch (error) {
      setProblems([error instanceof Error ? error.message : String(error)]);
    } finally {
      setBusy(false);
    }
  }

  return (
    <form onSubmit={submit} noValidate className="sb-panel" aria-labelledby="case-form-heading">
      <h2 id="case-form-heading" className="sb-panel__heading">
        {t('capture.case.formHeading')}
      </h2>
      <Field label={t('capture.case.siteName')} value={draft.siteName} required onChange={(siteName) => patch({ siteName })} />
      <Field label={t('capture.case.address')} value={draft.address} onChange={(address) => patch({ address })} />
      <LocationFields draft={draft} onChange={patch} />
      <Field type="datetime-local" label={t('capture.case.startedAt')} value={draft.startedAt} required onChange={(startedAt) => patch({ startedAt })} />
      <Field multiline label={t('capture.case.weather')} value={draft.weatherNotes} onChange={(weatherNotes) => patch({ weatherNotes })} />
      <Field multiline label={t('capture.case.access')} value={draft.accessNotes} onChange={(accessNotes) => patch({ accessNotes })} />
      {problems.length > 0 && (
        <div className="sb-error" role="alert">
          <ul>
            {problems.map((p) => (
              <li key={p}>{p.startsWith('capture.') ? t(p) : p}</li>
            ))}
          </ul>
        </div>
      )}
      <IonButton type="submit" className="sb-primary" disabled={busy}>
        {t('capture.case.save')}
      </IonButton>
    </form>
  );
}
