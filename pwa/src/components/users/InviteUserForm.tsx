import { useState, type FormEvent } from 'react';
import { IonButton } from '@ionic/react';
import type { Role } from '@siteband/shared';
import { useTranslation } from 'react-i18next';
import { PersonFields } from './PersonFields';
import { ApiError } from '../../features/api/apiError';
import { useInviteUser } from '../../features/users/useUserMutations';

const EMPTY = { displayName: '', email: '', role: 'inspector' as Role };

/** The admin's form to invite a person by e-mail: they set their own password from the mailed link. */
export function InviteUserForm() {
  const { t } = useTranslation();
  const invite = useInviteUser();
  const [form, setForm] = useState(EMPTY);
  const [message, setMessage] = useState<{ kind: 'ok' | 'error'; text: string }>();

  async function submit(event: FormEvent) {
    event.preventDefault();
    const input = { ...form, displayName: form.displayName.trim(), email: form.email.trim() };
    if (!input.displayName || !input.email) {
      setMessage({ kind: 'error', text: t('invite.missing') });
      return;
    }
    try {
      await invite.mutateAsync(input);
      setForm(EMPTY);
      setMessage({ kind: 'ok', text: t('invite.sent', { name: input.displayName, email: input.email }) });
    } catch (error) {
      setMessage({ kind: 'error', text: inviteErrorText(error, t) });
    }
  }

  return (
    <form onSubmit={submit} noValidate className="sb-form-grid" aria-labelledby="invite-user-heading" data-testid="invite-form">
      <PersonFields
        value={form}
        onChange={setForm}
        labels={{ displayName: t('invite.displayName'), email: t('invite.email'), role: t('invite.role') }}
      />
      <div className="sb-form-grid__wide">
        {message && (
          <p className={message.kind === 'ok' ? 'sb-success' : 'sb-error'} role={message.kind === 'ok' ? 'status' : 'alert'}>
            {message.text}
          </p>
        )}
        <IonButton type="submit" className="sb-primary" disabled={invite.isPending}>
          {invite.isPending ? t('invite.sending') : t('invite.submit')}
        </IonButton>
      </div>
    </form>
  );
}

/** A refused invitation in words: a taken email says what to do instead; a 400 lists every reason the API gave. */
function inviteErrorText(error: unknown, t: (key: string, options?: Record<string, unknown>) => string): string {
  if (error instanceof ApiError && error.status === 409) return t('invite.taken');
  const message = error instanceof ApiError && error.details.length > 0 ? error.details.join('; ') : error instanceof Error ? error.message : String(error);
  return t('invite.error', { message });
}
