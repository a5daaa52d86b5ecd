import type { StructureCheck } from '@siteband/shared';
import { useTranslation } from 'react-i18next';
import { formatNumber } from '../../features/structure/formatNumber';

/** Γ3N class by class (unmoved atoms × contribution per atom), then Γtrans, Γrot and Γvib characters. */
export function ContributionsTable({ check }: { check: StructureCheck }) {
  const { t, i18n } = useTranslation();
  const n = (value: number) => formatNumber(value, i18n.language, 3);
  const rows: [string, readonly number[]][] = [
    ['Γ3N', check.gamma3N.characters],
    ['Γtrans', check.gammaTrans.characters],
    ['Γrot', check.gammaRot.characters],
    ['Γvib', check.gammaVib.characters],
  ];
  return (
    <section className="sb-panel" aria-labelledby="contributions-heading">
      <h2 id="contributions-heading" className="sb-panel__heading">
        {t('library.structure.contributionsHeading')}
      </h2>
      <p className="sb-muted">{t('library.structure.contributionsHint')}</p>
      <div className="sb-table-wrap">
        <table className="sb-table" data-testid="contributions-table">
          <thead>
            <tr>
              <th scope="col">{t('library.structure.colRow')}</th>
              {check.contributions.map((c) => (
                <th key={c.class} scope="col" className="sb-num">{c.class}</th>
              ))}
            </tr>
          </thead>
          <tbody>
            <tr>
              <th scope="row">{t('library.structure.unmovedAtoms')}</th>
              {check.contributions.map((c) => <td key={c.class} className="sb-num">{n(c.unmovedAtoms)}</td>)}
            </tr>
            <tr>
              <th scope="row">{t('library.structure.perAtom')}</th>
              {check.contributions.map((c) => <td key={c.class} className="sb-num">{n(c.perAtom)}</td>)}
            </tr>
            {rows.map(([label, characters]) => (
              <tr key={label}>
                <th scope="row">χ({label})</th>
                {characters.map((value, i) => <td key={check.contributions[i]?.class ?? i} className="sb-num">{n(value)}</td>)}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}
