import { useState, type FormEvent } from 'react';
import { IonButton, IonInput } from '@ionic/react';
import type { Role } from '@siteband/shared';
import { useTranslation } from 'react-i18next';
import { PersonFields } from './PersonFields';
import { useCreateUser } from '../../features/users/useUserMutations';

const EMPTY = { displayName: '', email: '', role: 'inspector' as Role, password: '' };

/** The admin's form to add a person with a role and a first password. */
export function CreateUserForm() {
  const { t } = useTranslation();
  const create = useCreateUser();
  const [form, setForm] = useState(EMPTY);
  const [message, setMessage] = useState<{ kind: 'ok' | 'error'; text: string }>();

  async function submit(event: FormEvent) {
    event.preventDefault();
    const input = { ...form, displayName: form.displayName.trim(), email: form.email.trim() };
    if (!input.displayName || !input.email || !input.password) {
      setMessage({ kind: 'error', text: t('pages.users.missing') });
      return;
    }
    try {
      const user = await create.mutateAsync(input);
      setForm(EMPTY);
      setMessage({ kind: 'ok', text: t('pages.users.created', { name: user.displayName, role: t(`roles.${user.role}`) }) });
    } catch (error) {
      // The typed fields stay as they were so nothing has to be typed again.
      setMessage({ kind: 'error', text: t('pages.users.createError', { message: error instanceof Error ? error.message : String(error) }) });
    }
  }

  return (
    <form onSubmit={submit} noValidate className="sb-form-grid" aria-labelledby="create-user-heading">
      <PersonFields
        value={form}
        onChange={setForm}
        labels={{ displayName: t('pages.users.displayName'), email: t('pages.users.email'), role: t('pages.users.role') }}
      />
      <IonInput
        className="sb-input"
        label={t('pages.users.password')}
        labelPlacement="stacked"
        fill="outline"
        type="password"
        autocomplete="new-password"
        value={form.password}
        onIonInput={(e) => setForm({ ...form, password: String(e.detail.value ?? '') })}
      />
      <div className="sb-form-grid__wide">
        {message && (
          <p className={message.kind === 'ok' ? 'sb-success' : 'sb-error'} role={message.kind === 'ok' ? 'status' : 'alert'}>
            {message.text}
          </p>
        )}
        <IonButton type="submit" className="sb-primary" disabled={create.isPending}>
          {create.isPending ? t('pages.users.creating') : t('pages.users.create')}
        </IonButton>
      </div>
    </form>
  );
}
