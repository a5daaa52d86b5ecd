import { useState } from 'react';
import { IonButton, IonIcon } from '@ionic/react';
import { documentTextOutline } from 'ionicons/icons';
import { useParams } from 'react-router-dom';
import { useTranslation } from 'react-i18next';
import { CautionNote } from '../components/CautionNote';
import { HandoverTable } from '../components/cases/HandoverTable';
import { PageShell } from '../components/PageShell';
import { CaseDecisionPanel } from '../components/review/CaseDecisionPanel';
import { DecisionError } from '../components/review/DecisionError';
import { DecisionLine } from '../components/review/DecisionLine';
import { ReviewPhoto } from '../components/review/ReviewPhoto';
import { ReviewScan } from '../components/review/ReviewScan';
import '../components/review/review.css';
import { useApiClient } from '../features/api/ApiClientContext';
import { useLibrary } from '../features/library/useLibrary';
import { useOnlineStatus } from '../features/network/onlineStatus';
import { caseActions, childrenOf, currentDecisionOf, decisionHistory, earlierDecisionOf, handoversOf } from '../features/review/caseReview';
import { downloadCaseReport, downloadScanJcamp } from '../features/review/reviewApi';
import { reviewPaths } from '../features/review/reviewPaths';
import { saveFile } from '../features/review/saveFile';
import type { CaseBundle, DecisionInput, FlatRecord } from '../features/review/types';
import { useCaseBundle, useDecide, useQueuedInspector } from '../features/review/useReview';
import { formatDateTime } from '../i18n/format';

function text(value: unknown): string {
  return typeof value === 'string' ? value : '';
}

function Photos({ attachments }: { attachments: FlatRecord[] }) {
  const photos = attachments.filter((a) => a.kind === 'photo');
  if (photos.length === 0) return null;
  return (
    <div className="sb-review-photos">
      {photos.map((p) => (
        <ReviewPhoto key={p.id} attachmentId={p.id} fileName={text(p.fileName)} caption={text(p.caption) || null} />
      ))}
    </div>
  );
}

function Escalations({ bundle }: { bundle: CaseBundle }) {
  const { t, i18n } = useTranslation();
  const when = (iso: unknown) => (typeof iso === 'string' ? formatDateTime(Date.parse(iso), i18n.language) : '');
  if (bundle.escalations.length === 0) return <p className="sb-muted">{t('review.case.noEscalations')}</p>;
  return (
    <ul className="sb-review-list">
      {bundle.escalations.map((e) => {
        const status = text(e.status) || 'raised';
        const notes = Array.isArray(e.notes) ? (e.notes as FlatRecord[]) : [];
        return (
          <li key={e.id} data-testid="review-escalation" data-status={status}>
            <p>
              <span className={`sb-pill sb-hazard sb-hazard--${status === 'raised' ? 3 : 1}`}>{t(`review.escalation.status.${status}`)}</span>{' '}
              {t('review.escalation.raised', { at: when(e.raisedAt) })}
            </p>
            <p>{text(e.reason)}</p>
            {Array.isArray(e.hazardClasses) && <p>{t('capture.scanDetail.hazardClasses', { classes: e.hazardClasses.join(', ') })}</p>}
            {e.acknowledgedAt != null && (
              <p>
                {t('review.escalation.acknowledged', {
                  name: text(e.acknowledgedByName),
                  at: when(e.acknowledgedAt),
                  action: e.actionTaken ? t(`review.escalation.action.${text(e.actionTaken)}`, { level: text(e.ppeLevel) }) : '',
                })}
              </p>
            )}
            {text(e.ackComment) && <p>{t('review.decision.commentIs', { comment: text(e.ackComment) })}</p>}
            {e.closedAt != null && <p>{t('review.escalation.closed', { at: when(e.closedAt), comment: text(e.closeComment) })}</p>}
            {notes.length > 0 && (
              <ul>
                {notes.map((n) => (
                  <li key={n.id}>{t('review.escalation.note', { author: text(n.authorName), at: when(n.at ?? n.createdAt), text: text(n.text) })}</li>
                ))}
              </ul>
            )}
          </li>
        );
      })}
    </ul>
  );
}

