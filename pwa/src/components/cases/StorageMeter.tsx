import { useTranslation } from 'react-i18next';
import { storageIsLow, useStorageEstimate } from '../../features/storage/useStorageEstimate';

/** Storage used and left on the tablet, with a warning when little is left. */
export function StorageMeter({ refreshKey }: { refreshKey: unknown }) {
  const { t, i18n } = useTranslation();
  const estimate = useStorageEstimate(refreshKey);
  if (estimate === undefined) return null;
  if (estimate === null) return <p className="sb-muted">{t('capture.storage.unknown')}</p>;
  const bytes = (n: number) =>
    new Intl.NumberFormat(i18n.language, { style: 'unit', unit: 'megabyte', maximumFractionDigits: 1 }).format(n / (1024 * 1024));
  const low = storageIsLow(estimate);
  return (
    <div className={low ? 'sb-caution' : 'sb-storage'} role={low ? 'alert' : undefined} data-testid="storage">
      <p>
        {t('capture.storage.used', { used: bytes(estimate.usedBytes), left: bytes(Math.max(0, estimate.quotaBytes - estimate.usedBytes)) })}{' '}
        {estimate.persisted ? t('capture.storage.persisted') : t('capture.storage.notPersisted')}
      </p>
      {low && <p>{t('capture.storage.low')}</p>}
    </div>
  );
}
