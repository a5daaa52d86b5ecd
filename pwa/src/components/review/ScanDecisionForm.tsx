import { useId, useState, type FormEvent } from 'react';
import { IonButton, IonRouterLink } from '@ionic/react';
import { useTranslation } from 'react-i18next';
import { SCAN_DECISION_KINDS, type Compound, type ScanDecisionKind } from '@siteband/shared';
import { Field } from '../cases/Field';
import { libraryPaths } from '../../features/library/libraryPaths';
import type { DecisionInput } from '../../features/review/types';

export interface ScanDecisionFormProps {
  scanId: string;
  /** The tablet's first likely compound, which "accept" keeps. */
  firstCompound: { id: string; name: string } | null;
  compounds: readonly Compound[];
  baseVersion: number;
  busy: boolean;
  onDecide: (input: DecisionInput) => void;
}

/** Accept the first likely compound, replace it by another library compound (with a reason), or ask for laboratory confirmation. */
export function ScanDecisionForm({ scanId, firstCompound, compounds, baseVersion, busy, onDecide }: ScanDecisionFormProps) {
  const { t } = useTranslation();
  const [kind, setKind] = useState<ScanDecisionKind>(firstCompound ? 'accept' : 'needs_lab');
  const [compoundId, setCompoundId] = useState('');
  const [reason, setReason] = useState('');
  const [comment, setComment] = useState('');
  const compoundField = useId();
  const paths = libraryPaths('/tabs/library');
  const missing = kind === 'replace' && (!compoundId || !reason.trim());

  function submit(event: FormEvent) {
    event.preventDefault();
    if (missing) return;
    if (kind === 'accept') onDecide({ kind, scanId, baseVersion });
    if (kind === 'replace') onDecide({ kind, scanId, compoundId, reason: reason.trim(), baseVersion });
    if (kind === 'needs_lab') onDecide({ kind, scanId, ...(comment.trim() ? { comment: comment.trim() } : {}), baseVersion });
  }

  return (
    <form className="sb-scan-decision" onSubmit={submit} data-testid={`scan-decision-${scanId}`}>
      <fieldset className="sb-choice">
        <legend>{t('review.decision.scanLegend')}</legend>
        <div className="sb-choice__options">
          {SCAN_DECISION_KINDS.map((k) => (
            <label key={k} className="sb-choice__option">
              <input type="radio" name={`decision-${scanId}`} value={k} checked={kind === k} disabled={k === 'accept' && !firstCompound} onChange={() => setKind(k)} />
              {k === 'accept' && firstCompound ? t('review.decision.acceptOption', { name: firstCompound.name }) : t(`review.decision.option.${k}`)}
            </label>
          ))}
        </div>
      </fieldset>
      {kind === 'replace' && (
        <>
          <div className="sb-field">
            <label htmlFor={compoundField}>{t('review.decision.compound')}</label>
            <select id={compoundField} className="sb-select" value={compoundId} required onChange={(e) => setCompoundId(e.target.value)}>
              <option value="">{t('review.decision.chooseCompound')}</option>
              {compounds
                .filter((c) => c.id !== firstCompound?.id)
                .map((c) => (
                  <option key={c.id} value={c.id}>
                    {c.name}
                  </option>
                ))}
            </select>
            {compoundId && (
              <IonRouterLink routerLink={paths.compound(compoundId)} className="sb-queue-link">
                {t('review.decision.openCompound')}
              </IonRouterLink>
            )}
          </div>
          <Field label={t('review.decision.reason')} value={reason} onChange={setReason} multiline required />
        </>
      )}
      {kind === 'needs_lab' && <Field label={t('review.decision.labComment')} value={comment} onChange={setComment} multiline />}
      <IonButton type="submit" className="sb-primary" disabled={busy || missing}>
        {t('review.decision.record')}
      </IonButton>
    </form>
  );
}
