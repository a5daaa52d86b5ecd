import { cautionCard, type Compound } from '@siteband/shared';
import { useTranslation } from 'react-i18next';
import { CautionNote } from '../CautionNote';
import { CautionCardView } from '../caution/CautionCardView';

/** The compound's caution card (the same card the likely compounds show), with its GHS classes and source. */
export function CautionCardPanel({ compound, sources }: { compound: Compound; sources: Readonly<Record<string, string>> }) {
  const { t } = useTranslation();
  const card = cautionCard(compound);
  const { source } = compound.hazards;
  return (
    <section className="sb-panel" aria-labelledby="caution-card-panel-heading" data-testid="compound-caution-card">
      <h2 id="caution-card-panel-heading" className="sb-panel__heading">
        {t('library.detail.cautionCard')}
      </h2>
      <CautionCardView card={card} />
      {card.classifications.length > 0 && (
        <>
          <h3>{t('library.detail.classifications')}</h3>
          <ul>
            {card.classifications.map((c) => (
              <li key={`${c.hazardClass}-${c.category}`}>{t('library.detail.classification', { name: c.name, category: c.category })}</li>
            ))}
          </ul>
        </>
      )}
      <p className="sb-muted">{t('library.detail.source', { source: sources[source.ref] ?? source.ref, basis: source.basis })}</p>
      <CautionNote laser />
    </section>
  );
}
