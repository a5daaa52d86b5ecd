import { IonSpinner } from '@ionic/react';
import { useTranslation } from 'react-i18next';
import type { ScanState } from '../../features/identify/useScanIdentification';

/** Where the identification of a scan file stands: running, done, or failed with the reason and what to do. */
export function IdentificationStatus({ state, failedHint }: { state: ScanState; failedHint?: string }) {
  const { t } = useTranslation();
  if (state.status === 'running') {
    return (
      <p className="sb-notice" role="status">
        <IonSpinner name="crescent" aria-hidden="true" /> {t('identify.scan.running', { file: state.fileName })}
      </p>
    );
  }
  if (state.status === 'failed') {
    return (
      <div className="sb-error" role="alert" data-testid="scan-error">
        <p>
          <strong>{t('identify.scan.failed', { file: state.fileName })}</strong>
        </p>
        <p>{state.message}</p>
        <p>{failedHint ?? t('identify.scan.failedHint')}</p>
      </div>
    );
  }
  if (state.status === 'done') {
    return (
      <p className="sb-muted" role="status">
        {t('identify.scan.done', { file: state.fileName })}
      </p>
    );
  }
  return null;
}
