import { useEffect, useRef, useState, type FormEvent } from 'react';
import { useTranslation } from 'react-i18next';
import { BrandMark } from '../BrandMark';
import { ConnectionBadge } from '../ConnectionBadge';
import { useIdleLock } from '../../features/lock/IdleLockProvider';
import { PIN_MAX_DIGITS } from '../../features/lock/idleLockRules';
import { useOnlineStatus } from '../../features/network/onlineStatus';
import { useSession } from '../../features/session/SessionProvider';
import { signInErrorMessage } from '../../features/session/signInErrorMessage';
import { PasswordInput } from '../session/PasswordInput';

const KEYPAD_DIGITS = ['1', '2', '3', '4', '5', '6', '7', '8', '9'];

/** The full-screen lock over the app: a large keypad for the PIN (gloves), or the password. */
export function LockScreen() {
  const { t } = useTranslation();
  const lock = useIdleLock();
  const { session } = useSession();
  const online = useOnlineStatus();
  const [mode, setMode] = useState<'pin' | 'password'>(lock.stage === 'pin' ? 'pin' : 'password');
  const [pin, setPin] = useState('');
  const [password, setPassword] = useState('');
  const [message, setMessage] = useState<string>();
  const [busy, setBusy] = useState(false);
  const headingRef = useRef<HTMLHeadingElement>(null);

  // The PIN closes after its wrong tries: the password takes over.
  const showPin = mode === 'pin' && lock.stage === 'pin';
  useEffect(() => headingRef.current?.focus(), []);

  async function tryPin(event?: FormEvent) {
    event?.preventDefault();
    if (!pin || busy) return;
    setBusy(true);
    try {
      if (!(await lock.unlockWithPin(pin))) {
        setPin('');
        const left = lock.pinTriesLeft - 1;
        setMessage(left > 0 ? t('lock.wrongPin', { count: left }) : t('lock.pinUsedUp'));
      }
    } finally {
      setBusy(false);
    }
  }

  async function tryPassword(event: FormEvent) {
    event.preventDefault();
    if (!password || busy) return;
    setBusy(true);
    try {
      if (lock.canCheckPasswordHere) {
        if (!(await lock.unlockWithPassword(password))) {
          const left = lock.passwordTriesLeft - 1;
          setMessage(left > 0 ? t('lock.wrongPassword', { count: left }) : t('lock.serverNeeded'));
        }
      } else {
        await lock.unlockWithServer(password);
      }
    } catch (error) {
      setMessage(signInErrorMessage(error, t));
    } finally {
      setPassword('');
      setBusy(false);
    }
  }

  const serverOnly = !lock.canCheckPasswordHere;
  return (
    <div className="sb-lock" role="dialog" aria-modal="true" aria-labelledby="lock-title" data-testid="lock-screen">
      <header className="sb-lock__top">
        <BrandMark size={48} />
        <ConnectionBadge />
      </header>
      <main className="sb-lock__layout">
        <h1 id="lock-title" className="sb-page-title" tabIndex={-1} ref={headingRef}>
          {t('lock.title')}
        </h1>
        <p className="sb-muted">{t('lock.who', { name: session?.user.displayName ?? '' })}</p>
        {message && (
          <p className="sb-error" role="alert">
            {message}
          </p>
        )}
        {showPin ? (
          <form onSubmit={tryPin} className="sb-lock__form">
            <PasswordInput
              look="lock"
              secret="pin"
              label={t('lock.pinLabel')}
              inputMode="numeric"
              autoComplete="off"
              maxLength={PIN_MAX_DIGITS}
              readOnly={busy}
              value={pin}
              onValue={(typed) => setPin(typed.replace(/\D/g, '').slice(0, PIN_MAX_DIGITS))}
            />
            <div className="sb-keypad" role="group" aria-label={t('lock.keypad')}>
              {KEYPAD_DIGITS.map((digit) => (
                <button key={digit} type="button" className="sb-keypad__key" disabled={busy} onClick={() => setPin((p) => (p + digit).slice(0, PIN_MAX_DIGITS))}>
                  {digit}
                </button>
              ))}
              <button type="button" className="sb-keypad__key sb-keypad__key--word" disabled={busy} onClick={() => setPin((p) => p.slice(0, -1))}>
                {t('lock.deleteDigit')}
              </button>
              <button type="button" className="sb-keypad__key" disabled={busy} onClick={() => setPin((p) => (p + '0').slice(0, PIN_MAX_DIGITS))}>
                0
              </button>
              <button type="submit" className="sb-keypad__key sb-keypad__key--go" disabled={busy || !pin}>
                {busy ? t('lock.checking') : t('lock.unlock')}
              </button>
            </div>
            {lock.canCheckPasswordHere || online ? (
              <button type="button" className="sb-lock__switch" onClick={() => { setMode('password'); setMessage(undefined); }}>
                {t('lock.usePassword')}
              </button>
            ) : null}
          </form>
        ) : (
          <form onSubmit={tryPassword} className="sb-lock__form">
            {serverOnly && <p className="sb-notice">{online ? t('lock.serverNeeded') : t('lock.serverOffline')}</p>}
            <PasswordInput look="lock" label={t('lock.passwordLabel')} autoComplete="current-password" readOnly={busy} value={password} onValue={setPassword} />
            <button type="submit" className="sb-lock__submit" disabled={busy || !password || (serverOnly && !online)}>
              {busy ? t('lock.checking') : t('lock.unlock')}
            </button>
            {lock.stage === 'pin' && (
              <button type="button" className="sb-lock__switch" onClick={() => { setMode('pin'); setMessage(undefined); }}>
                {t('lock.usePin')}
              </button>
            )}
          </form>
        )}
        <p className="sb-muted">{t('lock.nothingLost')}</p>
      </main>
    </div>
  );
}

/** The lock screen while the app is locked, nothing otherwise. */
export function IdleLockScreen() {
  const { locked } = useIdleLock();
  return locked ? <LockScreen /> : null;
}
