import { useId } from 'react';
import { useTranslation } from 'react-i18next';
import type { Mixture } from '@siteband/shared';
import { formatAgreement, formatShare } from '../../features/identify/format';

/** A mixture of two or three compounds, each with the share of intensity it explains. */
export function MixtureSummary({ mixture }: { mixture: Mixture }) {
  const { t, i18n } = useTranslation();
  const lang = i18n.language;
  const headingId = useId();
  return (
    <section className="sb-panel sb-mixture" aria-labelledby={headingId} data-testid="mixture">
      <h3 id={headingId} className="sb-panel__heading">
        {t('identify.mixture.heading')}
      </h3>
      <p>
        {t('identify.mixture.explains', {
          share: formatShare(mixture.explainedShare, lang),
          single: formatShare(mixture.bestSingleShare, lang),
        })}
      </p>
      <ul className="sb-mixture__list">
        {mixture.components.map((c) => (
          <li key={c.id}>
            <strong>{c.name}</strong> — {t('identify.mixture.component', { share: formatShare(c.share, lang), score: formatAgreement(c.score, lang) })}
          </li>
        ))}
      </ul>
    </section>
  );
}
