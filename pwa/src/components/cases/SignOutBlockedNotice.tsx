import { IonToast } from '@ionic/react';
import { useTranslation } from 'react-i18next';
import { useSignOutBlocked } from '../../features/sync/signOutBlocked';
import { useSync } from '../../features/sync/SyncProvider';
import './cases.css';

/** Says why a sign-out was refused, wherever it was asked for, with a way to sync at once. */
export function SignOutBlockedNotice() {
  const { t } = useTranslation();
  const { blocked, dismiss } = useSignOutBlocked();
  const { syncNow } = useSync();
  return (
    <IonToast
      isOpen={blocked}
      onDidDismiss={dismiss}
      message={t('capture.signOutBlocked')}
      position="middle"
      className="sb-toast-warning"
      data-testid="sign-out-blocked"
      buttons={[
        { text: t('capture.sync.now'), handler: () => void syncNow() },
        { text: t('capture.close'), role: 'cancel' },
      ]}
    />
  );
}
