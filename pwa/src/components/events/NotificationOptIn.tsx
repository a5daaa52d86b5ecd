import { useState } from 'react';
import { IonButton } from '@ionic/react';
import { useTranslation } from 'react-i18next';
import { askForNotifications, declineNotifications, mayAskForNotifications } from '../../features/events/notifications';
import './events.css';

/**
 * Offers the browser's notifications once, from a tap (browsers only ask from a user gesture). Never
 * required: without them the open screens still update live.
 */
export function NotificationOptIn({ reasonKey }: { reasonKey: string }) {
  const { t } = useTranslation();
  const [offered, setOffered] = useState(mayAskForNotifications);
  const [answer, setAnswer] = useState<NotificationPermission>();
  if (answer) {
    return (
      <p className="sb-muted" role="status">
        {t(answer === 'granted' ? 'events.optIn.granted' : 'events.optIn.declined')}
      </p>
    );
  }
  if (!offered) return null;
  return (
    <div className="sb-optin">
      <p>{t(reasonKey)}</p>
      <div className="sb-optin__actions">
        <IonButton className="sb-big-button" onClick={() => void askForNotifications().then(setAnswer)}>
          {t('events.optIn.allow')}
        </IonButton>
        <IonButton className="sb-big-button" fill="outline" onClick={() => {
            declineNotifications();
            setOffered(false);
          }}>
          {t('events.optIn.notNow')}
        </IonButton>
      </div>
    </div>
  );
}
