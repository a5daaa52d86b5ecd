import { useState } from 'react';
import { IonButton, IonIcon } from '@ionic/react';
import { saveOutline } from 'ionicons/icons';
import { useTranslation } from 'react-i18next';
import { useNavigate } from 'react-router-dom';
import { captureDb } from '../features/cases/captureDb';
import { useLatestInstrumentCheck } from '../features/identify/instrumentChecks';
import { saveScan } from '../features/scans/saveScan';
import { scanPaths } from '../features/scans/scanPaths';
import { formatDateTime } from '../i18n/format';
import type { AcknowledgedScan } from './CapturePage';

/** Saves an acknowledged scan to its sample, with the instrument check in force when it passed. */
export function SampleScanSave({
  caseId,
  sampleId,
  sampleLabel,
  scan,
  onSaved,
}: {
  caseId: string;
  sampleId: string;
  sampleLabel: string;
  scan: AcknowledgedScan;
  /** Runs once the scan is stored (a shared file is then forgotten). */
  onSaved?: () => Promise<void>;
}) {
  const { t, i18n } = useTranslation();
  const navigate = useNavigate();
  const check = useLatestInstrumentCheck(scan.settings.technique);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function save() {
    setBusy(true);
    setError(null);
    try {
      const { scanId } = await saveScan(captureDb(), { caseId, sampleId, ...scan, check: check ?? null, recordedAt: scan.acknowledgedAt });
      await onSaved?.();
      navigate(scanPaths.scan(caseId, sampleId, scanId), { replace: true });
    } catch (e) {
      // Nothing was written (one transaction): the screen keeps the file and result to try again.
      setError(e instanceof Error ? e.message : String(e));
      setBusy(false);
    }
  }

  return (
    <section className="sb-panel" aria-labelledby="save-scan-heading">
      <h2 id="save-scan-heading" className="sb-panel__heading">
        {t('capture.scans.saveHeading')}
      </h2>
      <p className="sb-muted">
        {check?.pass ? t('capture.scans.checkAttached', { standard: check.standardName, time: formatDateTime(check.checkedAt, i18n.language) }) : t('capture.scans.noCheckAttached')}
      </p>
      {scan.outcome.result.escalation.required && (
        <p className="sb-notice" role="status">
          {t('capture.scans.willEscalate')}
        </p>
      )}
      {error && (
        <p className="sb-error" role="alert">
          {t('capture.scans.saveFailed', { message: error })}
        </p>
      )}
      <IonButton onClick={() => void save()} disabled={busy || check === undefined} data-testid="save-scan">
        <IonIcon icon={saveOutline} slot="start" aria-hidden="true" />
        {t('capture.scans.save', { label: sampleLabel })}
      </IonButton>
    </section>
  );
}
