import { cautionCard, type Compound } from '@siteband/shared';
import { useTranslation } from 'react-i18next';
import { CautionNote } from '../CautionNote';
import { PictogramBadge } from './PictogramBadge';

/** The compound's caution card: signal word, pictograms, H-statements, classes, UN number and protective cautions. */
export function CautionCardPanel({ compound, sources }: { compound: Compound; sources: Readonly<Record<string, string>> }) {
  const { t } = useTranslation();
  const card = cautionCard(compound);
  return (
    <section className="sb-panel sb-caution-card" aria-labelledby="caution-card-heading">
      <h2 id="caution-card-heading" className="sb-panel__heading">
        {t('library.detail.cautionCard')}
      </h2>
      <p className={card.signalWord === 'Danger' ? 'sb-signal sb-signal--danger' : 'sb-signal'}>
        {card.signalWord ? t('library.detail.signalWord', { word: card.signalWord }) : t('library.detail.noSignalWord')}
      </p>
      {card.pictograms.length > 0 && (
        <ul className="sb-pictograms" aria-label={t('library.detail.pictograms')}>
          {card.pictograms.map((p) => (
            <PictogramBadge key={p.code} code={p.code} description={p.description} />
          ))}
        </ul>
      )}
      <h3>{t('library.detail.hStatements')}</h3>
      {card.hStatements.length === 0 ? (
        <p className="sb-muted">{t('library.detail.noHStatements')}</p>
      ) : (
        <ul className="sb-hstatements" data-testid="h-statements">
          {card.hStatements.map((h) => (
            <li key={h.code}>
              <strong>{h.code}</strong> {h.text}
            </li>
          ))}
        </ul>
      )}
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
      <h3>{t('library.detail.protective')}</h3>
      <ul>
        {card.cautions.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
      <p className="sb-muted">{t('library.detail.source', { source: sources[compound.hazards.source.ref] ?? compound.hazards.source.ref, basis: compound.hazards.source.basis })}</p>
      <CautionNote laser />
    </section>
  );
}
