import { useId, useState, type FormEvent } from 'react';
import { IonButton, IonInput } from '@ionic/react';
import { ROLES, type Role } from '@siteband/shared';
import { useTranslation } from 'react-i18next';
import { useCreateUser } from '../../features/users/useUserMutations';

const EMPTY = { displayName: '', email: '', role: 'inspector' as Role, password: '' };

/** The admin's form to add a person with a role and a first password. */
export function CreateUserForm() {
  const { t } = useTranslation();
  const roleId = useId();
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
      <IonInput
        className="sb-input"
        label={t('pages.users.displayName')}
        labelPlacement="stacked"
        fill="outline"
        autocomplete="off"
        value={form.displayName}
        onIonInput={(e) => setForm({ ...form, displayName: String(e.detail.value ?? '') })}
      />
      <IonInput
        className="sb-input"
        label={t('pages.users.email')}
        labelPlacement="stacked"
        fill="outline"
        type="email"
        autocomplete="off"
        value={form.email}
        onIonInput={(e) => setForm({ ...form, email: String(e.detail.value ?? '') })}
      />
      <div className="sb-field">
        <label htmlFor={roleId}>{t('pages.users.role')}</label>
        <select
          id={roleId}
          className="sb-select"
          value={form.role}
          onChange={(e) => setForm({ ...form, role: e.target.value as Role })}
        >
          {ROLES.map((role) => (
            <option key={role} value={role}>
              {t(`roles.${role}`)}
            </option>
          ))}
        </select>
      </div>
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
