import { useState, type FormEvent } from 'react';
import { HAZARD_CLASSES, type HazardClassId } from '@siteband/shared';
import { useTranslation } from 'react-i18next';
import { captureDb } from '../../features/cases/captureDb';
import { ESCALATION_REASON_MAX, raiseEscalation } from '../../features/escalations/raiseEscalation';
import { FormFooter, TextAreaField } from './FormParts';
import './escalations.css';

const CLASS_IDS = Object.keys(HAZARD_CLASSES) as HazardClassId[];

/**
 * The inspector's own escalation, for a danger seen on site that no scan has flagged (a leaking
 * cylinder, an unknown powder near a drain). Saved on the tablet at once and sent with the next sync.
 */
export function RaiseEscalationPanel({ caseId }: { caseId: string }) {
  const { t } = useTranslation();
  const [reason, setReason] = useState('');
  const [classes, setClasses] = useState<ReadonlySet<HazardClassId>>(new Set());
  const [problem, setProblem] = useState<string>();
  const [raised, setRaised] = useState(false);
  const [pending, setPending] = useState(false);

  function toggle(id: HazardClassId) {
    setClasses((current) => {
      const next = new Set(current);
      if (next.has(id)) next.delete(id);
      else next.add(id);
      return next;
    });
  }

  async function submit(event: FormEvent) {
    event.preventDefault();
    if (!reason.trim()) {
      setProblem(t('escalations.raise.reasonMissing'));
      return;
    }
    setPending(true);
    try {
      await raiseEscalation(captureDb(), caseId, { reason, hazardClasses: [...classes] });
      setReason('');
      setClasses(new Set());
      setProblem(undefined);
      setRaised(true);
    } catch (failure) {
      setProblem(failure instanceof Error ? failure.message : String(failure));
    } finally {
      setPending(false);
    }
  }

  return (
    <section className="sb-panel" aria-labelledby="raise-escalation-heading" data-testid="raise-escalation">
      <h2 id="raise-escalation-heading" className="sb-panel__heading">
        {t('escalations.raise.heading')}
      </h2>
      <p className="sb-muted">{t('escalations.raise.intro')}</p>
      <form onSubmit={submit} noValidate>
        <TextAreaField label={t('escalations.raise.reason')} value={reason} onChange={(value) => { setReason(value); setRaised(false); }} maxLength={ESCALATION_REASON_MAX} />
        <details className="sb-raise-classes">
          <summary>{t('escalations.raise.classesSummary', { count: classes.size })}</summary>
          <fieldset className="sb-choice">
            <legend>{t('escalations.raise.classesLegend')}</legend>
            <div className="sb-choice__options">
              {CLASS_IDS.map((id) => (
                <label key={id} className="sb-choice__option">
                  <input type="checkbox" checked={classes.has(id)} onChange={() => toggle(id)} />
                  {HAZARD_CLASSES[id].name}
                </label>
              ))}
            </div>
          </fieldset>
        </details>
        {raised && (
          <p role="status" data-testid="escalation-raised">
            {t('escalations.raise.saved')}
          </p>
        )}
        <FormFooter problem={problem} pending={pending} label={t('escalations.raise.submit')} pendingLabel={t('escalations.raise.saving')} />
      </form>
    </section>
  );
}
