import { IonButton } from '@ionic/react';
import { useTranslation } from 'react-i18next';
import { useNavigate, useParams } from 'react-router-dom';
import { CaseForm } from '../components/cases/CaseForm';
import { PageShell } from '../components/PageShell';
import { captureDb } from '../features/cases/captureDb';
import { draftOf, emptyCaseDraft } from '../features/cases/caseDraft';
import { casePaths } from '../features/cases/casePaths';
import { saveCase } from '../features/cases/saveCase';
import { useCase } from '../features/cases/useCases';

/** A new case (no id in the route) or the edit of an open one. */
export default function CaseEditPage() {
  const { t } = useTranslation();
  const { id } = useParams();
  const navigate = useNavigate();
  const existing = useCase(id);
  const title = id ? t('capture.case.editTitle') : t('capture.case.newTitle');
  if (id && existing === undefined) return <PageShell title={title}>{null}</PageShell>;

  return (
    <PageShell title={title}>
      <IonButton fill="outline" routerLink={id ? casePaths.case(id) : casePaths.list} routerDirection="back" className="sb-back">
        {t('capture.back')}
      </IonButton>
      {id && !existing ? (
        <p className="sb-error" role="alert">
          {t('capture.case.notFound')}
        </p>
      ) : (
        <CaseForm
          key={id ?? 'new'}
          initial={existing ? draftOf(existing.data) : emptyCaseDraft()}
          status={existing?.data.status ?? 'open'}
          onSave={async (data) => {
            const caseId = id ?? crypto.randomUUID();
            await saveCase(captureDb(), caseId, data);
            navigate(casePaths.case(caseId), { replace: true });
          }}
        />
      )}
    </PageShell>
  );
}
