import { useEffect, useMemo, useState } from 'react';
import { IonButton, IonIcon } from '@ionic/react';
import { createOutline, saveOutline } from 'ionicons/icons';
import { useTranslation } from 'react-i18next';
import { useLiveQuery } from 'dexie-react-hooks';
import { REFERENCE_STANDARDS, type IdentifyResult } from '@siteband/shared';
import type { PhotoRow } from '../../db/photosTable';
import type { ScanRow } from '../../db/scansTable';
import { captureDb } from '../../features/cases/captureDb';
import { useLatestInstrumentCheck } from '../../features/identify/instrumentChecks';
import { identifyClient } from '../../features/identify/identifyWorker';
import type { ScanSettings } from '../../features/identify/scanSettings';
import { useScanIdentification } from '../../features/identify/useScanIdentification';
import { useLibraryInForce } from '../../features/library/useLibrary';
import { identificationChanged, processingSettingsOf, saveScanEdit, scanSettingsOf, storedRawFile } from '../../features/scans/editScan';
import { useCaseCheck } from '../../features/scans/useScans';
import { formatDateTime } from '../../i18n/format';
import { LaserCaution } from '../caution/LaserCaution';
import { IdentificationStatus } from './IdentificationStatus';
import { ProcessingPanel } from './ProcessingPanel';
import { ScanResultPanel } from './ScanResultPanel';
import { ScanSettingsForm } from './ScanSettingsForm';

type CheckChoice = 'keep' | 'inForce' | 'none';

