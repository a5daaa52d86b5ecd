import type { Compound } from '@siteband/shared';
import { useTranslation } from 'react-i18next';
import { formatNumber } from '../../features/structure/formatNumber';

/** The compound's characteristic bands: technique, position, phase, intensity, label and assignment. */
export function BandsTable({ compound, sources }: { compound: Compound; sources: Readonly<Record<string, string>> }) {
  const { t, i18n } = useTranslation();
  const bands = compound.bands ?? [];
  const source = compound.bandsSource;
  return (
    <section className="sb-panel" aria-labelledby="bands-heading">
      <h2 id="bands-heading" className="sb-panel__heading">
        {t('library.detail.bands')}
      </h2>
      <div className="sb-table-wrap">
        <table className="sb-table" data-testid="bands-table">
          <thead>
            <tr>
              <th scope="col">{t('library.detail.colTechnique')}</th>
              <th scope="col" className="sb-num">{t('library.detail.colPosition')}</th>
              <th scope="col">{t('library.detail.colPhase')}</th>
              <th scope="col">{t('library.detail.colIntensity')}</th>
              <th scope="col">{t('library.detail.colLabel')}</th>
              <th scope="col">{t('library.detail.colAssignment')}</th>
            </tr>
          </thead>
          <tbody>
            {bands.map((b, i) => (
              <tr key={`${b.technique}-${b.cm1}-${i}`}>
                <td>{b.technique === 'ir' ? 'IR' : 'Raman'}</td>
                <td className="sb-num">{formatNumber(b.cm1, i18n.language, 1)}</td>
                <td>{t(`library.phase.${b.phase}`)}</td>
                <td>{b.intensity}</td>
                <td>{b.label ?? '—'}</td>
                <td>{b.assignment}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {source && <p className="sb-muted">{t('library.detail.source', { source: sources[source.ref] ?? source.ref, basis: source.basis })}</p>}
    </section>
  );
}
