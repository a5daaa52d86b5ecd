import { useState } from 'react';
import { IonButton } from '@ionic/react';
import { useTranslation } from 'react-i18next';
import { captureDb } from '../../features/cases/captureDb';
import { casePaths } from '../../features/cases/casePaths';
import { importCaseArchive, type CaseImportResult, type ImportOutcome } from '../../features/caseArchive/importCaseArchive';
import type { ScanFile } from '../../features/identify/protocol';
import { useSession } from '../../features/session/SessionProvider';
import { ScanFilePicker } from '../spectrum/ScanFilePicker';

type ImportState = { kind: 'idle' } | { kind: 'working'; file: string } | { kind: 'read'; file: string; result: CaseImportResult };

const OUTCOMES: readonly ImportOutcome[] = ['imported', 'unchanged', 'keptLocal'];

/** "Import from file": a case archive picked or dropped, checked, added to the tablet, and what became of each record. */
export function CaseImportPanel() {
  const { t } = useTranslation();
  const { session } = useSession();
  const [state, setState] = useState<ImportState>({ kind: 'idle' });

  async function take(file: ScanFile) {
    if (!session) return;
    setState({ kind: 'working', file: file.name });
    let result: CaseImportResult;
    try {
      result = await importCaseArchive(captureDb(), new Uint8Array(file.bytes), session.user.id);
    } catch (error) {
      result = { ok: false, reason: error instanceof Error ? error.message : String(error) };
    }
    setState({ kind: 'read', file: file.name, result });
  }

  const result = state.kind === 'read' ? state.result : undefined;
  return (
    <section className="sb-panel" aria-labelledby="case-import-heading">
      <h2 id="case-import-heading" className="sb-panel__heading">
        {t('caseArchive.import.heading')}
      </h2>
      <p className="sb-muted">{t('caseArchive.import.intro')}</p>
      <ScanFilePicker label={t('caseArchive.import.pick')} hint={t('caseArchive.import.hint')} accept=".zip,application/zip" onFile={(file) => void take(file)} testId="case-import-file" />
      <div aria-live="polite" data-testid="case-import-result">
        {state.kind === 'working' && <p className="sb-muted">{t('caseArchive.import.working', { file: state.file })}</p>}
        {state.kind === 'read' && result && !result.ok && (
          <p className="sb-error" role="alert">
            {t('caseArchive.import.refused', { file: state.file, reason: result.reason })}
          </p>
        )}
        {state.kind === 'read' && result?.ok && (
          <div className="sb-success">
            <p>{t('caseArchive.import.done', { file: state.file, site: result.siteName })}</p>
            <ul>
              {OUTCOMES.map((outcome) => {
                const count = result.records.filter((r) => r.outcome === outcome).length;
                return count > 0 ? <li key={outcome} data-testid={`case-import-${outcome}`}>{t(`caseArchive.import.${outcome}`, { count })}</li> : null;
              })}
              <li>{t('caseArchive.import.files', { count: result.files })}</li>
            </ul>
            {result.records.some((r) => r.outcome === 'keptLocal') && (
              <p>
                {t('caseArchive.import.keptList')}{' '}
                {result.records
                  .filter((r) => r.outcome === 'keptLocal')
                  .map((r) => t(`capture.entity.${r.entity}`))
                  .join(', ')}
              </p>
            )}
            <IonButton fill="outline" routerLink={casePaths.case(result.caseId)} data-testid="case-import-open">
              {t('caseArchive.import.open')}
            </IonButton>
          </div>
        )}
      </div>
    </section>
  );
}
