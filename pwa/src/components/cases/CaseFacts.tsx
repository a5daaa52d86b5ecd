import { useTranslation } from 'react-i18next';
import type { CaseRow } from '../../db/casesTable';
import { formatDateTime } from '../../i18n/format';
import { SyncBadge } from './SyncBadge';

/** What was recorded about the visit, with the case's sync state and a refusal reason if any. */
export function CaseFacts({ row }: { row: CaseRow }) {
  const { t, i18n } = useTranslation();
  const { data } = row;
  const number = (n: number, digits: number) => new Intl.NumberFormat(i18n.language, { maximumFractionDigits: digits }).format(n);
  return (
    <dl className="sb-facts">
      <dt>{t('capture.case.status')}</dt>
      <dd>
        <span className={`sb-pill sb-status--${data.status}`} data-testid="case-status">
          {t(`capture.status.${data.status}`)}
        </span>
      </dd>
      <dt>{t('capture.case.syncState')}</dt>
      <dd>
        <SyncBadge state={row.sync} testId="case-sync" />
        {row.rejectedReason && <p className="sb-error">{t('capture.sync.rejected', { reason: row.rejectedReason })}</p>}
      </dd>
      <dt>{t('capture.case.startedAt')}</dt>
      <dd>{formatDateTime(Date.parse(data.startedAt), i18n.language)}</dd>
      {data.address && (
        <>
          <dt>{t('capture.case.address')}</dt>
          <dd>{data.address}</dd>
        </>
      )}
      <dt>{t('capture.case.location')}</dt>
      <dd>
        {data.latitude === null || data.longitude === null
          ? t('capture.case.noLocation')
          : `${number(data.latitude, 6)}, ${number(data.longitude, 6)} — ${
              data.locationEnteredByHand
                ? t('capture.case.enteredByHand')
                : t('capture.case.gpsAccuracy', { accuracy: `${number(data.locationAccuracyM ?? 0, 0)} m` })
            }`}
      </dd>
      {data.weatherNotes && (
        <>
          <dt>{t('capture.case.weather')}</dt>
          <dd>{data.weatherNotes}</dd>
        </>
      )}
      {data.accessNotes && (
        <>
          <dt>{t('capture.case.access')}</dt>
          <dd>{data.accessNotes}</dd>
        </>
      )}
    </dl>
  );
}
