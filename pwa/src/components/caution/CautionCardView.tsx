import { useId } from 'react';
import { useTranslation } from 'react-i18next';
import type { CautionCard } from '@siteband/shared';
import { PictogramBadge } from './PictogramBadge';
import './caution.css';

/** One candidate's caution card: signal word, pictograms, H-statements, protective cautions, UN number. */
export function CautionCardView({ card }: { card: CautionCard }) {
  const { t } = useTranslation();
  const headingId = useId();
  return (
    <section className="sb-caution-card" aria-labelledby={headingId} data-testid={`caution-card-${card.compoundId}`}>
      <h4 id={headingId} className="sb-caution-card__heading">
        {t('identify.card.heading', { name: card.name })}
        {card.signalWord && <span className="sb-caution-card__signal">{card.signalWord}</span>}
      </h4>
      {card.pictograms.length > 0 && (
        <ul className="sb-pictograms" aria-label={t('identify.card.pictograms')}>
          {card.pictograms.map((p) => (
            <PictogramBadge key={p.code} code={p.code} description={p.description} />
          ))}
        </ul>
      )}
      {card.hStatements.length > 0 && (
        <>
          <h5 className="sb-caution-card__sub">{t('identify.card.hStatements')}</h5>
          <ul className="sb-caution-card__list">
            {card.hStatements.map((h) => (
              <li key={h.code}>
                <strong>{h.code}</strong> {h.text}
              </li>
            ))}
          </ul>
        </>
      )}
      {card.cautions.length > 0 && (
        <>
          <h5 className="sb-caution-card__sub">{t('identify.card.protective')}</h5>
          <ul className="sb-caution-card__list">
            {card.cautions.map((c) => (
              <li key={c}>{c}</li>
            ))}
          </ul>
        </>
      )}
      <p className="sb-caution-card__un">
        {t('identify.card.unNumber')}: <strong>{card.unNumber ? `UN ${card.unNumber}` : t('identify.card.noUnNumber')}</strong>
      </p>
    </section>
  );
}
