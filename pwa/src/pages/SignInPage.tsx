import { useEffect, useRef, useState, type FormEvent } from 'react';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { useTranslation } from 'react-i18next';
import { PasswordInput } from '../components/session/PasswordInput';
import { FormError, SignInField, SignInLayout } from '../components/session/SignInLayout';
import { loadSignedInArea } from '../features/navigation/appArea';
import { homePathForRole } from '../features/navigation/roleTabs';
import { useOnlineStatus } from '../features/network/onlineStatus';
import { useSession } from '../features/session/SessionProvider';
import { signInErrorMessage } from '../features/session/signInErrorMessage';

/** Email and password sign-in; also where an ended offline session sends the person. */
export default function SignInPage() {
  const { t } = useTranslation();
  const navigate = useNavigate();
  // Set by the set-password page of an invitation once the password is set.
  const passwordSet = useSearchParams()[0].get('passwordSet') === '1';
  const online = useOnlineStatus();
  const { session, status, signIn, signOut, offlineSessionHours } = useSession();
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const [error, setError] = useState<string>();
  const [busy, setBusy] = useState(false);
  const [sessionEnded, setSessionEnded] = useState(status === 'expired');
  const sentHome = useRef(false);
  const usable = session !== undefined && (status === 'online' || status === 'offline');
  const home = session ? homePathForRole(session.user.role) : undefined;

  useEffect(() => {
    document.title = t('app.documentTitle', { page: t('signIn.title') });
  }, [t]);

  // An ended session is revoked on the server as soon as there is a connection to do it.
  useEffect(() => {
    if (status !== 'expired') return;
    setSessionEnded(true);
    if (online) void signOut();
  }, [status, online, signOut]);

  // One navigation per sign-in, whether the session was just created or already there.
  useEffect(() => {
    if (!usable) sentHome.current = false;
    else if (home && !sentHome.current) {
      sentHome.current = true;
      // The signed-in area is a chunk of its own: this page stays on screen until it has loaded.
      const go = () => navigate(home, { replace: true });
      void loadSignedInArea().then(go, go);
    }
  }, [usable, home, navigate]);

  async function submit(event: FormEvent) {
    event.preventDefault();
    if (!email.trim() || !password) {
      setError(t('signIn.errors.missing'));
      return;
    }
    setBusy(true);
    setError(undefined);
    try {
      await signIn({ email: email.trim(), password });
      setPassword('');
    } catch (caught) {
      setError(signInErrorMessage(caught, t));
    } finally {
      setBusy(false);
    }
  }

  return (
    <SignInLayout titleId="signin-title" title={t('signIn.title')} tagline={t('app.tagline')}>
      {/* The hours take i18next's plural forms (Intl.PluralRules, about 2 ms) rather than formatHours: the
          first Intl.NumberFormat of a page cost 120-460 ms of main thread under Lighthouse's 4x CPU
          throttling here, the largest single cost of this first screen. */}
      <p className="sb-muted">{t('signIn.intro', { count: offlineSessionHours })}</p>
      {passwordSet && (
        <p className="sb-success" role="status">
          {t('invite.setDone')}
        </p>
      )}
      {sessionEnded && (
        <p className="sb-notice" role="status">
          {t('signIn.expired')} {!online && t('signIn.expiredOffline')}
        </p>
      )}
      <form onSubmit={submit} noValidate>
        <SignInField
          label={t('signIn.email')}
          type="email"
          inputMode="email"
          autoComplete="username"
          name="email"
          required
          value={email}
          onValue={setEmail}
        />
        <PasswordInput label={t('signIn.password')} autoComplete="current-password" name="password" required value={password} onValue={setPassword} />
        <FormError message={error} />
        <button type="submit" className="sb-block-button" disabled={busy}>
          {busy ? t('signIn.submitting') : t('signIn.submit')}
        </button>
      </form>
    </SignInLayout>
  );
}
