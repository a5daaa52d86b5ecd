import { IonIcon } from '@ionic/react';
import { alertCircleOutline, pulseOutline } from 'ionicons/icons';
import { useTranslation } from 'react-i18next';
import { formatNumber } from '../../features/identify/format';
import './results.css';

export interface QualityVerdictProps {
  readonly snr: number;
  readonly spikesRemoved: number;
  /** Why no ranking can be given; null when the scan is usable. */
  readonly unreliableReasons: readonly string[] | null;
}

/** The scan's quality: signal-to-noise and, when it cannot be trusted, a plain "no reliable result" with why. */
export function QualityVerdict({ snr, spikesRemoved, unreliableReasons }: QualityVerdictProps) {
  const { t, i18n } = useTranslation();
  if (unreliableReasons === null) {
    return (
      <p className="sb-quality" data-testid="quality-verdict">
        <IonIcon icon={pulseOutline} aria-hidden="true" />
        {t('identify.quality.usable', { snr: formatNumber(snr, i18n.language, 0) })}
        {spikesRemoved > 0 && ` ${t('identify.quality.spikes', { count: spikesRemoved })}`}
      </p>
    );
  }
  return (
    <section className="sb-error sb-no-result" role="alert" data-testid="no-reliable-result">
      <h3 className="sb-panel__heading">
        <IonIcon icon={alertCircleOutline} aria-hidden="true" /> {t('identify.quality.noResult')}
      </h3>
      <p>{t('identify.quality.noResultBody')}</p>
      <ul>
        {unreliableReasons.map((r) => (
          <li key={r}>{r}</li>
        ))}
      </ul>
    </section>
  );
}
