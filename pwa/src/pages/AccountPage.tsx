import { useState } from 'react';
import { IonButton, IonIcon } from '@ionic/react';
import { flaskOutline, logOutOutline, shapesOutline } from 'ionicons/icons';
import { useTranslation } from 'react-i18next';
import { PageShell } from '../components/PageShell';
import { ThemeChooser } from '../components/ThemeChooser';
import { LanguageChooser } from '../components/LanguageChooser';
import { IdleLockSettings } from '../components/lock/IdleLockSettings';
import { useOnlineStatus } from '../features/network/onlineStatus';
import { useSession } from '../features/session/SessionProvider';
import { formatDateTime, formatHours } from '../i18n/format';

/** Everyone's account and settings: who is signed in, offline period, display, language, sign-out. */
export default function AccountPage() {
  const { t, i18n } = useTranslation();
  const online = useOnlineStatus();
  const { session, offlineUntil, offlineSessionHours, signOut } = useSession();
  const [signingOut, setSigningOut] = useState(false);
  if (!session) return null;
  const language = i18n.language;

  async function onSignOut() {
    setSigningOut(true);
    try {
      // Clearing the session is enough: the shell's guard then sends the person to sign-in.
      await signOut();
    } finally {
      setSigningOut(false);
    }
  }

  return (
    <PageShell title={t('pages.account.title')}>
      <section className="sb-panel" aria-labelledby="who-heading">
        <h2 id="who-heading" className="sb-panel__heading">
          {t('pages.account.who')}
        </h2>
        <dl className="sb-facts">
          <dt>{t('pages.account.name')}</dt>
          <dd data-testid="account-name">{session.user.displayName}</dd>
          <dt>{t('pages.account.email')}</dt>
          <dd>{session.user.email}</dd>
          <dt>{t('pages.account.role')}</dt>
          <dd data-testid="account-role">{t(`roles.${session.user.role}`)}</dd>
        </dl>
      </section>

      <section className="sb-panel" aria-labelledby="offline-heading">
        <h2 id="offline-heading" className="sb-panel__heading">
          {t('pages.account.offlineHeading')}
        </h2>
        <dl className="sb-facts">
          <dt>{t('pages.account.offlinePeriod')}</dt>
          <dd>{t('pages.account.offlinePeriodValue', { hours: formatHours(offlineSessionHours, language) })}</dd>
          <dt>{t('pages.account.lastConfirmed')}</dt>
          <dd>{formatDateTime(session.confirmedAt, language)}</dd>
          <dt>{t('pages.account.offlineUntil')}</dt>
          <dd data-testid="offline-until">{offlineUntil === undefined ? '' : formatDateTime(offlineUntil, language)}</dd>
        </dl>
      </section>

      <IdleLockSettings />

      {session.user.role !== 'supervisor' && (
        // Supervisors have these in their own tab; everyone else may consult them read-only.
        <section className="sb-panel" aria-labelledby="reference-heading">
          <h2 id="reference-heading" className="sb-panel__heading">
            {t('pages.account.referenceHeading')}
          </h2>
          <p className="sb-muted">{t('pages.account.referenceHint')}</p>
          <IonButton fill="outline" routerLink="/tabs/account/library">
            <IonIcon icon={flaskOutline} slot="start" aria-hidden="true" />
            {t('pages.account.openLibrary')}
          </IonButton>
          <IonButton fill="outline" routerLink="/tabs/account/library/structure">
            <IonIcon icon={shapesOutline} slot="start" aria-hidden="true" />
            {t('pages.account.openStructureCheck')}
          </IonButton>
        </section>
      )}

      <section className="sb-panel" aria-labelledby="display-heading">
        <h2 id="display-heading" className="sb-panel__heading">
          {t('pages.account.appearanceHeading')}
        </h2>
        <ThemeChooser />
        <LanguageChooser />
      </section>

      <section className="sb-panel" aria-labelledby="signout-heading">
        <h2 id="signout-heading" className="sb-panel__heading">
          {t('pages.account.signOutHeading')}
        </h2>
        <p className="sb-muted">{online ? t('pages.account.signOutHint') : t('pages.account.signOutOfflineHint')}</p>
        <IonButton className="sb-primary" onClick={onSignOut} disabled={signingOut}>
          <IonIcon icon={logOutOutline} slot="start" aria-hidden="true" />
          {signingOut ? t('pages.account.signingOut') : t('pages.account.signOut')}
        </IonButton>
      </section>
    </PageShell>
  );
}
