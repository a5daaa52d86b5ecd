import { useEffect, useState, type ReactNode } from 'react';
import { useTranslation } from 'react-i18next';
import type { IdentifyResult } from '@siteband/shared';
import { LaserCaution } from '../components/caution/LaserCaution';
import { PageShell } from '../components/PageShell';
import { InstrumentCheckStatus } from '../components/spectrum/InstrumentCheckStatus';
import { IdentificationStatus } from '../components/spectrum/IdentificationStatus';
import { ScanFilePicker } from '../components/spectrum/ScanFilePicker';
import { ScanResultPanel } from '../components/spectrum/ScanResultPanel';
import { ScanSettingsForm } from '../components/spectrum/ScanSettingsForm';
import { ProcessingPanel } from '../components/spectrum/ProcessingPanel';
import { identifyClient } from '../features/identify/identifyWorker';
import type { IdentifyOutcome, ScanFile } from '../features/identify/protocol';
import { DEFAULT_SCAN_SETTINGS, type ScanSettings } from '../features/identify/scanSettings';
import { useScanIdentification } from '../features/identify/useScanIdentification';
import { useLibraryInForce } from '../features/library/useLibrary';

/** A result the inspector acknowledged, with everything needed to save it to a sample. */
export interface AcknowledgedScan {
  readonly settings: ScanSettings;
  readonly file: ScanFile;
  readonly outcome: IdentifyOutcome;
  /** ISO time of the acknowledgement. */
  readonly acknowledgedAt: string;
}

/**
 * The scan screen's body: how the scan was taken, the instrument's file, then the likely
 * compounds. `afterAcknowledge` renders under an acknowledged result (a sample's save action);
 * on the Capture tab alone the acknowledgement lives only on this screen.
 */
export function ScanCapture({
  afterAcknowledge,
  sharedFile,
}: {
  afterAcknowledge?: (scan: AcknowledgedScan) => ReactNode;
  /** A file shared from another app, imported as soon as it is read, exactly as if it had been picked. */
  sharedFile?: ScanFile;
}) {
  const { t } = useTranslation();
  const [scan, setScan] = useState<ScanSettings>(DEFAULT_SCAN_SETTINGS);
  // Rank against the library in force (supervisors' edits) once the tablet has received it.
  const { state, processing, setProcessing, chooseFile, file } = useScanIdentification(identifyClient, scan, useLibraryInForce());
  const [acknowledged, setAcknowledged] = useState<{ result: IdentifyResult; at: string } | null>(null);
  // Start the worker as the screen opens, so the library indices are built before the first file.
  useEffect(() => {
    identifyClient();
  }, []);
  useEffect(() => {
    if (sharedFile) chooseFile(sharedFile);
  }, [sharedFile, chooseFile]);
  const outcome: IdentifyOutcome | null = state.status === 'done' ? state.outcome : state.status === 'running' ? state.previous : null;

  const acknowledgedOutcome = state.status === 'done' && acknowledged?.result === state.outcome.result ? state.outcome : null;

  return (
    <>
      <section className="sb-panel" aria-labelledby="scan-heading">
        <h2 id="scan-heading" className="sb-panel__heading">
          {t('identify.scan.heading')}
        </h2>
        <ScanSettingsForm value={scan} onChange={setScan} />
        <InstrumentCheckStatus technique={scan.technique} />
      </section>

      {scan.technique === 'raman' && <LaserCaution />}

      <section className="sb-panel" aria-labelledby="import-heading">
        <h2 id="import-heading" className="sb-panel__heading">
          {t('identify.scan.importHeading')}
        </h2>
        <ScanFilePicker label={t('identify.file.label')} hint={t('identify.file.hint')} onFile={chooseFile} testId="scan-file" />
        <IdentificationStatus state={state} />
      </section>

      {outcome && (
        <>
          <ProcessingPanel used={outcome.processed.parameters} value={processing} onApply={setProcessing} busy={state.status === 'running'} />
          <ScanResultPanel
            outcome={outcome}
            acknowledged={acknowledged?.result === outcome.result}
            onAcknowledge={(result) => setAcknowledged({ result, at: new Date().toISOString() })}
          />
          {acknowledgedOutcome && file && afterAcknowledge?.({ settings: scan, file, outcome: acknowledgedOutcome, acknowledgedAt: acknowledged!.at })}
        </>
      )}
    </>
  );
}

/** The Capture tab's scan screen, not bound to a sample. */
export default function CapturePage() {
  const { t } = useTranslation();
  return (
    <PageShell title={t('pages.capture.title')}>
      <ScanCapture />
    </PageShell>
  );
}
