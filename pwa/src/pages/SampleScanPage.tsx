import { IonButton } from '@ionic/react';
import { useTranslation } from 'react-i18next';
import { useEffect, useState } from 'react';
import { useLocation, useNavigate, useParams } from 'react-router-dom';
import { DeleteHeldRecord } from '../components/cases/DeleteHeldRecord';
import { CautionNote } from '../components/CautionNote';
import { PageShell } from '../components/PageShell';
import { casePaths } from '../features/cases/casePaths';
import { caseIsOpen } from '../features/cases/saveCase';
import { useCase } from '../features/cases/useCases';
import { useSample } from '../features/samples/useSamples';
import { NEW_SCAN } from '../features/scans/scanPaths';
import { useScanRecord } from '../features/scans/useScans';
import { discardSharedFile, readSharedFile } from '../features/share/sharedFiles';
import type { ScanFile } from '../features/identify/protocol';
import type { SharedScanState } from './SharedFilesPage';
import { ScanCapture } from './CapturePage';
import { SampleScanDetail } from './SampleScanDetail';
import { SampleScanSave } from './SampleScanSave';

/** A saved scan of one sample as stored on the tablet; on an open case, deleted after asking (back to `backTo`). */
function SavedScan({ scanId, editable, backTo }: { scanId: string; editable: boolean; backTo: string }) {
  const { t } = useTranslation();
  const navigate = useNavigate();
  const record = useScanRecord(scanId);
  if (record === undefined) return null;
  if (record === null) {
    return (
      <p className="sb-error" role="alert">
        {t('capture.scanDetail.notFound')}
      </p>
    );
  }
  return (
    <>
      <SampleScanDetail {...record} editable={editable} />
      {editable && (
        <DeleteHeldRecord
          entity="scan"
          id={scanId}
          question={t('editing.scan.delete')}
          consequence={t('editing.scan.consequence')}
          onDeleted={() => navigate(backTo, { replace: true })}
        />
      )}
    </>
  );
}

/** The scan screen bound to a sample (`scans/new`), or one of the sample's saved scans. */
export default function SampleScanPage() {
  const { t } = useTranslation();
  const { id: caseId = '', sampleId = '', scanId = '' } = useParams();
  const caseRow = useCase(caseId);
  const sample = useSample(sampleId);
  const isNew = scanId === NEW_SCAN;
  const sharedFileId = (useLocation().state as SharedScanState | null)?.sharedFileId;
  const [sharedFile, setSharedFile] = useState<ScanFile>();
  const [sharedGone, setSharedGone] = useState(false);
  useEffect(() => {
    if (!isNew || !sharedFileId) return;
    let live = true;
    void readSharedFile(sharedFileId).then((kept) => {
      if (!live) return;
      if (kept) setSharedFile({ name: kept.file.name, bytes: kept.bytes });
      else setSharedGone(true);
    });
    return () => {
      live = false;
    };
  }, [isNew, sharedFileId]);
  const title = sample ? t(isNew ? 'capture.scans.newTitle' : 'capture.scanDetail.title', { label: sample.data.label }) : t('capture.scanDetail.untitled');
  if (caseRow === undefined || sample === undefined) return <PageShell title={title}>{null}</PageShell>;
  if (caseRow === null || sample === null) {
    return (
      <PageShell title={title}>
        <p className="sb-error" role="alert">
          {t('capture.sample.notFound')}
        </p>
      </PageShell>
    );
  }
  const editable = caseIsOpen(caseRow.data);
  return (
    <PageShell title={title}>
      <div className="sb-case-actions">
        <IonButton fill="outline" routerLink={casePaths.sample(caseId, sampleId)} routerDirection="back" className="sb-back">
          {t('capture.scans.backToSample', { label: sample.data.label })}
        </IonButton>
      </div>
      {!isNew && <SavedScan scanId={scanId} editable={editable} backTo={casePaths.sample(caseId, sampleId)} />}
      {isNew && !editable && <p className="sb-notice">{t('capture.case.frozen')}</p>}
      {isNew && sharedGone && (
        <p className="sb-error" role="alert">
          {t('share.gone')}
        </p>
      )}
      {isNew && editable && (
        <ScanCapture
          sharedFile={sharedFile}
          afterAcknowledge={(scan) => (
            <SampleScanSave
              caseId={caseId}
              sampleId={sampleId}
              sampleLabel={sample.data.label}
              scan={scan}
              onSaved={sharedFileId ? () => discardSharedFile(sharedFileId) : undefined}
            />
          )}
        />
      )}
      <CautionNote laser />
    </PageShell>
  );
}
