import { useId } from 'react';
import { useTranslation } from 'react-i18next';
import { CautionCardView } from '../caution/CautionCardView';
import type { CandidateView } from '../../features/identify/resultView';
import { formatAgreement, formatCm1, formatOffsetCm1, formatShare } from '../../features/identify/format';
import { BandTable } from './BandTable';
import './results.css';

export interface CandidateCardProps {
  readonly view: CandidateView;
  readonly selected: boolean;
  readonly onSelect: () => void;
}

/**
 * One likely compound: its band agreement with the parts it is made of, the explained peaks, the
 * missing bands, the evidence against, and its caution card when it is hazardous.
 */
export function CandidateCard({ view, selected, onSelect }: CandidateCardProps) {
  const { t, i18n } = useTranslation();
  const lang = i18n.language;
  const { candidate: c } = view;
  const headingId = useId();
  const label = (l: string | null, mode: string | null) => [mode, l].filter(Boolean).join(' · ') || t('identify.candidate.noSymmetry');
  return (
    <article
      className={`sb-candidate${view.hazardous ? ' sb-candidate--hazard' : ''}${selected ? ' sb-candidate--selected' : ''}`}
      aria-labelledby={headingId}
      data-testid={`candidate-${c.id}`}
    >
      <header className="sb-candidate__header">
        <span className="sb-candidate__rank" aria-hidden="true">
          {c.rank}
        </span>
        <div>
          <h3 id={headingId} className="sb-candidate__name">
            <span className="sb-visually-hidden">{t('identify.candidate.rank', { rank: c.rank })} </span>
            {c.name}
          </h3>
          <p className="sb-muted sb-candidate__ids">
            {c.formula} · CAS RN {c.cas}
          </p>
        </div>
        <div className="sb-candidate__tags">
          {view.hazardous && <span className="sb-tag sb-tag--hazard">{t('identify.candidate.hazardous')}</span>}
          {c.listedForCaution && <span className="sb-tag sb-tag--caution">{t('identify.candidate.listedForCaution')}</span>}
        </div>
      </header>

      <dl className="sb-agreement" aria-label={t('identify.candidate.agreementParts')}>
        <div>
          <dt>{t('identify.candidate.agreement')}</dt>
          <dd data-testid="band-agreement">{formatAgreement(c.score, lang)}</dd>
        </div>
        <div>
          <dt>{t('identify.candidate.bandsFound')}</dt>
          <dd>
            {formatShare(c.parts.bandsFound, lang)}{' '}
            <span className="sb-muted">{t('identify.candidate.matchedOf', { matched: c.parts.matchedBands, expected: c.parts.expectedBands })}</span>
          </dd>
        </div>
        <div>
          <dt>{t('identify.candidate.peaksExplained')}</dt>
          <dd>{formatShare(c.parts.peaksExplained, lang)}</dd>
        </div>
        <div>
          <dt>{t('identify.candidate.againstShare')}</dt>
          <dd>{formatShare(c.parts.againstShare, lang)}</dd>
        </div>
      </dl>

      <BandTable
        caption={t('identify.candidate.explained', { count: c.explained.length })}
        columns={[t('identify.candidate.observed'), t('identify.candidate.expected'), t('identify.candidate.delta'), t('identify.candidate.symmetry'), t('identify.candidate.assignment')]}
        rows={c.explained.map((e) => [formatCm1(e.x, lang), formatCm1(e.expectedCm1, lang), formatOffsetCm1(e.deltaCm1, lang), label(e.label, e.mode), e.assignment])}
        testId="explained-peaks"
      />
      {c.missing.length > 0 && (
        <BandTable
          caption={t('identify.candidate.missing', { count: c.missing.length })}
          columns={[t('identify.candidate.expected'), t('identify.candidate.intensity'), t('identify.candidate.symmetry'), t('identify.candidate.assignment')]}
          rows={c.missing.map((m) => [formatCm1(m.expectedCm1, lang), m.intensity, label(m.label, m.mode), m.assignment])}
          testId="missing-bands"
        />
      )}
      {c.against.length > 0 && (
        <div className="sb-against" data-testid="evidence-against">
          <h4 className="sb-band-table__caption">{t('identify.candidate.against', { count: c.against.length })}</h4>
          <ul>
            {c.against.map((a) => (
              <li key={`${a.x}-${a.forbiddenCm1}`}>{a.reason}</li>
            ))}
          </ul>
        </div>
      )}

      {view.cautionCard && <CautionCardView card={view.cautionCard} />}

      <button type="button" className="sb-overlay-toggle" aria-pressed={selected} onClick={onSelect}>
        {selected ? t('identify.candidate.overlayOn') : t('identify.candidate.overlayOff')}
      </button>
    </article>
  );
}
