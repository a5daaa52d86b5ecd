import { useEffect, useId, useState } from 'react';
import { IonButton } from '@ionic/react';
import { useTranslation } from 'react-i18next';
import type { ProcessParameters } from '@siteband/shared';
import type { ProcessingSettings } from '../../features/identify/scanSettings';
import { formatNumber } from '../../features/identify/format';
import './scan-form.css';

export interface ProcessingPanelProps {
  /** What the pipeline used on the last run, shown as the starting values. */
  readonly used: ProcessParameters;
  readonly value: ProcessingSettings;
  readonly onApply: (next: ProcessingSettings) => void;
  readonly busy: boolean;
}

type Draft = { baselineLambda: string; smoothingWindow: string; peakThresholdSigma: string };

function draftOf(used: ProcessParameters): Draft {
  return {
    baselineLambda: String(used.baseline.lambda),
    smoothingWindow: String(used.smoothing.windowSize),
    peakThresholdSigma: String(used.peaks.thresholdSigma),
  };
}

/** Baseline, smoothing and peak threshold, folded away until needed; Apply re-runs the worker. */
export function ProcessingPanel({ used, value, onApply, busy }: ProcessingPanelProps) {
  const { t, i18n } = useTranslation();
  const ids = { lambda: useId(), window: useId(), sigma: useId() };
  const [draft, setDraft] = useState<Draft>(() => draftOf(used));
  useEffect(() => setDraft(draftOf(used)), [used]);
  const field = (key: keyof Draft, id: string, label: string, hint: string, step: string) => (
    <div className="sb-field">
      <label htmlFor={id}>{label}</label>
      <input
        id={id}
        className="sb-select sb-number"
        type="number"
        inputMode="decimal"
        step={step}
        value={draft[key]}
        onChange={(e) => setDraft({ ...draft, [key]: e.target.value })}
        aria-describedby={`${id}-hint`}
      />
      <span id={`${id}-hint`} className="sb-muted">
        {hint}
      </span>
    </div>
  );
  const toNumber = (s: string) => (s.trim() === '' ? null : Number(s));
  return (
    <details className="sb-panel sb-processing" data-testid="processing-panel">
      <summary className="sb-processing__summary">
        {t('identify.processing.heading')}
        <span className="sb-muted">
          {t('identify.processing.summary', {
            lambda: used.baseline.lambda.toExponential(0),
            window: used.smoothing.windowSize,
            sigma: formatNumber(used.peaks.thresholdSigma, i18n.language),
          })}
        </span>
      </summary>
      <div className="sb-form-grid">
        {field('baselineLambda', ids.lambda, t('identify.processing.lambda'), t('identify.processing.lambdaHint'), 'any')}
        {field('smoothingWindow', ids.window, t('identify.processing.window'), t('identify.processing.windowHint'), '2')}
        {field('peakThresholdSigma', ids.sigma, t('identify.processing.sigma'), t('identify.processing.sigmaHint'), '0.5')}
      </div>
      <div className="sb-processing__actions">
        <IonButton
          className="sb-primary"
          disabled={busy}
          onClick={() =>
            onApply({
              baselineLambda: toNumber(draft.baselineLambda),
              smoothingWindow: toNumber(draft.smoothingWindow),
              peakThresholdSigma: toNumber(draft.peakThresholdSigma),
            })
          }
        >
          {t('identify.processing.apply')}
        </IonButton>
        <IonButton
          fill="outline"
          disabled={busy || (value.baselineLambda === null && value.smoothingWindow === null && value.peakThresholdSigma === null)}
          onClick={() => onApply({ baselineLambda: null, smoothingWindow: null, peakThresholdSigma: null })}
        >
          {t('identify.processing.defaults')}
        </IonButton>
      </div>
    </details>
  );
}
