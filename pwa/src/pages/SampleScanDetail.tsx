import { useTranslation } from 'react-i18next';
import { SyncBadge } from '../components/cases/SyncBadge';
import { ScanEditPanel } from '../components/spectrum/ScanEditPanel';
import { ServerCheckView } from '../components/spectrum/ServerCheckView';
import type { EscalationRow } from '../db/escalationsTable';
import type { PhotoRow } from '../db/photosTable';
import type { ScanRow } from '../db/scansTable';
import { formatAgreement } from '../features/identify/format';
import { storedCandidates, storedVerdict } from '../features/scans/storedResult';
import { formatDateTime } from '../i18n/format';

/** A saved scan as stored on the tablet: how it was taken (corrected in place on an open case), its raw file, its likely compounds, escalation and the server's check. */
export function SampleScanDetail({ scan, raw, escalations, editable }: { scan: ScanRow; raw: PhotoRow | null; escalations: EscalationRow[]; editable: boolean }) {
  const { t, i18n } = useTranslation();
  const { data } = scan;
  const candidates = storedCandidates(data.result).slice(0, 5);
  const verdict = storedVerdict(data.result);
  const when = (iso: string) => formatDateTime(Date.parse(iso), i18n.language);
  return (
    <>
      <section className="sb-panel" aria-labelledby="scan-facts-heading">
        <h2 id="scan-facts-heading" className="sb-panel__heading">
          {t('capture.scanDetail.factsHeading')}
        </h2>
        <dl className="sb-facts">
          <dt>{t('identify.settings.technique')}</dt>
          <dd data-testid="scan-technique">{t(`identify.settings.${data.technique}`)}</dd>
          <dt>{t('identify.settings.phase')}</dt>
          <dd>{t(`identify.settings.${data.phase}`)}</dd>
          {data.excitationNm !== null && (
            <>
              <dt>{t('capture.scanDetail.excitation')}</dt>
              <dd>{t('capture.scanDetail.nm', { value: data.excitationNm })}</dd>
            </>
          )}
          <dt>{t('capture.scanDetail.recordedAt')}</dt>
          <dd>{when(data.recordedAt)}</dd>
          <dt>{t('capture.scanDetail.acknowledgedAt')}</dt>
          <dd data-testid="scan-acknowledged">{data.inspectorAcknowledgedAt ? when(data.inspectorAcknowledgedAt) : t('capture.scans.notAcknowledged')}</dd>
          <dt>{t('capture.scanDetail.rawFile')}</dt>
          <dd>
            {raw ? raw.data.fileName : t('capture.scanDetail.rawMissing')}
            {raw && <SyncBadge state={raw.sync} testId="raw-sync" />}
          </dd>
          <dt>{t('capture.scanDetail.sha256')}</dt>
          <dd style={{ overflowWrap: "anywhere" }} data-testid="scan-sha256">
            {data.rawSha256}
          </dd>
          <dt>{t('capture.case.syncState')}</dt>
          <dd>
            <SyncBadge state={scan.sync} testId="scan-sync" />
          </dd>
        </dl>
        <p className="sb-muted">{t('editing.permanent.rawFile')}</p>
        {scan.rejectedReason && (
          <p className="sb-error" role="alert">
            {t('capture.sync.rejected', { reason: scan.rejectedReason })}
          </p>
        )}
      </section>

      {editable && <ScanEditPanel scan={scan} raw={raw} />}

      <section className="sb-panel" aria-labelledby="scan-likely-heading">
        <h2 id="scan-likely-heading" className="sb-panel__heading">
          {t('identify.likely.heading')}
        </h2>
        {!verdict.reliable && <p className="sb-notice">{t('capture.scanDetail.unreliable', { reasons: verdict.reasons.join(' ') })}</p>}
        {candidates.length === 0 ? (
          <p className="sb-muted">{t('identify.likely.none')}</p>
        ) : (
          <ol data-testid="stored-candidates">
            {candidates.map((c) => (
              <li key={c.id}>{t('capture.scans.top', { name: c.name, agreement: formatAgreement(c.score, i18n.language) })}</li>
            ))}
          </ol>
        )}
        {verdict.cautions.length > 0 && (
          <ul aria-label={t('capture.scanDetail.cautions')}>
            {verdict.cautions.map((c) => (
              <li key={c}>{c}</li>
            ))}
          </ul>
        )}
      </section>

      {escalations.map((e) => (
        <section key={e.id} className="sb-panel" aria-labelledby={`escalation-${e.id}`} data-testid="scan-escalation">
          <h2 id={`escalation-${e.id}`} className="sb-panel__heading">
            {t('capture.scanDetail.escalationHeading', { time: when(e.data.raisedAt) })}
          </h2>
          <p>{e.data.reason}</p>
          <p>{t('capture.scanDetail.hazardClasses', { classes: e.data.hazardClasses.join(', ') })}</p>
          <SyncBadge state={e.sync} />
          <p className="sb-muted">{t('editing.permanent.escalations')}</p>
        </section>
      ))}

      <section className="sb-panel" aria-labelledby="server-check-heading">
        <h2 id="server-check-heading" className="sb-panel__heading">
          {t('capture.scanDetail.serverHeading')}
        </h2>
        <ServerCheckView check={scan.serverCheck} />
      </section>
    </>
  );
}
