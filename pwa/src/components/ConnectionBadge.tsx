import { cloudDoneOutline, cloudOfflineOutline } from 'ionicons/icons';
import { useTranslation } from 'react-i18next';
import { useOnlineStatus } from '../features/network/onlineStatus';
import { InlineIcon } from './InlineIcon';

/** Says in words and with an icon whether the tablet is online; never colour alone. */
export function ConnectionBadge() {
  const { t } = useTranslation();
  const online = useOnlineStatus();
  return (
    <span
      className={`sb-connection ${online ? 'sb-connection--online' : 'sb-connection--offline'}`}
      role="status"
      data-testid="connection-status"
      title={online ? undefined : t('connection.offlineDetail')}
    >
      <InlineIcon icon={online ? cloudDoneOutline : cloudOfflineOutline} />
      <span>{online ? t('connection.online') : t('connection.offline')}</span>
    </span>
  );
}
