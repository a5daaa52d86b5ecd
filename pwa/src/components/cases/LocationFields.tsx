import { useEffect } from 'react';
import { IonButton, IonIcon } from '@ionic/react';
import { locateOutline } from 'ionicons/icons';
import { useTranslation } from 'react-i18next';
import type { CaseDraft } from '../../features/cases/caseDraft';
import { useGeolocation } from '../../features/cases/useGeolocation';
import { Field } from './Field';

/** GPS position with its accuracy, or latitude and longitude typed by hand, saying which and why. */
export function LocationFields({ draft, onChange }: { draft: CaseDraft; onChange: (patch: Partial<CaseDraft>) => void }) {
  const { t, i18n } = useTranslation();
  const { state, locate } = useGeolocation();

  useEffect(() => {
    if (state.status === 'found') {
      onChange({ latitude: state.latitude.toFixed(6), longitude: state.longitude.toFixed(6), accuracyM: String(Math.round(state.accuracyM)), enteredByHand: false });
    } else if (state.status === 'refused' || state.status === 'unavailable' || state.status === 'timeout') {
      onChange({ enteredByHand: true, accuracyM: '' });
    }
    // Only a new fix or failure changes the form (onChange is a fresh closure on every render).
  }, [state]);

  const accuracy = Number(draft.accuracyM);
  return (
    <fieldset className="sb-choice sb-location">
      <legend>{t('capture.case.location')}</legend>
      <IonButton fill="outline" onClick={locate} disabled={state.status === 'locating'}>
        <IonIcon icon={locateOutline} slot="start" aria-hidden="true" />
        {state.status === 'locating' ? t('capture.case.locating') : t('capture.case.useGps')}
      </IonButton>
      <p className="sb-muted" role="status" data-testid="location-source">
        {state.status === 'refused' && t('capture.case.gpsRefused')}
        {(state.status === 'unavailable' || state.status === 'timeout') && t('capture.case.gpsUnavailable')}
        {!draft.enteredByHand && draft.accuracyM !== '' &&
          t('capture.case.gpsAccuracy', { accuracy: new Intl.NumberFormat(i18n.language, { style: 'unit', unit: 'meter', maximumFractionDigits: 0 }).format(accuracy) })}
        {draft.enteredByHand && state.status === 'idle' && t('capture.case.byHand')}
      </p>
      <div className="sb-form-grid">
        <Field
          label={t('capture.case.latitude')}
          value={draft.latitude}
          inputMode="decimal"
          onChange={(latitude) => onChange({ latitude, enteredByHand: true, accuracyM: '' })}
        />
        <Field
          label={t('capture.case.longitude')}
          value={draft.longitude}
          inputMode="decimal"
          onChange={(longitude) => onChange({ longitude, enteredByHand: true, accuracyM: '' })}
        />
      </div>
      <p className="sb-field__hint">{t('capture.case.coordinatesHint')}</p>
    </fieldset>
  );
}