/** A saved scan's settings corrected in place; whatever the likely compounds depend on runs them again from the raw file. */
function ScanEditor({ scan, raw, onClose }: { scan: ScanRow; raw: PhotoRow | null; onClose: (message: string | null) => void }) {
  const { t, i18n } = useTranslation();
  // undefined while the file is read from the tablet's storage, null when only its metadata is here.
  const rawFile = useLiveQuery(() => storedRawFile(captureDb(), raw), [raw?.id, raw?.bytesHeld]);
  const [settings, setSettings] = useState<ScanSettings>(() => scanSettingsOf(scan.data));
  const startFrom = useMemo(() => processingSettingsOf(scan.data, settings.technique), [scan.data, settings.technique]);
  const { state, processing, setProcessing, chooseFile, file } = useScanIdentification(identifyClient, settings, useLibraryInForce());
  const [acknowledged, setAcknowledged] = useState<{ result: IdentifyResult; at: string } | null>(null);
  const [choice, setChoice] = useState<CheckChoice>(scan.data.instrumentCheckId ? 'keep' : 'none');
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const linked = useCaseCheck(scan.data.instrumentCheckId);
  const latest = useLatestInstrumentCheck(settings.technique);

  const changed = identificationChanged(scan.data, settings);
  // The identification runs again from the first change on, and then with every change of a setting.
  useEffect(() => {
    if (changed && rawFile && !file) chooseFile(rawFile, startFrom);
  }, [changed, rawFile, file, chooseFile, startFrom]);
  // Another technique starts again from its own processing (the recorded values belong to the other one).
  useEffect(() => {
    if (file) setProcessing(startFrom);
  }, [startFrom]);
  const rerun = file !== null;
  const outcome = state.status === 'done' ? state.outcome : state.status === 'running' ? state.previous : null;
  const acknowledgedOutcome = state.status === 'done' && acknowledged?.result === state.outcome.result ? state.outcome : null;

  const linkedStandard = linked ? REFERENCE_STANDARDS.find((s) => s.id === linked.data.standardId) : undefined;
  const canKeep = linked !== null && linked !== undefined && linkedStandard?.technique === settings.technique;
  const inForce = latest?.pass ? latest : null;
  const effective: CheckChoice = choice === 'keep' && !canKeep ? (inForce ? 'inForce' : 'none') : choice === 'inForce' && !inForce ? 'none' : choice;
  const checkChanged = effective === 'inForce' || (effective === 'none' && scan.data.instrumentCheckId !== null);
  const ready = rerun ? acknowledgedOutcome !== null : checkChanged;

  async function save() {
    setBusy(true);
    setError(null);
    try {
      const saved = await saveScanEdit(captureDb(), {
        scan,
        settings,
        reidentified: rerun && acknowledgedOutcome && acknowledged ? { outcome: acknowledgedOutcome, acknowledgedAt: acknowledged.at } : null,
        check: effective === 'keep' ? 'keep' : effective === 'inForce' ? inForce : null,
      });
      onClose(saved.escalationId ? `${t('scanEdit.saved')} ${t('scanEdit.escalated')}` : t('scanEdit.saved'));
    } catch (e) {
      // Nothing was written (one transaction): the form keeps the new settings and result to try again.
      setError(e instanceof Error ? e.message : String(e));
      setBusy(false);
    }
  }

  const checkOption = (value: CheckChoice, label: string) => (
    <label className="sb-choice__option">
      <input type="radio" name={`scan-check-${scan.id}`} value={value} checked={effective === value} onChange={() => setChoice(value)} />
      <span>{label}</span>
    </label>
  );

  return (
    <>
      <p>{t('scanEdit.intro')}</p>
      {rawFile ? <ScanSettingsForm value={settings} onChange={setSettings} /> : rawFile === null && <p className="sb-notice">{t('scanEdit.noRawFile')}</p>}
      {settings.technique === 'raman' && <LaserCaution />}
      <fieldset className="sb-choice">
        <legend>{t('scanEdit.checkLegend')}</legend>
        <div className="sb-choice__options sb-choice__options--stack">
          {canKeep && checkOption('keep', t('scanEdit.checkKeep', { standard: linkedStandard?.name ?? linked.data.standardId, time: formatDateTime(Date.parse(linked.data.performedAt), i18n.language) }))}
          {inForce && checkOption('inForce', t('scanEdit.checkInForce', { standard: inForce.standardName, time: formatDateTime(inForce.checkedAt, i18n.language) }))}
          {checkOption('none', t('scanEdit.checkNone'))}
        </div>
      </fieldset>
      {rerun ? (
        <>
          <p className="sb-notice">{t('scanEdit.rerunning')}</p>
          <IdentificationStatus state={state} failedHint={t('scanEdit.failedHint')} />
        </>
      ) : (
        <>
          <p className="sb-muted">{t('scanEdit.unchanged')}</p>
          {rawFile && (
            <IonButton fill="outline" data-testid="rerun-processing" onClick={() => chooseFile(rawFile, startFrom)}>
              {t('scanEdit.processing')}
            </IonButton>
          )}
        </>
      )}
      {rerun && outcome && (
        <>
          <ProcessingPanel used={outcome.processed.parameters} value={processing} onApply={setProcessing} busy={state.status === 'running'} />
          <ScanResultPanel outcome={outcome} acknowledged={acknowledged?.result === outcome.result} onAcknowledge={(result) => setAcknowledged({ result, at: new Date().toISOString() })} />
        </>
      )}
      {rerun && state.status === 'done' && !acknowledgedOutcome && <p className="sb-notice">{t('scanEdit.acknowledgeFirst')}</p>}
      {acknowledgedOutcome?.result.escalation.required && (
        <p className="sb-notice" role="status">
          {t('capture.scans.willEscalate')}
        </p>
      )}
      {error && (
        <p className="sb-error" role="alert">
          {t('scanEdit.failed', { message: error })}
        </p>
      )}
      <div className="sb-button-row">
        <IonButton onClick={() => void save()} disabled={busy || !ready} data-testid="save-scan-edit">
          <IonIcon icon={saveOutline} slot="start" aria-hidden="true" />
          {t('scanEdit.save')}
        </IonButton>
        <IonButton fill="outline" onClick={() => onClose(null)}>
          {t('scanEdit.cancel')}
        </IonButton>
      </div>
    </>
  );
}

/** On an open case: the way to correct how a saved scan was taken, and what became of the last correction. */
export function ScanEditPanel({ scan, raw }: { scan: ScanRow; raw: PhotoRow | null }) {
  const { t } = useTranslation();
  const [open, setOpen] = useState(false);
  const [message, setMessage] = useState<string | null>(null);
  return (
    <section className="sb-panel" aria-labelledby="scan-edit-heading" data-testid="scan-edit">
      <h2 id="scan-edit-heading" className="sb-panel__heading">
        {t('scanEdit.heading')}
      </h2>
      {message && (
        <p className="sb-notice" role="status">
          {message}
        </p>
      )}
      {open ? (
        <ScanEditor
          scan={scan}
          raw={raw}
          onClose={(done) => {
            setOpen(false);
            setMessage(done);
          }}
        />
      ) : (
        <IonButton fill="outline" data-testid="edit-scan" onClick={() => { setMessage(null); setOpen(true); }}>
          <IonIcon icon={createOutline} slot="start" aria-hidden="true" />
          {t('scanEdit.open')}
        </IonButton>
      )}
    </section>
  );
}
