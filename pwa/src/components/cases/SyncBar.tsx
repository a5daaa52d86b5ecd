import { IonButton, IonIcon } from '@ionic/react';
import { syncOutline } from 'ionicons/icons';
import { useTranslation } from 'react-i18next';
import { useOnlineStatus } from '../../features/network/onlineStatus';
import { useSync } from '../../features/sync/SyncProvider';
import { formatDateTime } from '../../i18n/format';

/** Sync as a whole: last success, the last failure with the retry time, and "sync now". */
export function SyncBar() {
  const { t, i18n } = useTranslation();
  const online = useOnlineStatus();
  const { status, syncNow } = useSync();
  return (
    <section className="sb-sync-bar" aria-labelledby="sync-heading">
      <h2 id="sync-heading" className="sb-visually-hidden">
        {t('capture.sync.heading')}
      </h2>
      <p role="status" data-testid="sync-status">
        {status.running
          ? t('capture.sync.running')
          : status.lastError
            ? t('capture.sync.failed', { message: status.lastError, at: status.retryAt ? formatDateTime(status.retryAt, i18n.language) : '' })
            : status.lastSuccessAt
              ? t('capture.sync.lastSuccess', { at: formatDateTime(status.lastSuccessAt, i18n.language) })
              : online
                ? t('capture.sync.notYet')
                : t('capture.sync.offline')}
      </p>
      <IonButton fill="outline" onClick={() => void syncNow()} disabled={!online || status.running} data-testid="sync-now">
        <IonIcon icon={syncOutline} slot="start" aria-hidden="true" />
        {t('capture.sync.now')}
      </IonButton>
    </section>
  );
}
