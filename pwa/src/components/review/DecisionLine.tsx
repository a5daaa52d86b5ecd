import { useTranslation } from 'react-i18next';
import type { BundleDecision, Decision } from '../../features/review/types';
import { formatDateTime } from '../../i18n/format';
import './decision-line.css';

/** One decision in words: what, by whom, when, with its reason or comment; one made on an earlier submission says so. */
export function DecisionLine({ decision }: { decision: Decision | BundleDecision }) {
  const { t, i18n } = useTranslation();
  const earlier = 'earlier' in decision && decision.earlier;
  return (
    <div className={earlier ? 'sb-decision sb-decision--earlier' : 'sb-decision'} data-testid="decision-line" data-kind={decision.kind} data-earlier={earlier ? 'true' : undefined}>
      {earlier && (
        <p className="sb-decision__earlier" data-testid="decision-earlier">
          {t('review.decision.earlier')}
        </p>
      )}
      <p>
        <strong>{t(`review.decision.kind.${decision.kind}`, { compound: decision.compoundName ?? decision.compoundId ?? '' })}</strong>
      </p>
      <p className="sb-muted">
        {t('review.decision.by', { name: decision.decidedByName, at: formatDateTime(Date.parse(decision.decidedAt), i18n.language), revision: decision.revision })}
      </p>
      {decision.reason && <p>{t('review.decision.reasonIs', { reason: decision.reason })}</p>}
      {decision.comment && <p>{t('review.decision.commentIs', { comment: decision.comment })}</p>}
    </div>
  );
}
