import { useTranslation } from 'react-i18next';
import type { BandCheck } from '@siteband/shared';
import { formatCm1, formatOffsetCm1 } from '../../features/identify/format';
import './results.css';

/** Each reference band of a check: expected, found, offset, tolerance with its source, and the outcome. */
export function InstrumentCheckTable({ bands }: { bands: readonly BandCheck[] }) {
  const { t, i18n } = useTranslation();
  const lang = i18n.language;
  return (
    <div className="sb-table-wrap">
      <table className="sb-table sb-band-table" data-testid="check-bands">
        <caption className="sb-band-table__caption">{t('identify.check.bandsCaption')}</caption>
        <thead>
          <tr>
            <th scope="col">{t('identify.check.expected')}</th>
            <th scope="col">{t('identify.check.found')}</th>
            <th scope="col">{t('identify.check.offset')}</th>
            <th scope="col">{t('identify.check.tolerance')}</th>
            <th scope="col">{t('identify.check.outcome')}</th>
          </tr>
        </thead>
        <tbody>
          {bands.map((b) => (
            <tr key={b.expectedCm1} className={b.status === 'pass' ? '' : 'sb-row--fail'}>
              <td>{formatCm1(b.expectedCm1, lang, 1)}</td>
              <td>{b.foundCm1 === null ? '—' : formatCm1(b.foundCm1, lang, 1)}</td>
              <td>{b.offsetCm1 === null ? '—' : formatOffsetCm1(b.offsetCm1, lang, 2)}</td>
              <td>
                ±{formatCm1(b.toleranceCm1, lang, 1)}
                <span className="sb-band-table__source">{b.band.toleranceSource}</span>
              </td>
              <td>
                <span className={`sb-pill ${b.status === 'pass' ? 'sb-pill--ok' : 'sb-pill--off'}`}>{t(`identify.check.status.${b.status}`)}</span>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