/** The supervisor's page for one case: everything recorded, the evidence per scan, and the decisions. */
export default function CaseReviewPage() {
  const { t, i18n } = useTranslation();
  const { caseId = '' } = useParams();
  const client = useApiClient();
  const online = useOnlineStatus();
  const bundle = useCaseBundle(caseId);
  const decide = useDecide(caseId);
  const library = useLibrary().data;
  const inspector = useQueuedInspector(caseId);
  const [downloadError, setDownloadError] = useState<string>();
  const when = (iso: unknown) => (typeof iso === 'string' ? formatDateTime(Date.parse(iso), i18n.language) : '—');
  const data = bundle.data;
  const title = data ? data.case.siteName : t('review.case.title');

  async function download(run: () => Promise<void>) {
    setDownloadError(undefined);
    try {
      await run();
    } catch (error) {
      setDownloadError(t('review.case.downloadFailed', { message: error instanceof Error ? error.message : String(error) }));
    }
  }
  function onDecide(input: DecisionInput) {
    decide.reset();
    decide.mutate(input);
  }
  function reload() {
    decide.reset();
    void bundle.refetch();
  }

  if (!data) {
    return (
      <PageShell title={title}>
        <IonButton fill="outline" routerLink={reviewPaths.queue} routerDirection="back" className="sb-back">
          {t('review.case.back')}
        </IonButton>
        {!online && <p className="sb-notice">{t('review.queue.offline')}</p>}
        {online && bundle.isPending && <p className="sb-muted">{t('review.case.loading')}</p>}
        {bundle.isError && (
          <p className="sb-error" role="alert">
            {t('review.case.loadError', { message: bundle.error.message })}
          </p>
        )}
      </PageShell>
    );
  }

  const c = data.case;
  const actions = caseActions(data);
  const compounds = library?.library.compounds ?? [];
  const caseAttachments = data.attachments.filter((a) => a.ownerType === 'case');
  const sampleLabel = new Map(data.samples.map((s) => [s.id, text(s.label)]));
  const scanSample = new Map(data.scans.map((s) => [s.id, sampleLabel.get(text(s.sampleId)) ?? '']));

  return (
    <PageShell title={title}>
      <div className="sb-case-actions">
        <IonButton fill="outline" routerLink={reviewPaths.queue} routerDirection="back" className="sb-back">
          {t('review.case.back')}
        </IonButton>
        <IonButton
          fill="outline"
          data-testid="download-report"
          onClick={() => void download(async () => saveFile(await downloadCaseReport(client, caseId), `case-${caseId}.pdf`))}
        >
          <IonIcon icon={documentTextOutline} slot="start" aria-hidden="true" />
          {t('review.case.report')}
        </IonButton>
      </div>
      {!online && <p className="sb-notice">{t('review.queue.offline')}</p>}
      {downloadError && (
        <p className="sb-error" role="alert">
          {downloadError}
        </p>
      )}

      <section className="sb-panel" aria-labelledby="review-case-heading">
        <h2 id="review-case-heading" className="sb-panel__heading">
          {t('review.case.factsHeading')}
        </h2>
        <dl className="sb-facts">
          <dt>{t('review.queue.col.status')}</dt>
          <dd>
            <span className={`sb-pill sb-status--${c.status}`} data-testid="review-case-status">
              {t(`capture.status.${c.status}`)}
            </span>
          </dd>
          {inspector && (
            <>
              <dt>{t('review.queue.col.inspector')}</dt>
              <dd>{inspector.displayName}</dd>
            </>
          )}
          <dt>{t('review.case.address')}</dt>
          <dd>{text(c.address) || '—'}</dd>
          <dt>{t('review.queue.col.started')}</dt>
          <dd>{when(c.startedAt)}</dd>
          {typeof c.latitude === 'number' && typeof c.longitude === 'number' && (
            <>
              <dt>{t('review.case.location')}</dt>
              <dd>{t('review.case.coordinates', { lat: c.latitude.toFixed(5), lon: c.longitude.toFixed(5) })}</dd>
            </>
          )}
          {text(c.weatherNotes) && (
            <>
              <dt>{t('review.case.weather')}</dt>
              <dd>{text(c.weatherNotes)}</dd>
            </>
          )}
          {text(c.accessNotes) && (
            <>
              <dt>{t('review.case.access')}</dt>
              <dd>{text(c.accessNotes)}</dd>
            </>
          )}
        </dl>
        <Photos attachments={caseAttachments} />
      </section>

      <section className="sb-panel" aria-labelledby="review-escalations-heading">
        <h2 id="review-escalations-heading" className="sb-panel__heading">
          {t('review.case.escalationsHeading')}
        </h2>
        <Escalations bundle={data} />
      </section>

      {data.samples
        .filter((s) => !s.deleted)
        .map((sample) => {
          const handovers = handoversOf(sample);
          const scans = childrenOf(data.scans, 'sampleId', sample.id);
          const observations = (sample.observations ?? {}) as { colour?: string; state?: string; notes?: string };
          return (
            <section key={sample.id} className="sb-panel" aria-labelledby={`review-sample-${sample.id}`} data-testid={`review-sample-${sample.id}`}>
              <h2 id={`review-sample-${sample.id}`} className="sb-panel__heading">
                {t('review.sample.heading', { label: text(sample.label) })}
              </h2>
              <dl className="sb-facts">
                <dt>{t('review.sample.container')}</dt>
                <dd>{text(sample.container) || '—'}</dd>
                <dt>{t('review.sample.locationOnSite')}</dt>
                <dd>{text(sample.locationOnSite) || '—'}</dd>
                <dt>{t('review.sample.collected')}</dt>
                <dd>{t('review.sample.collectedBy', { name: text(sample.collectedBy), at: when(sample.collectedAt) })}</dd>
                <dt>{t('review.sample.seal')}</dt>
                <dd>{text(sample.sealNumber) || '—'}</dd>
                {(observations.state || observations.colour || observations.notes) && (
                  <>
                    <dt>{t('review.sample.observations')}</dt>
                    <dd>{[observations.state, observations.colour, observations.notes].filter(Boolean).join(' · ')}</dd>
                  </>
                )}
              </dl>
              <Photos attachments={data.attachments.filter((a) => a.ownerType === 'sample' && a.ownerId === sample.id)} />
              <h3>{t('review.sample.custody')}</h3>
              {handovers.length === 0 ? (
                <p className="sb-muted">{t('review.sample.noHandovers')}</p>
              ) : (
                <HandoverTable
                  testId="review-handovers"
                  lines={handovers.map((h) => ({ id: h.id, at: text(h.at), from: text(h.from), to: text(h.to), sealNumber: text(h.sealNumber) || null, note: text(h.note) || null }))}
                />
              )}
              {scans.length === 0 && <p className="sb-muted">{t('review.sample.noScans')}</p>}
              {scans.map((scan) => (
                <ReviewScan
                  key={scan.id}
                  scan={scan}
                  current={currentDecisionOf(data, scan.id)}
                  earlier={earlierDecisionOf(data, scan.id)}
                  canDecide={actions.decideScans}
                  compounds={compounds}
                  library={library?.source === 'bundled' ? undefined : library?.library}
                  baseVersion={c.version}
                  busy={decide.isPending}
                  onDecide={onDecide}
                  onJcamp={() => void download(async () => saveFile(await downloadScanJcamp(client, scan.id), `scan-${scan.id}.jdx`))}
                />
              ))}
            </section>
          );
        })}

      <section className="sb-panel" aria-labelledby="review-notes-heading">
        <h2 id="review-notes-heading" className="sb-panel__heading">
          {t('review.case.notesHeading')}
        </h2>
        {data.notes.length === 0 ? (
          <p className="sb-muted">{t('review.case.noNotes')}</p>
        ) : (
          <ul className="sb-review-list">
            {[...data.notes]
              .filter((n) => !n.deleted)
              .sort((a, b) => text(a.recordedAt).localeCompare(text(b.recordedAt)))
              .map((n) => (
                <li key={n.id}>
                  <p className="sb-muted">
                    {when(n.recordedAt)}
                    {n.sampleId ? ` · ${t('review.sample.heading', { label: sampleLabel.get(text(n.sampleId)) ?? '' })}` : ''}
                  </p>
                  <p>{text(n.text)}</p>
                </li>
              ))}
          </ul>
        )}
      </section>

      <section className="sb-panel" aria-labelledby="review-decide-heading">
        <h2 id="review-decide-heading" className="sb-panel__heading">
          {t('review.case.decideHeading')}
        </h2>
        <DecisionError error={decide.error} onReload={reload} />
        {decide.isSuccess && (
          <p className="sb-success" role="status">
            {t('review.decision.recorded')}
          </p>
        )}
        <CaseDecisionPanel actions={actions} baseVersion={c.version} busy={decide.isPending} onDecide={onDecide} />
      </section>

      <section className="sb-panel" aria-labelledby="review-history-heading">
        <h2 id="review-history-heading" className="sb-panel__heading">
          {t('review.case.historyHeading')}
        </h2>
        {data.decisions.length === 0 ? (
          <p className="sb-muted">{t('review.case.noDecisions')}</p>
        ) : (
          <ol className="sb-review-list" data-testid="decision-history">
            {decisionHistory(data).map((d) => (
              <li key={d.id ?? d.revision}>
                {d.scanId && <p className="sb-muted">{t('review.case.forScan', { sample: scanSample.get(d.scanId) ?? '' })}</p>}
                <DecisionLine decision={d} />
              </li>
            ))}
          </ol>
        )}
      </section>
      <CautionNote laser />
    </PageShell>
  );
}
