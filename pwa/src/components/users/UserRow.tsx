import { useId } from 'react';
import { IonButton } from '@ionic/react';
import { ROLES, type Role } from '@siteband/shared';
import { useTranslation } from 'react-i18next';
import type { AdminUser } from '../../features/users/types';

export interface UserRowProps {
  user: AdminUser;
  isSelf: boolean;
  busy: boolean;
  onChange(input: { role?: Role; active?: boolean }): void;
}

/** One person in the admin's table: role picker and the activate/deactivate switch. */
export function UserRow({ user, isSelf, busy, onChange }: UserRowProps) {
  const { t } = useTranslation();
  const roleId = useId();
  // Changing one's own role or access could lock the last admin out; the server is the final judge.
  const locked = isSelf || busy;
  return (
    <tr className={user.active ? undefined : 'sb-row--inactive'} data-testid={`user-row-${user.email}`}>
      <th scope="row">
        <span className="sb-user-name">
          {user.displayName}
          {isSelf && <span className="sb-muted"> ({t('pages.users.you')})</span>}
        </span>
        <span className="sb-user-email">{user.email}</span>
      </th>
      <td>
        <label htmlFor={roleId} className="sb-visually-hidden">
          {t('pages.users.roleOf', { name: user.displayName })}
        </label>
        <select
          id={roleId}
          className="sb-select sb-select--compact"
          value={user.role}
          disabled={locked}
          onChange={(e) => onChange({ role: e.target.value as Role })}
        >
          {ROLES.map((role) => (
            <option key={role} value={role}>
              {t(`roles.${role}`)}
            </option>
          ))}
        </select>
      </td>
      <td>
        <span className={`sb-pill ${user.active ? 'sb-pill--ok' : 'sb-pill--off'}`}>
          {user.active ? t('pages.users.active') : t('pages.users.inactive')}
        </span>
      </td>
      <td>
        <IonButton
          fill="outline"
          className="sb-row-action"
          disabled={locked}
          aria-label={t(user.active ? 'pages.users.deactivateLabel' : 'pages.users.reactivateLabel', { name: user.displayName })}
          onClick={() => onChange({ active: !user.active })}
        >
          {user.active ? t('pages.users.deactivate') : t('pages.users.reactivate')}
        </IonButton>
      </td>
    </tr>
  );
}
