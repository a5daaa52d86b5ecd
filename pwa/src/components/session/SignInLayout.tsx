import { useEffect, useId, useRef, type InputHTMLAttributes, type ReactNode } from 'react';
import { BrandMark } from '../BrandMark';
import { ConnectionBadge } from '../ConnectionBadge';

/**
 * The frame of the pages used before signing in (sign-in, setting a password): brand, connection,
 * one card with its title. Drawn without Ionic, like the lock screen: a signed-out visit loads no
 * Ionic code until the signed-in area opens.
 */
export function SignInLayout({ titleId, title, tagline, children }: { titleId: string; title: string; tagline?: string; children: ReactNode }) {
  return (
    <div className="sb-signin">
      <main className="sb-signin__layout">
        <div className="sb-signin__top">
          <BrandMark size={56} />
          <ConnectionBadge />
        </div>
        {tagline && <p className="sb-signin__tagline">{tagline}</p>}
        <section className="sb-panel sb-signin__card" aria-labelledby={titleId}>
          <h1 id={titleId} className="sb-page-title">
            {title}
          </h1>
          {children}
        </section>
      </main>
    </div>
  );
}

/** A labelled text field of these pages; `onValue` gets the text as typed. */
export function SignInField({ label, onValue, ...input }: { label: string; onValue: (value: string) => void } & Omit<InputHTMLAttributes<HTMLInputElement>, 'onChange' | 'className' | 'id'>) {
  const id = useId();
  return (
    <div className="sb-field">
      <label htmlFor={id}>{label}</label>
      <input id={id} className="sb-native-input" {...input} onChange={(e) => onValue(e.target.value)} />
    </div>
  );
}

/** A form's error, announced and focused each time it changes so a screen reader and the keyboard land on it. */
export function FormError({ message }: { message: string | undefined }) {
  const ref = useRef<HTMLParagraphElement>(null);
  useEffect(() => {
    if (message) ref.current?.focus();
  }, [message]);
  if (!message) return null;
  return (
    <p className="sb-error" role="alert" tabIndex={-1} ref={ref}>
      {message}
    </p>
  );
}
