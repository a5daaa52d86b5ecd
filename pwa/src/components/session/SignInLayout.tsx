import { useEffect, useRef, type ReactNode } from 'react';
import { IonContent, IonPage } from '@ionic/react';
import { BrandMark } from '../BrandMark';
import { ConnectionBadge } from '../ConnectionBadge';

/** The frame of the pages used before signing in (sign-in, setting a password): brand, connection, one card with its title. */
export function SignInLayout({ titleId, title, tagline, children }: { titleId: string; title: string; tagline?: string; children: ReactNode }) {
  return (
    <IonPage>
      <IonContent className="sb-signin">
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
      </IonContent>
    </IonPage>
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
