import { IonIcon } from '@ionic/react';
import { alertCircleOutline, cloudDoneOutline, cloudUploadOutline, phonePortraitOutline } from 'ionicons/icons';
import { useTranslation } from 'react-i18next';
import type { SyncState } from '../../db/captureRecord';
import './cases.css';

const ICONS: Record<SyncState, string> = {
  local: phonePortraitOutline,
  sending: cloudUploadOutline,
  server: cloudDoneOutline,
  conflict: alertCircleOutline,
};

/** A record's sync state in words and with an icon (never colour alone). */
export function SyncBadge({ state, testId }: { state: SyncState; testId?: string }) {
  const { t } = useTranslation();
  return (
    <span className={`sb-sync sb-sync--${state}`} data-testid={testId} data-state={state}>
      <IonIcon icon={ICONS[state]} aria-hidden="true" />
      {t(`capture.sync.${state}`)}
    </span>
  );
}
