import { useTranslation } from 'react-i18next';
import type { CharacterTable } from '../../features/structure/structureProtocol';
import { formatNumber } from '../../features/structure/formatNumber';

/** The point group's character table with its linear, rotational and quadratic functions. */
export function CharacterTableView({ table, pointGroup }: { table: CharacterTable; pointGroup: string }) {
  const { t, i18n } = useTranslation();
  return (
    <section className="sb-panel" aria-labelledby="character-table-heading">
      <h2 id="character-table-heading" className="sb-panel__heading">
        {t('library.structure.characterTableHeading', { group: table.group })}
      </h2>
      {table.group !== pointGroup && <p className="sb-notice">{t('library.structure.modelGroup', { group: pointGroup, model: table.group })}</p>}
      <div className="sb-table-wrap">
        <table className="sb-table" data-testid="character-table">
          <thead>
            <tr>
              <th scope="col">{table.group}</th>
              {table.classes.map((c) => (
                <th key={c} scope="col" className="sb-num">{c}</th>
              ))}
              <th scope="col">{t('library.structure.colLinear')}</th>
              <th scope="col">{t('library.structure.colQuadratic')}</th>
            </tr>
          </thead>
          <tbody>
            {table.rows.map((row) => (
              <tr key={row.label}>
                <th scope="row">{row.display}</th>
                {row.characters.map((value, i) => (
                  <td key={table.classes[i]} className="sb-num">{formatNumber(value, i18n.language, 3)}</td>
                ))}
                <td>{[...row.translations, ...row.rotations].join(', ')}</td>
                <td>{row.quadratics.join(', ')}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="sb-muted">{t('library.structure.tableSource', { reference: table.reference })}</p>
    </section>
  );
}
