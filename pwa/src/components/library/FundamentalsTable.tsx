import type { Compound, StructureCheck } from '@siteband/shared';
import { useTranslation } from 'react-i18next';
import { formatNumber } from '../../features/structure/formatNumber';

type Mode = StructureCheck['vibrations']['modes'][number];

/**
 * The compound's fundamentals with their symmetry labels; beside each, the activity the structure
 * check derives for its species (the library never types activity by hand).
 */
export function FundamentalsTable({ compound, modes, sources }: { compound: Compound; modes: readonly Mode[] | undefined; sources: Readonly<Record<string, string>> }) {
  const { t, i18n } = useTranslation();
  const byLabel = new Map((modes ?? []).map((m) => [m.label, m]));
  const cm1 = (value: number | undefined) => (value === undefined ? '—' : formatNumber(value, i18n.language, 1));
  const source = compound.fundamentalsSource;
  return (
    <section className="sb-panel" aria-labelledby="fundamentals-heading">
      <h2 id="fundamentals-heading" className="sb-panel__heading">
        {t('library.detail.fundamentals')}
      </h2>
      <div className="sb-table-wrap">
        <table className="sb-table" data-testid="fundamentals-table">
          <thead>
            <tr>
              <th scope="col">{t('library.detail.colMode')}</th>
              <th scope="col">{t('library.detail.colLabel')}</th>
              <th scope="col" className="sb-num">{t('library.detail.colGas')}</th>
              <th scope="col" className="sb-num">{t('library.detail.colLiquid')}</th>
              <th scope="col" className="sb-num">{t('library.detail.colSolid')}</th>
              <th scope="col">{t('library.detail.colIntensity')}</th>
              <th scope="col">{t('library.detail.colActivity')}</th>
              <th scope="col">{t('library.detail.colAssignment')}</th>
            </tr>
          </thead>
          <tbody>
            {(compound.fundamentals ?? []).map((f) => {
              const mode = byLabel.get(f.label);
              return (
                <tr key={f.mode}>
                  <th scope="row">{f.mode}</th>
                  <td>{mode?.display ?? f.label}</td>
                  <td className="sb-num">{cm1(f.cm1.gas)}</td>
                  <td className="sb-num">{cm1(f.cm1.liquid)}</td>
                  <td className="sb-num">{cm1(f.cm1.solid)}</td>
                  <td>{[f.ir && `IR ${f.ir}`, f.raman && `Raman ${f.raman}`].filter(Boolean).join(', ') || '—'}</td>
                  <td data-testid={`activity-${f.mode}`}>{modes === undefined ? t('library.detail.activityPending') : mode ? t(`library.detail.activity.${mode.activity}`) : t('library.detail.activityMissing')}</td>
                  <td>
                    {f.assignment}
                    {f.matchable === false && <span className="sb-muted"> {t('library.detail.notMatchable')}</span>}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      {source && <p className="sb-muted">{t('library.detail.source', { source: sources[source.ref] ?? source.ref, basis: source.basis })}</p>}
    </section>
  );
}
