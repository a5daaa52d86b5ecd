import { IonButton, IonIcon } from '@ionic/react';
import { addOutline, createOutline } from 'ionicons/icons';
import { useTranslation } from 'react-i18next';
import { useNavigate, useParams } from 'react-router-dom';
import { CaseExportButton } from '../components/caseArchive/CaseExportButton';
import { CaseFacts } from '../components/cases/CaseFacts';
import { ConflictPanel } from '../components/cases/ConflictPanel';
import { DeleteHeldRecord } from '../components/cases/DeleteHeldRecord';
import { CasePhotos } from '../components/cases/CasePhotos';
import { NotesPanel } from '../components/cases/NotesPanel';
import { SampleList } from '../components/cases/SampleList';
import { SyncBar } from '../components/cases/SyncBar';
import { CautionNote } from '../components/CautionNote';
import { PageShell } from '../components/PageShell';
import { captureDb } from '../features/cases/captureDb';
import { casePaths } from '../features/cases/casePaths';
import { caseIsOpen, inspectorNextStatus, saveCase } from '../features/cases/saveCase';
import { useCaseOutcome } from '../features/cases/useCaseOutcome';
import { CaseEscalationsPanel } from '../components/cases/CaseEscalationsPanel';
import { CaseReviewPanel } from '../components/cases/CaseReviewPanel';
import { RaiseEscalationPanel } from '../components/escalations/RaiseEscalationPanel';
import { useCase } from '../features/cases/useCases';

/** One case: the visit, its samples, site notes, conflicts, sync, and submit or reopen. */
export default function CasePage() {
  const { t } = useTranslation();
  const { id = '' } = useParams();
  const navigate = useNavigate();
  const row = useCase(id);
  const outcome = useCaseOutcome(id);
  const title = row ? row.data.siteName : t('capture.case.title');
  if (row === undefined) return <PageShell title={t('capture.case.title')}>{null}</PageShell>;
  if (row === null) {
    return (
      <PageShell title={title}>
        <p className="sb-error" role="alert">
          {t('capture.case.notFound')}
        </p>
      </PageShell>
    );
  }
  const open = caseIsOpen(row.data);
  const next = inspectorNextStatus(row.data.status);
  const nextLabel = next === 'submitted' ? t('capture.case.submit') : row.data.status === 'returned' ? t('caseOutcome.reopenToFix') : t('capture.case.reopen');

  return (
    <PageShell title={title}>
      <div className="sb-case-actions">
        <IonButton fill="outline" routerLink={casePaths.list} routerDirection="back" className="sb-back">
          {t('capture.backToCases')}
        </IonButton>
        <SyncBar />
      </div>
      <ConflictPanel caseId={id} />
      <section className="sb-panel" aria-labelledby="visit-heading">
        <h2 id="visit-heading" className="sb-panel__heading">
          {t('capture.case.visitHeading')}
        </h2>
        <CaseFacts row={row} />
        <div className="sb-button-row">
          {open && (
            <IonButton fill="outline" routerLink={casePaths.edit(id)}>
              <IonIcon icon={createOutline} slot="start" aria-hidden="true" />
              {t('capture.case.edit')}
            </IonButton>
          )}
          {next && (
            <IonButton
              className={open ? 'sb-primary' : undefined}
              fill={open ? 'solid' : 'outline'}
              data-testid="case-submit-toggle"
              onClick={() => void saveCase(captureDb(), id, { ...row.data, status: next })}
            >
              {nextLabel}
            </IonButton>
          )}
          <CaseExportButton caseId={id} />
        </div>
        {open && (
          <DeleteHeldRecord
            entity="case"
            id={id}
            question={t('editing.case.delete')}
            consequence={t('editing.case.consequence')}
            onDeleted={() => navigate(casePaths.list, { replace: true })}
          />
        )}
        {row.data.status === 'submitted' && <p className="sb-muted">{t('capture.case.frozen')}</p>}
        {!open && row.data.status !== 'submitted' && (
          <p className="sb-muted" data-testid="case-read-only">
            {t('editing.readOnly', { status: t(`capture.status.${row.data.status}`) })}
          </p>
        )}
      </section>
      {outcome && <CaseReviewPanel row={row} outcome={outcome} />}
      {outcome && <CaseEscalationsPanel outcome={outcome} />}
      {open && <RaiseEscalationPanel caseId={id} />}
      <section className="sb-panel" aria-labelledby="samples-heading">
        <h2 id="samples-heading" className="sb-panel__heading">
          {t('capture.sample.listHeading')}
        </h2>
        <SampleList caseId={id} />
        {open && (
          <IonButton routerLink={casePaths.newSample(id)} className="sb-primary" data-testid="new-sample">
            <IonIcon icon={addOutline} slot="start" aria-hidden="true" />
            {t('capture.sample.new')}
          </IonButton>
        )}
      </section>
      <CasePhotos caseId={id} editable={open} />
      <NotesPanel caseId={id} editable={open} />
      <CautionNote />
    </PageShell>
  );
}
