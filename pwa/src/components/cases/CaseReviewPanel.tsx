import { useTranslation } from 'react-i18next';
import type { CaseRow } from '../../db/casesTable';
import type { CaseOutcome } from '../../features/cases/useCaseOutcome';
import { formatDateTime } from '../../i18n/format';
import { DecisionLine } from '../review/DecisionLine';
import './outcome.css';

/**
 * The supervisor's review as the tablet last pulled it: a returned case's comment up front, who signed off
 * an accepted one, and the current decision of each scan, or, for a scan not decided again since the case
 * was resubmitted, its earlier decision marked as history. Works offline.
 */
export function CaseReviewPanel({ row, outcome }: { row: CaseRow; outcome: CaseOutcome }) {
  const { t, i18n } = useTranslation();
  const when = (iso: string) => formatDateTime(Date.parse(iso), i18n.language);
  const { status } = row.data;
  const { caseDecision, byScan, earlierByScan } = outcome.review;
  const sampleLabel = new Map(outcome.samples.map((s) => [s.id, s.data.label]));
  const scanDecisions = outcome.scans
    .filter((scan) => byScan.has(scan.id) || earlierByScan.has(scan.id))
    .sort((a, b) => a.data.recordedAt.localeCompare(b.data.recordedAt))
    .map((scan) => {
      const current = byScan.get(scan.id);
      return current ? { scan, decision: current, earlier: false } : { scan, decision: earlierByScan.get(scan.id)!, earlier: true };
    });
  if (status === 'open' && !caseDecision && scanDecisions.length === 0) return null;
  if (status === 'submitted' && scanDecisions.length === 0) return null;

  return (
    <section className="sb-panel" aria-labelledby="case-review-heading" data-testid="case-review">
      <h2 id="case-review-heading" className="sb-panel__heading">
        {t('caseOutcome.heading')}
      </h2>
      {status === 'returned' && (
        <div className="sb-notice sb-outcome-banner" role="status" data-testid="case-returned">
          <p className="sb-ack-outcome">
            {caseDecision?.kind === 'return'
              ? t('caseOutcome.returnedBy', { who: caseDecision.decidedByName, when: when(caseDecision.decidedAt) })
              : t('caseOutcome.returned')}
          </p>
          {caseDecision?.kind === 'return' && caseDecision.comment && <p className="sb-outcome-comment">{caseDecision.comment}</p>}
          <p>{t('caseOutcome.returnedHint')}</p>
        </div>
      )}
      {status === 'accepted' && (
        <div className="sb-success sb-outcome-banner" role="status" data-testid="case-accepted">
          <p className="sb-ack-outcome">
            {caseDecision?.kind === 'sign_off'
              ? t('caseOutcome.signedOffBy', { who: caseDecision.decidedByName, when: when(caseDecision.decidedAt) })
              : t('caseOutcome.accepted')}
          </p>
          <p>{t('caseOutcome.acceptedHint')}</p>
        </div>
      )}
      {status === 'in_review' && <p className="sb-notice">{t('caseOutcome.inReview')}</p>}
      {scanDecisions.length > 0 && (
        <>
          <h3>{t('caseOutcome.scansHeading')}</h3>
          <ul className="sb-decisions" data-testid="scan-decisions">
            {scanDecisions.map(({ scan, decision, earlier }) => (
              <li key={scan.id} data-testid={`scan-decision-${scan.id}`}>
                <p>
                  {t('caseOutcome.scanLabel', {
                    technique: t(`caseOutcome.technique.${scan.data.technique}`),
                    sample: sampleLabel.get(scan.data.sampleId) ?? '',
                    when: when(scan.data.recordedAt),
                  })}
                </p>
                {earlier && <p className="sb-muted">{t('caseOutcome.noFreshDecision')}</p>}
                <DecisionLine decision={{ ...decision, earlier }} />
              </li>
            ))}
          </ul>
        </>
      )}
    </section>
  );
}
