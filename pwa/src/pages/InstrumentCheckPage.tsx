import { useState } from 'react';
import { IonButton, IonIcon, IonSpinner } from '@ionic/react';
import { arrowBackOutline, checkmarkCircleOutline, closeCircleOutline } from 'ionicons/icons';
import { useTranslation } from 'react-i18next';
import { REFERENCE_STANDARDS, type InstrumentCheckResult } from '@siteband/shared';
import { LaserCaution } from '../components/caution/LaserCaution';
import { PageShell } from '../components/PageShell';
import { InstrumentCheckStatus } from '../components/spectrum/InstrumentCheckStatus';
import { InstrumentCheckTable } from '../components/spectrum/InstrumentCheckTable';
import { LazySpectrumPlot } from '../components/spectrum/LazySpectrumPlot';
import { ScanFilePicker } from '../components/spectrum/ScanFilePicker';
import { identifyClient } from '../features/identify/identifyWorker';
import { checkRow, checksTable, saveInstrumentCheck } from '../features/identify/instrumentChecks';
import type { PlotData, ScanFile } from '../features/identify/protocol';
import { COMMON_EXCITATIONS_NM } from '../features/identify/scanSettings';

type CheckState =
  | { status: 'idle' }
  | { status: 'running' }
  | { status: 'done'; check: InstrumentCheckResult; plot: PlotData; fileName: string }
  | { status: 'failed'; message: string; fileName: string };

/** The instrument check: pick a reference standard, import its scan, see every band and the verdict. */
export default function InstrumentCheckPage() {
  const { t } = useTranslation();
  const [standardId, setStandardId] = useState(REFERENCE_STANDARDS[0]!.id);
  const [state, setState] = useState<CheckState>({ status: 'idle' });
  const standard = REFERENCE_STANDARDS.find((s) => s.id === standardId)!;

  async function onFile(file: ScanFile) {
    setState({ status: 'running' });
    try {
      // A Raman standard's file may carry absolute wavenumbers; the common 785 nm laser is assumed then.
      const excitation = standard.technique === 'raman' ? COMMON_EXCITATIONS_NM[0] : undefined;
      const { check, plot } = await identifyClient().checkInstrument(file, standard.id, excitation);
      await saveInstrumentCheck(checksTable(), checkRow(check, standard.technique, file.name, Date.now()));
      setState({ status: 'done', check, plot, fileName: file.name });
    } catch (error) {
      setState({ status: 'failed', message: error instanceof Error ? error.message : String(error), fileName: file.name });
    }
  }

  return (
    <PageShell title={t('identify.check.title')}>
      <IonButton fill="outline" className="sb-back" routerLink="/tabs/capture" routerDirection="back">
        <IonIcon icon={arrowBackOutline} slot="start" aria-hidden="true" />
        {t('identify.check.back')}
      </IonButton>
      <section className="sb-panel" aria-labelledby="standard-heading">
        <h2 id="standard-heading" className="sb-panel__heading">
          {t('identify.check.standardHeading')}
        </h2>
        <fieldset className="sb-choice">
          <legend>{t('identify.check.standard')}</legend>
          <div className="sb-choice__options sb-choice__options--stack">
            {REFERENCE_STANDARDS.map((s) => (
              <label key={s.id} className="sb-choice__option">
                <input type="radio" name="standard" value={s.id} checked={s.id === standardId} onChange={() => { setStandardId(s.id); setState({ status: 'idle' }); }} />
                <span>
                  {s.name} <span className="sb-muted">({s.technique === 'ir' ? t('identify.settings.ir') : t('identify.settings.raman')})</span>
                </span>
              </label>
            ))}
          </div>
        </fieldset>
        <p className="sb-muted">{t(`identify.check.basis.${standard.toleranceBasis === 'published' ? 'published' : 'commonPractice'}`)}</p>
        {standard.notes.length > 0 && (
          <ul className="sb-notes">
            {standard.notes.map((n) => (
              <li key={n}>{n}</li>
            ))}
          </ul>
        )}
        <InstrumentCheckStatus technique={standard.technique} />
      </section>

      {standard.technique === 'raman' && <LaserCaution />}

      <section className="sb-panel" aria-labelledby="check-import-heading">
        <h2 id="check-import-heading" className="sb-panel__heading">
          {t('identify.check.importHeading')}
        </h2>
        <ScanFilePicker label={t('identify.check.fileLabel', { standard: standard.name })} hint={t('identify.file.hint')} onFile={onFile} testId="check-file" />
        {state.status === 'running' && (
          <p className="sb-notice" role="status">
            <IonSpinner name="crescent" aria-hidden="true" /> {t('identify.check.running')}
          </p>
        )}
        {state.status === 'failed' && (
          <div className="sb-error" role="alert" data-testid="check-error">
            <p>
              <strong>{t('identify.scan.failed', { file: state.fileName })}</strong>
            </p>
            <p>{state.message}</p>
          </div>
        )}
      </section>

      {state.status === 'done' && (
        <section className="sb-panel" aria-labelledby="check-result-heading" data-testid="check-result">
          <h2 id="check-result-heading" className="sb-panel__heading">
            <IonIcon icon={state.check.pass ? checkmarkCircleOutline : closeCircleOutline} aria-hidden="true" />
            {state.check.pass ? t('identify.check.passed') : t('identify.check.failed')}
          </h2>
          <p className={state.check.pass ? 'sb-success' : 'sb-error'} data-testid="check-verdict">
            {state.check.reason}
          </p>
          <LazySpectrumPlot
            plot={state.plot}
            technique={standard.technique}
            expectedCm1={standard.bands.map((b) => b.positionCm1)}
            yLabel={standard.technique === 'ir' ? t('identify.plot.yRawIr') : t('identify.plot.yRawRaman')}
            peaksKey={t('identify.check.foundKey')}
            expectedKey={t('identify.check.referenceKey')}
          />
          <InstrumentCheckTable bands={state.check.bands} />
        </section>
      )}
    </PageShell>
  );
}
