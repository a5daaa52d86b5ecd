import { IonButton } from '@ionic/react';
import { useTranslation } from 'react-i18next';
import { useNavigate, useParams } from 'react-router-dom';
import { DeleteHeldRecord } from '../components/cases/DeleteHeldRecord';
import { HandoverPanel } from '../components/cases/HandoverPanel';
import { NotesPanel } from '../components/cases/NotesPanel';
import { PhotoPicker } from '../components/cases/PhotoPicker';
import { SampleForm } from '../components/cases/SampleForm';
import { SyncBadge } from '../components/cases/SyncBadge';
import { CautionNote } from '../components/CautionNote';
import { PageShell } from '../components/PageShell';
import { captureDb } from '../features/cases/captureDb';
import { casePaths } from '../features/cases/casePaths';
import { caseIsOpen } from '../features/cases/saveCase';
import { useCase } from '../features/cases/useCases';
import { emptySampleDraft, sampleDraftOf } from '../features/samples/sampleDraft';
import { saveSample } from '../features/samples/saveSample';
import { useSample } from '../features/samples/useSamples';
import { useSession } from '../features/session/SessionProvider';
import { SampleScanList } from './SampleScanList';

/** A new sample (no sample id in the route) or one sample with its photos, chain of custody, notes and scans. */
export default function SamplePage() {
  const { t } = useTranslation();
  const { id: caseId = '', sampleId } = useParams();
  const navigate = useNavigate();
  const { session } = useSession();
  const caseRow = useCase(caseId);
  const sample = useSample(sampleId);
  const title = sample ? t('capture.sample.title', { label: sample.data.label }) : t('capture.sample.newTitle');
  if (caseRow === undefined || (sampleId && sample === undefined)) return <PageShell title={title}>{null}</PageShell>;
  if (caseRow === null || (sampleId && sample === null)) {
    return (
      <PageShell title={title}>
        <p className="sb-error" role="alert">
          {t('capture.sample.notFound')}
        </p>
      </PageShell>
    );
  }
  const editable = caseIsOpen(caseRow.data);
  const me = session?.user.displayName ?? '';

  return (
    <PageShell title={title}>
      <div className="sb-case-actions">
        <IonButton fill="outline" routerLink={casePaths.case(caseId)} routerDirection="back" className="sb-back">
          {t('capture.backToCase', { site: caseRow.data.siteName })}
        </IonButton>
        {sample && <SyncBadge state={sample.sync} testId="sample-sync" />}
      </div>
      {sample?.rejectedReason && (
        <p className="sb-error" role="alert">
          {t('capture.sync.rejected', { reason: sample.rejectedReason })}
        </p>
      )}
      <SampleForm
        key={sample?.id ?? 'new'}
        caseId={caseId}
        editable={editable}
        initial={sample ? sampleDraftOf(sample.data) : emptySampleDraft(me)}
        onSave={async (data) => {
          const id = sample?.id ?? crypto.randomUUID();
          await saveSample(captureDb(), id, data);
          if (!sample) navigate(casePaths.sample(caseId, id), { replace: true });
        }}
      />
      {sample && (
        <>
          <PhotoPicker caseId={caseId} sampleId={sample.id} sampleLabel={sample.data.label} editable={editable} />
          <HandoverPanel caseId={caseId} sampleId={sample.id} defaultFrom={sample.data.collectedBy} editable={editable} />
          <NotesPanel caseId={caseId} sampleId={sample.id} editable={editable} />
          <SampleScanList caseId={caseId} sampleId={sample.id} editable={editable} />
          {editable && (
            <DeleteHeldRecord
              entity="sample"
              id={sample.id}
              question={t('editing.sample.delete')}
              consequence={t('editing.sample.consequence')}
              onDeleted={() => navigate(casePaths.case(caseId), { replace: true })}
            />
          )}
        </>
      )}
      <CautionNote laser />
    </PageShell>
  );
}
