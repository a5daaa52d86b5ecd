import { useId } from 'react';
import { IonInput } from '@ionic/react';
import { ROLES, type Role } from '@siteband/shared';
import { useTranslation } from 'react-i18next';

/** A person's name, email and role, as the admin types them to add or invite someone. */
export interface PersonInput {
  displayName: string;
  email: string;
  role: Role;
}

/** The name, email and role fields of the admin's user forms, each form with its own labels. */
export function PersonFields<T extends PersonInput>({
  value,
  onChange,
  labels,
}: {
  value: T;
  onChange: (next: T) => void;
  labels: { displayName: string; email: string; role: string };
}) {
  const { t } = useTranslation();
  const roleId = useId();
  return (
    <>
      <IonInput
        className="sb-input"
        label={labels.displayName}
        labelPlacement="stacked"
        fill="outline"
        autocomplete="off"
        value={value.displayName}
        onIonInput={(e) => onChange({ ...value, displayName: String(e.detail.value ?? '') })}
      />
      <IonInput
        className="sb-input"
        label={labels.email}
        labelPlacement="stacked"
        fill="outline"
        type="email"
        autocomplete="off"
        value={value.email}
        onIonInput={(e) => onChange({ ...value, email: String(e.detail.value ?? '') })}
      />
      <div className="sb-field">
        <label htmlFor={roleId}>{labels.role}</label>
        <select id={roleId} className="sb-select" value={value.role} onChange={(e) => onChange({ ...value, role: e.target.value as Role })}>
          {ROLES.map((role) => (
            <option key={role} value={role}>
              {t(`roles.${role}`)}
            </option>
          ))}
        </select>
      </div>
    </>
  );
}
