import { useId, useState, type FormEvent } from 'react';
import { IonButton } from '@ionic/react';
import { useTranslation } from 'react-i18next';
import { SAMPLE_STATES, type SampleData } from '../../db/samplesTable';
import type { SampleDraft } from '../../features/samples/sampleDraft';
import { sampleDataOf } from '../../features/samples/sampleDraft';
import { Field } from './Field';

/** The sample form: label, container, where it was found, what it looks like, who collected and sealed it. */
export function SampleForm({ caseId, initial, editable, onSave }: { caseId: string; initial: SampleDraft; editable: boolean; onSave: (data: SampleData) => Promise<void> }) {
  const { t } = useTranslation();
  const stateId = useId();
  const [draft, setDraft] = useState(initial);
  const [error, setError] = useState<string>();
  const [saved, setSaved] = useState(false);
  const patch = (next: Partial<SampleDraft>) => {
    setSaved(false);
    setDraft((d) => ({ ...d, ...next }));
  };

  async function submit(event: FormEvent) {
    event.preventDefault();
    try {
      await onSave(sampleDataOf(caseId, draft));
      setError(undefined);
      setSaved(true);
    } catch (failure) {
      setError(failure instanceof Error ? failure.message : String(failure));
    }
  }

  return (
    <form onSubmit={submit} noValidate className="sb-panel" aria-labelledby="sample-form-heading">
      <h2 id="sample-form-heading" className="sb-panel__heading">
        {t('capture.sample.formHeading')}
      </h2>
      <fieldset disabled={!editable} className="sb-plain-fieldset">
        <div className="sb-form-grid">
          <Field label={t('capture.sample.label')} value={draft.label} required onChange={(label) => patch({ label })} />
          <Field label={t('capture.sample.container')} value={draft.container} onChange={(container) => patch({ container })} />
          <Field label={t('capture.sample.locationOnSite')} value={draft.locationOnSite} onChange={(locationOnSite) => patch({ locationOnSite })} />
          <Field label={t('capture.sample.sealNumber')} value={draft.sealNumber} onChange={(sealNumber) => patch({ sealNumber })} />
          <Field label={t('capture.sample.collectedBy')} value={draft.collectedBy} required onChange={(collectedBy) => patch({ collectedBy })} />
          <Field type="datetime-local" label={t('capture.sample.collectedAt')} value={draft.collectedAt} required onChange={(collectedAt) => patch({ collectedAt })} />
        </div>
        <Field multiline label={t('capture.sample.description')} value={draft.description} onChange={(description) => patch({ description })} />
        <h3 className="sb-subheading">{t('capture.sample.observations')}</h3>
        <p className="sb-caution sb-caution--inline" data-testid="no-odour">
          {t('capture.sample.noOdour')}
        </p>
        <div className="sb-form-grid">
          <Field label={t('capture.sample.colour')} value={draft.colour} onChange={(colour) => patch({ colour })} />
          <div className="sb-field">
            <label htmlFor={stateId}>{t('capture.sample.state')}</label>
            <select id={stateId} className="sb-select" value={draft.state} onChange={(e) => patch({ state: e.target.value as SampleDraft['state'] })}>
              <option value="">{t('capture.sample.stateNotRecorded')}</option>
              {SAMPLE_STATES.map((s) => (
                <option key={s} value={s}>
                  {t(`capture.sample.states.${s}`)}
                </option>
              ))}
            </select>
          </div>
        </div>
        <Field multiline label={t('capture.sample.observationNotes')} value={draft.observationNotes} onChange={(observationNotes) => patch({ observationNotes })} />
      </fieldset>
      {error && (
        <p className="sb-error" role="alert">
          {error}
        </p>
      )}
      {saved && (
        <p className="sb-success" role="status">
          {t('capture.sample.saved')}
        </p>
      )}
      {editable && (
        <IonButton type="submit" className="sb-primary">
          {t('capture.sample.save')}
        </IonButton>
      )}
    </form>
  );
}
