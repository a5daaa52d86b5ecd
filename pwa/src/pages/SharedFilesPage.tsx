import { useId, useState } from 'react';
import { IonButton, useIonAlert } from '@ionic/react';
import { useTranslation } from 'react-i18next';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { PageShell } from '../components/PageShell';
import { captureDb } from '../features/cases/captureDb';
import { caseIsOpen } from '../features/cases/saveCase';
import { useCaseList } from '../features/cases/useCases';
import { addSamplePhotoFile } from '../features/photos/addPhoto';
import { useSamples } from '../features/samples/useSamples';
import { scanPaths } from '../features/scans/scanPaths';
import { discardSharedFile, readSharedFile, type SharedFile } from '../features/share/sharedFiles';
import { useSharedFiles } from '../features/share/useSharedFiles';
import { formatDateTime } from '../i18n/format';

/** Where a shared scan file travels to the scan screen: its id in the navigation state. */
export interface SharedScanState {
  sharedFileId: string;
}

function SharedFileCard({ file, caseId, sampleId, onFiled }: { file: SharedFile; caseId: string; sampleId: string; onFiled: () => void }) {
  const { t, i18n } = useTranslation();
  const navigate = useNavigate();
  const [error, setError] = useState<string>();
  const [busy, setBusy] = useState(false);
  const [presentAlert] = useIonAlert();
  const chosen = caseId !== '' && sampleId !== '';

  async function fileIt() {
    setBusy(true);
    setError(undefined);
    try {
      if (file.kind === 'scan') {
        // The scan screen reads it like a picked file; it is forgotten here once the scan is saved.
        navigate(scanPaths.newScan(caseId, sampleId), { state: { sharedFileId: file.id } satisfies SharedScanState });
        return;
      }
      const kept = await readSharedFile(file.id);
      if (!kept) throw new Error(t('share.gone'));
      await addSamplePhotoFile(captureDb(), { caseId, sampleId }, new File([kept.bytes], file.name, { type: file.contentType }));
      await discardSharedFile(file.id);
      onFiled();
    } catch (caught) {
      setError(t('share.failed', { file: file.name, reason: caught instanceof Error ? caught.message : String(caught) }));
    } finally {
      setBusy(false);
    }
  }

  function remove() {
    void presentAlert({
      header: t('share.remove'),
      message: t('share.removeConfirm', { file: file.name }),
      buttons: [
        { text: t('share.keep'), role: 'cancel' },
        { text: t('share.remove'), role: 'destructive', handler: () => void discardSharedFile(file.id).then(onFiled) },
      ],
    });
  }

  return (
    <li className="sb-panel" data-testid="shared-file">
      <h3 className="sb-panel__heading">{file.name}</h3>
      <p className="sb-muted">
        {t(file.kind === 'photo' ? 'share.kindPhoto' : 'share.kindScan')} ·{' '}
        {t('share.size', { kb: new Intl.NumberFormat(i18n.language, { maximumFractionDigits: 1 }).format(file.size / 1024) })}
        {file.sharedAt && ` · ${formatDateTime(Date.parse(file.sharedAt), i18n.language)}`}
      </p>
      {error && (
        <p className="sb-error" role="alert">
          {error}
        </p>
      )}
      <IonButton className="sb-primary" disabled={!chosen || busy} onClick={() => void fileIt()}>
        {t(file.kind === 'photo' ? 'share.addPhoto' : 'share.importScan')}
      </IonButton>
      <IonButton fill="outline" disabled={busy} onClick={remove}>
        {t('share.remove')}
      </IonButton>
    </li>
  );
}

/** The Capture tab's screen for files shared from another app: choose the case and sample, then file each. */
export default function SharedFilesPage() {
  const { t } = useTranslation();
  const [params] = useSearchParams();
  const { files, refresh } = useSharedFiles();
  const cases = useCaseList()?.filter((item) => caseIsOpen(item.row.data));
  const [caseId, setCaseId] = useState('');
  const samples = useSamples(caseId);
  const [sampleId, setSampleId] = useState('');
  const caseSelect = useId();
  const sampleSelect = useId();
  const received = params.get('received');

  return (
    <PageShell title={t('share.title')}>
      {received === '0' && (
        <p className="sb-notice" role="status">
          {t('share.noneReceived')}
        </p>
      )}
      <section className="sb-panel" aria-labelledby="share-where">
        <h2 id="share-where" className="sb-panel__heading">
          {t('share.whereHeading')}
        </h2>
        <p className="sb-muted">{t('share.whereHint')}</p>
        <div className="sb-field">
          <label htmlFor={caseSelect}>{t('share.case')}</label>
          <select
            id={caseSelect}
            className="sb-select"
            value={caseId}
            onChange={(e) => {
              setCaseId(e.target.value);
              setSampleId('');
            }}
          >
            <option value="">{t('share.chooseCase')}</option>
            {cases?.map(({ row }) => (
              <option key={row.id} value={row.id}>
                {row.data.siteName}
              </option>
            ))}
          </select>
        </div>
        <div className="sb-field">
          <label htmlFor={sampleSelect}>{t('share.sample')}</label>
          <select id={sampleSelect} className="sb-select" value={sampleId} disabled={!caseId} onChange={(e) => setSampleId(e.target.value)}>
            <option value="">{t('share.chooseSample')}</option>
            {samples?.map((row) => (
              <option key={row.id} value={row.id}>
                {row.data.label}
              </option>
            ))}
          </select>
        </div>
      </section>
      {files?.length === 0 && <p className="sb-muted">{t('share.none')}</p>}
      <ul className="sb-plain-list">
        {files?.map((file) => (
          <SharedFileCard key={file.id} file={file} caseId={caseId} sampleId={sampleId} onFiled={() => void refresh()} />
        ))}
      </ul>
    </PageShell>
  );
}
