import type { ReactNode } from 'react';
import { useTranslation } from 'react-i18next';
import { formatDateTime } from '../../i18n/format';

/** One hand-over as the table shows it. */
export interface HandoverLine {
  id: string;
  at: string;
  from: string;
  to: string;
  sealNumber: string | null;
  note: string | null;
  /** A last column's cell (the tablet's sync state), when the table has one. */
  extra?: ReactNode;
}

/** A sample's chain of custody as a table, oldest hand-over first. */
export function HandoverTable({ lines, extraHeading, testId }: { lines: readonly HandoverLine[]; extraHeading?: string; testId: string }) {
  const { t, i18n } = useTranslation();
  return (
    <div className="sb-table-wrap">
      <table className="sb-table" data-testid={testId}>
        <thead>
          <tr>
            <th scope="col">{t('capture.handover.at')}</th>
            <th scope="col">{t('capture.handover.from')}</th>
            <th scope="col">{t('capture.handover.to')}</th>
            <th scope="col">{t('capture.handover.seal')}</th>
            <th scope="col">{t('capture.handover.note')}</th>
            {extraHeading && <th scope="col">{extraHeading}</th>}
          </tr>
        </thead>
        <tbody>
          {lines.map((h) => (
            <tr key={h.id}>
              <td>{formatDateTime(Date.parse(h.at), i18n.language)}</td>
              <td>{h.from}</td>
              <td>{h.to}</td>
              <td>{h.sealNumber ?? '—'}</td>
              <td>{h.note ?? ''}</td>
              {extraHeading && <td>{h.extra}</td>}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
