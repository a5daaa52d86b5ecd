import { useEffect, useState, type FormEvent } from 'react';
import { MAX_PASSWORD_BYTES, MIN_PASSWORD_LENGTH, passwordPolicyBreach } from '@siteband/shared';
import { useTranslation } from 'react-i18next';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { PasswordInput } from '../components/session/PasswordInput';
import { FormError, SignInLayout } from '../components/session/SignInLayout';
import { useApiClient } from '../features/api/ApiClientContext';
import { ApiError } from '../features/api/apiError';
import { setPassword } from '../features/session/authApi';

/** The public page an invitation mail links to: choose a password with the link's single-use token. */
export default function SetPasswordPage() {
  const { t } = useTranslation();
  const client = useApiClient();
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  const [password, setPasswordText] = useState('');
  const [repeat, setRepeat] = useState('');
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string>();
  const [linkRefused, setLinkRefused] = useState(false);

  useEffect(() => {
    document.title = t('app.documentTitle', { page: t('invite.setTitle') });
  }, [t]);

  async function submit(event: FormEvent) {
    event.preventDefault();
    setError(undefined);
    // The shared password rule is the API's own, so a 400 for a password passing it is about the link.
    const breach = passwordPolicyBreach(password);
    if (breach) return setError(t(`invite.${breach}`, { min: MIN_PASSWORD_LENGTH, max: MAX_PASSWORD_BYTES }));
    if (password !== repeat) return setError(t('invite.noMatch'));
    setBusy(true);
    try {
      await setPassword(client, token, password);
      navigate('/signin?passwordSet=1', { replace: true });
    } catch (caught) {
      if (caught instanceof ApiError && caught.status === 400) setLinkRefused(true);
      else setError(t('invite.setError', { message: caught instanceof Error ? caught.message : String(caught) }));
    } finally {
      setBusy(false);
    }
  }

  const refusal = !token ? t('invite.noToken') : linkRefused ? t('invite.linkRefused') : undefined;

  return (
    <SignInLayout titleId="set-password-title" title={t('invite.setTitle')}>
      {refusal ? (
        <p className="sb-error" role="alert" data-testid="set-password-refused">
          {refusal}
        </p>
      ) : (
        <form onSubmit={submit} noValidate>
          <p className="sb-muted">{t('invite.setIntro', { min: MIN_PASSWORD_LENGTH })}</p>
          <PasswordInput label={t('invite.newPassword')} autoComplete="new-password" name="new-password" value={password} onValue={setPasswordText} />
          <PasswordInput label={t('invite.repeatPassword')} autoComplete="new-password" name="repeat-password" value={repeat} onValue={setRepeat} />
          <FormError message={error} />
          <button type="submit" className="sb-block-button" disabled={busy}>
            {busy ? t('invite.setting') : t('invite.setSubmit')}
          </button>
        </form>
      )}
    </SignInLayout>
  );
}
