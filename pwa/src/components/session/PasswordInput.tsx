import { useId, useState, type InputHTMLAttributes } from 'react';
import { useTranslation } from 'react-i18next';
import './password-input.css';

export interface PasswordInputProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'type' | 'value' | 'onChange' | 'id' | 'className' | 'autoComplete'> {
  label: string;
  value: string;
  /** Gets the text as typed. */
  onValue: (value: string) => void;
  /** `current-password` to sign in, `new-password` to choose one, `off` for a PIN of this tablet. */
  autoComplete: 'current-password' | 'new-password' | 'off';
  /** What is hidden: the show button says "Show password" or "Show PIN". */
  secret?: 'password' | 'pin';
  /** The look of the box and its label; the pages before sign-in and the settings use the plain field, the lock screen its large one. */
  look?: 'field' | 'lock';
}

/**
 * A password or PIN field: a label, the hidden text and a toggle button that shows it until pressed again.
 * Drawn without Ionic, so the sign-in, set-password and lock screens use it at first paint; the box and the
 * button are at least 48 px high.
 */
export function PasswordInput({ label, value, onValue, autoComplete, secret = 'password', look = 'field', ...input }: PasswordInputProps) {
  const { t } = useTranslation();
  const id = useId();
  const [shown, setShown] = useState(false);
  return (
    <div className={look === 'lock' ? 'sb-password sb-password--lock' : 'sb-field sb-password'}>
      <label htmlFor={id} className={look === 'lock' ? 'sb-lock__label' : undefined}>
        {label}
      </label>
      <div className="sb-password__row">
        <input
          {...input}
          id={id}
          className={look === 'lock' ? 'sb-lock__input sb-password__input' : 'sb-native-input sb-password__input'}
          type={shown ? 'text' : 'password'}
          autoComplete={autoComplete}
          autoCapitalize="none"
          autoCorrect="off"
          spellCheck={false}
          value={value}
          onChange={(e) => onValue(e.target.value)}
        />
        <button type="button" className="sb-password__toggle" aria-controls={id} aria-pressed={shown} onClick={() => setShown((s) => !s)}>
          {t(secret === 'pin' ? 'passwordInput.showPin' : 'passwordInput.showPassword')}
        </button>
      </div>
    </div>
  );
}
