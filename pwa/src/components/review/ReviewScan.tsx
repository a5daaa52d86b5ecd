import { useId } from 'react';
import { IonButton, IonIcon } from '@ionic/react';
import { downloadOutline } from 'ionicons/icons';
import { useTranslation } from 'react-i18next';
import type { Compound, Library } from '@siteband/shared';
import { ScanResultPanel } from '../spectrum/ScanResultPanel';
import { ServerCheckView } from '../spectrum/ServerCheckView';
import { ResultCautions } from '../caution/ResultCautions';
import { identifyClient } from '../../features/identify/identifyWorker';
import { cautionsFor } from '../../features/identify/resultView';
import { formatAgreement } from '../../features/identify/format';
import { rawScanInputOf, storedIdentifyResult } from '../../features/review/caseReview';
import type { BundleDecision, Decision, DecisionInput, FlatRecord } from '../../features/review/types';
import { useRawScanOutcome } from '../../features/review/useReview';
import { serverCheckOf } from '../../features/scans/serverCheck';
import { formatDateTime } from '../../i18n/format';
import { DecisionLine } from './DecisionLine';
import { ScanDecisionForm } from './ScanDecisionForm';

export interface ReviewScanProps {
  scan: FlatRecord;
  current: Decision | null;
  /** Without a current decision: the last one on an earlier submission, shown as history. */
  earlier: BundleDecision | null;
  canDecide: boolean;
  compounds: readonly Compound[];
  library: Library | undefined;
  baseVersion: number;
  busy: boolean;
  onDecide: (input: DecisionInput) => void;
  onJcamp: () => void;
}

/**
 * One scan under review: how it was taken, its spectrum read again from the raw file on the
 * server, the likely compounds the tablet found with their evidence, the server's recomputation,
 * the current decision (or the last one on an earlier submission) and the form to decide.
 */
export function ReviewScan({ scan, current, earlier, canDecide, compounds, library, baseVersion, busy, onDecide, onJcamp }: ReviewScanProps) {
  const { t, i18n } = useTranslation();
  const headingId = useId();
  const stored = storedIdentifyResult(scan.result);
  const raw = useRawScanOutcome(rawScanInputOf(scan), identifyClient, library);
  const first = stored?.reliable && stored.candidates[0] ? { id: stored.candidates[0].id, name: stored.candidates[0].name } : null;
  const check = serverCheckOf(scan);
  const technique = scan.technique === 'raman' ? 'raman' : 'ir';
  const recordedAt = typeof scan.recordedAt === 'string' ? formatDateTime(Date.parse(scan.recordedAt), i18n.language) : '';

  return (
    <section className="sb-panel sb-review-scan" aria-labelledby={headingId} data-testid={`review-scan-${scan.id}`}>
      <h3 id={headingId} className="sb-panel__heading">
        {t('review.scan.heading', { technique: t(`identify.settings.${technique}`), at: recordedAt })}
      </h3>
      <div className="sb-review-actions">
        <IonButton fill="outline" onClick={onJcamp} data-testid="download-jcamp">
          <IonIcon icon={downloadOutline} slot="start" aria-hidden="true" />
          {t('review.scan.jcamp')}
        </IonButton>
      </div>

      {raw.isPending && rawScanInputOf(scan) && <p className="sb-muted">{t('review.scan.loadingRaw')}</p>}
      {raw.isError && <p className="sb-error">{t('review.scan.rawFailed', { message: raw.error.message })}</p>}
      {!rawScanInputOf(scan) && <p className="sb-notice">{t('review.scan.noRaw')}</p>}
      {raw.data && stored && <ScanResultPanel outcome={{ ...raw.data, result: stored }} />}
      {!raw.data && stored && (
        <>
          {stored.reliable && stored.candidates.length > 0 && (
            <ol data-testid="stored-candidates">
              {stored.candidates.slice(0, 5).map((c) => (
                <li key={c.id}>{t('capture.scans.top', { name: c.name, agreement: formatAgreement(c.score, i18n.language) })}</li>
              ))}
            </ol>
          )}
          <ResultCautions cautions={cautionsFor(stored)} />
        </>
      )}
      {!stored && <p className="sb-notice">{t('review.scan.noResult')}</p>}

      <div className={check?.resultMismatch ? 'sb-mismatch' : undefined}>
        <h4>{t('review.scan.serverHeading')}</h4>
        <ServerCheckView check={check} />
      </div>

      <h4>{t('review.scan.decisionHeading')}</h4>
      {current ? <DecisionLine decision={current} /> : <p className="sb-muted">{t(earlier ? 'review.scan.noFreshDecision' : 'review.scan.noDecision')}</p>}
      {earlier && <DecisionLine decision={earlier} />}
      {canDecide && <ScanDecisionForm key={current?.revision ?? 0} scanId={scan.id} firstCompound={first} compounds={compounds} baseVersion={baseVersion} busy={busy} onDecide={onDecide} />}
    </section>
  );
}
