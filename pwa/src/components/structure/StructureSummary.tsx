import type { StructureCheck } from '@siteband/shared';
import { useTranslation } from 'react-i18next';
import { elementSummary } from '../../features/structure/elementSummary';
import { formatNumber } from '../../features/structure/formatNumber';
import { gammaFormula } from '../../features/structure/gammaFormula';
import { MoleculeView } from './MoleculeView';

/** Point group in large type, the molecule's facts, Γvib and the activity counts. */
export function StructureSummary({ check }: { check: StructureCheck }) {
  const { t, i18n } = useTranslation();
  const n = (value: number) => formatNumber(value, i18n.language);
  const v = check.vibrations;
  const elements = elementSummary(check.elements)
    .map((e) => (e.count === 1 ? e.label : `${n(e.count)} ${e.label}`))
    .join(', ');
  return (
    <section className="sb-panel" aria-labelledby="structure-summary-heading">
      <h2 id="structure-summary-heading" className="sb-panel__heading">
        {t('library.structure.summaryHeading')}
      </h2>
      <div className="sb-group-headline">
        <p className="sb-group-name" data-testid="structure-point-group" aria-label={t('library.structure.pointGroupAria', { group: check.pointGroup })}>
          {check.pointGroup}
        </p>
        <p className="sb-gamma">
          Γ<sub>vib</sub> = <span data-testid="structure-gamma-vib">{gammaFormula(v.modes)}</span>
        </p>
      </div>
      <div className="sb-summary-body">
      <MoleculeView check={check} />
      <dl className="sb-facts">
        <dt>{t('library.structure.order')}</dt>
        <dd>{check.order === null ? '∞' : n(check.order)}</dd>
        <dt>{t('library.structure.formula')}</dt>
        <dd>{check.formula}</dd>
        <dt>{t('library.structure.atoms')}</dt>
        <dd>{n(check.atoms)}</dd>
        <dt>{t('library.structure.elements')}</dt>
        <dd>{elements}</dd>
        <dt>{t('library.structure.topType')}</dt>
        <dd>{t(`library.structure.top.${check.topType}`)}</dd>
        <dt>{t('library.structure.maxDeviation')}</dt>
        <dd>{t('library.structure.angstrom', { value: formatNumber(check.orientation.maxDeviation, i18n.language, 4) })}</dd>
      </dl>
      </div>
      <ul className="sb-counts" aria-label={t('library.structure.countsLabel')}>
        <li data-testid="count-fundamentals">
          <strong>{n(v.fundamentals)}</strong> {t('library.structure.countFundamentals')}
        </li>
        <li data-testid="count-ir">
          <strong>{n(v.irActive)}</strong> {t('library.structure.countIr')}
        </li>
        <li data-testid="count-raman">
          <strong>{n(v.ramanActive)}</strong> {t('library.structure.countRaman')}
        </li>
        <li data-testid="count-both">
          <strong>{n(v.coincident)}</strong> {t('library.structure.countBoth')}
        </li>
        <li data-testid="count-silent">
          <strong>{n(v.silent)}</strong> {t('library.structure.countSilent')}
        </li>
      </ul>
      <p className={v.mutualExclusion ? 'sb-notice' : 'sb-muted'} data-testid="mutual-exclusion">
        {v.mutualExclusion ? t('library.structure.mutualExclusionYes') : t('library.structure.mutualExclusionNo')}
      </p>
    </section>
  );
}
