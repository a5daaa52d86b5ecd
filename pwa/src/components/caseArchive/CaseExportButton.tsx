import { useState } from 'react';
import { IonButton, IonIcon } from '@ionic/react';
import { downloadOutline } from 'ionicons/icons';
import { useTranslation } from 'react-i18next';
import { captureDb } from '../../features/cases/captureDb';
import { exportCaseArchive } from '../../features/caseArchive/exportCaseArchive';
import { useSession } from '../../features/session/SessionProvider';

type ExportState = { kind: 'idle' } | { kind: 'working' } | { kind: 'done'; file: string; records: number; files: number } | { kind: 'failed'; reason: string };

/** Hands the file to the browser as a download (works offline: the bytes never leave the tablet). */
function download(fileName: string, bytes: Uint8Array): void {
  const url = URL.createObjectURL(new Blob([bytes.slice()], { type: 'application/zip' }));
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  document.body.append(link);
  link.click();
  link.remove();
  // Some browsers read the URL after click() returns.
  setTimeout(() => URL.revokeObjectURL(url), 60_000);
}

/** "Export to file": the case with everything below it as one .zip, built from the tablet's own data. */
export function CaseExportButton({ caseId }: { caseId: string }) {
  const { t } = useTranslation();
  const { session } = useSession();
  const [state, setState] = useState<ExportState>({ kind: 'idle' });

  async function run() {
    if (!session) return;
    setState({ kind: 'working' });
    try {
      const { id, email, displayName } = session.user;
      const archive = await exportCaseArchive(captureDb(), caseId, { id, email, displayName });
      download(archive.fileName, archive.bytes);
      setState({ kind: 'done', file: archive.fileName, records: archive.records, files: archive.files });
    } catch (error) {
      setState({ kind: 'failed', reason: error instanceof Error ? error.message : String(error) });
    }
  }

  return (
    <>
      <IonButton fill="outline" data-testid="case-export" disabled={!session || state.kind === 'working'} onClick={() => void run()}>
        <IonIcon icon={downloadOutline} slot="start" aria-hidden="true" />
        {state.kind === 'working' ? t('caseArchive.export.working') : t('caseArchive.export.button')}
      </IonButton>
      <div aria-live="polite">
        {state.kind === 'done' && (
          <p className="sb-success" data-testid="case-export-done">
            {t('caseArchive.export.done', { file: state.file, records: state.records, files: state.files })}
          </p>
        )}
        {state.kind === 'failed' && (
          <p className="sb-error" role="alert">
            {t('caseArchive.export.failed', { reason: state.reason })}
          </p>
        )}
      </div>
    </>
  );
}
