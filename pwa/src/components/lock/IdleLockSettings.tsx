import { useId, useState, type FormEvent } from 'react';
import { IonButton, IonIcon } from '@ionic/react';
import { lockClosedOutline } from 'ionicons/icons';
import { useTranslation } from 'react-i18next';
import { IDLE_LOCK_CHOICES } from '../../config/idleLockMinutes';
import { useIdleLock } from '../../features/lock/IdleLockProvider';
import { PASSWORD_TRIES, PIN_PATTERN, PIN_TRIES } from '../../features/lock/idleLockRules';
import { PasswordInput } from '../session/PasswordInput';

/** The Account page's lock settings: idle time on this tablet, the PIN, and locking at once. */
export function IdleLockSettings() {
  const { t } = useTranslation();
  const lock = useIdleLock();
  const selectId = useId();
  const [pin, setPin] = useState('');
  const [repeat, setRepeat] = useState('');
  const [error, setError] = useState<string>();
  const [done, setDone] = useState<string>();
  // The build's default is always offered, even when it is not one of the usual choices.
  const choices = [...new Set([...IDLE_LOCK_CHOICES, lock.defaultIdleMinutes])].sort((a, b) => a - b);

  async function savePin(event: FormEvent) {
    event.preventDefault();
    setDone(undefined);
    if (!PIN_PATTERN.test(pin)) return setError(t('lock.settings.pinShape'));
    if (pin !== repeat) return setError(t('lock.settings.pinMismatch'));
    setError(undefined);
    await lock.setPin(pin);
    setPin('');
    setRepeat('');
    setDone(t('lock.settings.pinSaved'));
  }

  function removePin() {
    lock.removePin();
    setError(undefined);
    setDone(t('lock.settings.pinRemoved'));
  }

  return (
    <section className="sb-panel" aria-labelledby="lock-heading">
      <h2 id="lock-heading" className="sb-panel__heading">
        {t('lock.settings.heading')}
      </h2>
      <p className="sb-muted">{t('lock.settings.hint', { pinTries: PIN_TRIES, passwordTries: PASSWORD_TRIES })}</p>
      <div className="sb-field">
        <label htmlFor={selectId}>{t('lock.settings.idleLabel')}</label>
        <select
          id={selectId}
          className="sb-select"
          value={lock.idleMinutes}
          onChange={(event) => lock.setIdleMinutes(Number(event.target.value))}
        >
          {choices.map((minutes) => (
            <option key={minutes} value={minutes}>
              {minutes === lock.defaultIdleMinutes
                ? t('lock.settings.minutesDefault', { count: minutes })
                : t('lock.settings.minutes', { count: minutes })}
            </option>
          ))}
        </select>
      </div>
      <p data-testid="pin-state">{lock.hasPin ? t('lock.settings.pinSet') : t('lock.settings.pinNone')}</p>
      <form onSubmit={savePin} noValidate>
        <PasswordInput label={t('lock.settings.newPin')} secret="pin" inputMode="numeric" autoComplete="off" value={pin} onValue={setPin} />
        <PasswordInput label={t('lock.settings.repeatPin')} secret="pin" inputMode="numeric" autoComplete="off" value={repeat} onValue={setRepeat} />
        {error && (
          <p className="sb-error" role="alert">
            {error}
          </p>
        )}
        {done && (
          <p className="sb-success" role="status">
            {done}
          </p>
        )}
        <IonButton type="submit" className="sb-primary">
          {t('lock.settings.savePin')}
        </IonButton>
        {lock.hasPin && (
          <IonButton fill="outline" onClick={removePin}>
            {t('lock.settings.removePin')}
          </IonButton>
        )}
      </form>
      <IonButton fill="outline" onClick={lock.lockNow}>
        <IonIcon icon={lockClosedOutline} slot="start" aria-hidden="true" />
        {t('lock.settings.lockNow')}
      </IonButton>
    </section>
  );
}
