import { useState, type FormEvent } from 'react';
import { IonButton } from '@ionic/react';
import { useTranslation } from 'react-i18next';
import { captureDb } from '../../features/cases/captureDb';
import { localDateTimeValue } from '../../features/cases/caseDraft';
import { addHandover } from '../../features/samples/saveSample';
import { useHandovers } from '../../features/samples/useSamples';
import { Field } from './Field';
import { HandoverTable } from './HandoverTable';
import { SyncBadge } from './SyncBadge';

/** The sample's chain of custody: every hand-over in order (append-only) and the form for the next one. */
export function HandoverPanel({ caseId, sampleId, defaultFrom, editable }: { caseId: string; sampleId: string; defaultFrom: string; editable: boolean }) {
  const { t } = useTranslation();
  const handovers = useHandovers(sampleId);
  const empty = () => ({ from: handovers?.at(-1)?.data.to ?? defaultFrom, to: '', at: localDateTimeValue(new Date()), sealNumber: '', note: '' });
  const [form, setForm] = useState(empty);
  const [error, setError] = useState<string>();

  async function submit(event: FormEvent) {
    event.preventDefault();
    const at = new Date(form.at);
    try {
      if (Number.isNaN(at.getTime())) throw new RangeError(t('capture.handover.badTime'));
      await addHandover(captureDb(), caseId, {
        sampleId,
        from: form.from.trim(),
        to: form.to.trim(),
        at: at.toISOString(),
        sealNumber: form.sealNumber.trim() || null,
        note: form.note.trim() || null,
      });
      setForm({ ...empty(), from: form.to.trim() });
      setError(undefined);
    } catch (failure) {
      setError(failure instanceof Error ? failure.message : String(failure));
    }
  }

  return (
    <section className="sb-panel" aria-labelledby="custody-heading">
      <h2 id="custody-heading" className="sb-panel__heading">
        {t('capture.handover.heading')}
      </h2>
      <p className="sb-muted">{t('editing.permanent.handovers')}</p>
      {handovers && handovers.length > 0 && (
        <HandoverTable
          testId="handovers"
          extraHeading={t('capture.case.syncState')}
          lines={handovers.map((h) => ({
            id: h.id,
            ...h.data,
            extra: (
              <>
                <SyncBadge state={h.sync} />
                {h.rejectedReason && <span className="sb-error">{t('capture.sync.rejected', { reason: h.rejectedReason })}</span>}
              </>
            ),
          }))}
        />
      )}
      {editable && (
        <form onSubmit={submit} noValidate aria-label={t('capture.handover.formLabel')}>
          <div className="sb-form-grid">
            <Field label={t('capture.handover.from')} value={form.from} required onChange={(from) => setForm({ ...form, from })} />
            <Field label={t('capture.handover.to')} value={form.to} required onChange={(to) => setForm({ ...form, to })} />
            <Field type="datetime-local" label={t('capture.handover.at')} value={form.at} required onChange={(at) => setForm({ ...form, at })} />
            <Field label={t('capture.handover.seal')} value={form.sealNumber} onChange={(sealNumber) => setForm({ ...form, sealNumber })} />
          </div>
          <Field multiline label={t('capture.handover.note')} value={form.note} onChange={(note) => setForm({ ...form, note })} />
          {error && (
            <p className="sb-error" role="alert">
              {error}
            </p>
          )}
          <IonButton type="submit" className="sb-primary">
            {t('capture.handover.add')}
          </IonButton>
        </form>
      )}
    </section>
  );
}
