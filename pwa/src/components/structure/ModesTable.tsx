import type { StructureCheck } from '@siteband/shared';
import { useTranslation } from 'react-i18next';
import { formatNumber } from '../../features/structure/formatNumber';

type Mode = StructureCheck['vibrations']['modes'][number];

function Active({ active, components }: { active: boolean; components: readonly string[] }) {
  const { t } = useTranslation();
  return active ? (
    <span className="sb-yes">
      {t('library.structure.active')}
      {components.length > 0 && ` (${components.join(', ')})`}
    </span>
  ) : (
    <span className="sb-no">{t('library.structure.inactive')}</span>
  );
}

/** One row per species of Γvib: how many, degeneracy, IR and Raman activity, stretches, band type. */
export function ModesTable({ modes }: { modes: readonly Mode[] }) {
  const { t, i18n } = useTranslation();
  return (
    <section className="sb-panel" aria-labelledby="modes-heading">
      <h2 id="modes-heading" className="sb-panel__heading">
        {t('library.structure.modesHeading')}
      </h2>
      <div className="sb-table-wrap">
        <table className="sb-table" data-testid="modes-table">
          <thead>
            <tr>
              <th scope="col">{t('library.structure.colSpecies')}</th>
              <th scope="col" className="sb-num">{t('library.structure.colCount')}</th>
              <th scope="col" className="sb-num">{t('library.structure.colDegeneracy')}</th>
              <th scope="col">{t('library.structure.colIr')}</th>
              <th scope="col">{t('library.structure.colRaman')}</th>
              <th scope="col">{t('library.structure.colComposition')}</th>
              <th scope="col">{t('library.structure.colBand')}</th>
            </tr>
          </thead>
          <tbody>
            {modes.map((m) => (
              <tr key={m.label}>
                <th scope="row">{m.display}</th>
                <td className="sb-num">{formatNumber(m.count, i18n.language)}</td>
                <td className="sb-num">{formatNumber(m.degeneracy, i18n.language)}</td>
                <td><Active active={m.ir} components={m.irComponents} /></td>
                <td><Active active={m.raman} components={m.ramanComponents} /></td>
                <td>{m.composition ?? '—'}</td>
                <td>{m.band ? `${m.band.type}${m.band.branches.length ? ` (${m.band.branches.join(', ')})` : ''}` : '—'}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}
