import type { Compound } from '@siteband/shared';
import { useTranslation } from 'react-i18next';

/** Names, CAS RN, formula, phases, UN number and where the identity data come from. */
export function CompoundFacts({ compound, sources }: { compound: Compound; sources: Readonly<Record<string, string>> }) {
  const { t } = useTranslation();
  const list = new Intl.ListFormat(undefined, { type: 'conjunction' });
  return (
    <section className="sb-panel" aria-labelledby="compound-facts-heading">
      <h2 id="compound-facts-heading" className="sb-panel__heading">
        {t('library.detail.identity')}
      </h2>
      <dl className="sb-facts">
        <dt>{t('library.detail.synonyms')}</dt>
        <dd data-testid="compound-synonyms">{compound.synonyms.length ? compound.synonyms.join(', ') : '—'}</dd>
        <dt>{t('library.detail.cas')}</dt>
        <dd>{compound.cas}</dd>
        <dt>{t('library.detail.formula')}</dt>
        <dd>{compound.formula}</dd>
        <dt>{t('library.detail.group')}</dt>
        <dd>{t(`library.group.${compound.group}`)}</dd>
        <dt>{t('library.detail.phases')}</dt>
        <dd>{list.format(compound.phases.map((p) => t(`library.phase.${p}`)))}</dd>
        <dt>{t('library.detail.unNumber')}</dt>
        <dd>{compound.hazards.unNumber ? `UN ${compound.hazards.unNumber}` : t('library.detail.none')}</dd>
      </dl>
      <p className="sb-muted">{t('library.detail.source', { source: sources[compound.casSource.ref] ?? compound.casSource.ref, basis: compound.casSource.basis })}</p>
      {compound.notes && compound.notes.length > 0 && (
        <ul>
          {compound.notes.map((n) => (
            <li key={n}>{n}</li>
          ))}
        </ul>
      )}
    </section>
  );
}
