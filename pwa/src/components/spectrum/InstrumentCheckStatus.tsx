import { IonButton, IonIcon } from '@ionic/react';
import { checkmarkCircleOutline, speedometerOutline, warningOutline } from 'ionicons/icons';
import { useTranslation } from 'react-i18next';
import type { Technique } from '@siteband/shared';
import { useLatestInstrumentCheck } from '../../features/identify/instrumentChecks';
import { formatDateTime } from '../../i18n/format';
import './scan-form.css';

/** Path of the instrument check screen under the Capture tab. */
export const INSTRUMENT_CHECK_PATH = '/tabs/capture/instrument-check';

/** Whether an instrument check is in force for this technique, with a way to run one. */
export function InstrumentCheckStatus({ technique }: { technique: Technique }) {
  const { t, i18n } = useTranslation();
  const latest = useLatestInstrumentCheck(technique);
  const techniqueName = technique === 'ir' ? t('identify.settings.ir') : t('identify.settings.raman');
  let body: { ok: boolean; text: string } | null = null;
  if (latest === null) body = { ok: false, text: t('identify.checkStatus.none', { technique: techniqueName }) };
  else if (latest && latest.pass) {
    body = { ok: true, text: t('identify.checkStatus.passed', { standard: latest.standardName, time: formatDateTime(latest.checkedAt, i18n.language) }) };
  } else if (latest) {
    body = { ok: false, text: t('identify.checkStatus.failed', { standard: latest.standardName, time: formatDateTime(latest.checkedAt, i18n.language) }) };
  }
  return (
    <section className={`sb-check-status ${body?.ok ? 'sb-check-status--ok' : 'sb-check-status--warn'}`} aria-live="polite" data-testid="instrument-check-status">
      {body && (
        <p>
          <IonIcon icon={body.ok ? checkmarkCircleOutline : warningOutline} aria-hidden="true" /> {body.text}
        </p>
      )}
      <IonButton fill="outline" routerLink={INSTRUMENT_CHECK_PATH}>
        <IonIcon icon={speedometerOutline} slot="start" aria-hidden="true" />
        {t('identify.checkStatus.open')}
      </IonButton>
    </section>
  );
}
