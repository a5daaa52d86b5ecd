import { IonButton, IonIcon } from '@ionic/react';
import { arrowBackOutline } from 'ionicons/icons';
import { useQuery } from '@tanstack/react-query';
import { cautionCard } from '@siteband/shared';
import { useTranslation } from 'react-i18next';
import { useParams } from 'react-router-dom';
import { CautionNote } from '../components/CautionNote';
import { PageShell } from '../components/PageShell';
import { CautionCardView } from '../components/caution/CautionCardView';
import { LiveStatusNote } from '../components/events/LiveStatusNote';
import { AcknowledgeForm } from '../components/escalations/AcknowledgeForm';
import { AcknowledgementLine } from '../components/escalations/AcknowledgementLine';
import { CloseForm } from '../components/escalations/CloseForm';
import { EscalationNotes } from '../components/escalations/EscalationNotes';
import { EscalationStatusPill } from '../components/escalations/EscalationStatusPill';
import { useApiClient } from '../features/api/ApiClientContext';
import { escalationPaths } from '../features/escalations/escalationPaths';
import { escalationQuery } from '../features/escalations/escalationsApi';
import { hazardClassView } from '../features/escalations/hazardClassView';
import { isStale } from '../features/escalations/mutationMessage';
import { useEscalationMutations } from '../features/escalations/useEscalationMutations';
import { useLibrary } from '../features/library/useLibrary';
import { useOnlineStatus } from '../features/network/onlineStatus';
import { useSession } from '../features/session/SessionProvider';
import { formatDateTime } from '../i18n/format';

/** One escalation: case summary, compounds with caution cards, hazard classes; acknowledge, notes, close. */
export default function EscalationPage() {
  const { t, i18n } = useTranslation();
  const { id = '' } = useParams();
  const client = useApiClient();
  const online = useOnlineStatus();
  const { session } = useSession();
  const library = useLibrary();
  const detail = useQuery({ ...escalationQuery(client, id), enabled: online });
  const actions = useEscalationMutations(id);
  const mayAct = session?.user.role === 'safety_officer';
  const item = detail.data;
  const staleError = [actions.acknowledge.error, actions.close.error].find(isStale);
  const when = (iso: string) => formatDateTime(Date.parse(iso), i18n.language);
  const compounds = item?.compounds.map((name) => ({ name, compound: library.data?.library.compounds.find((c) => c.name === name) })) ?? [];

  return (
    <PageShell title={t('escalations.page.title')}>
      <IonButton fill="outline" routerLink={escalationPaths.inbox} routerDirection="back" className="sb-back">
        <IonIcon icon={arrowBackOutline} slot="start" aria-hidden="true" />
        {t('escalations.page.back')}
      </IonButton>
      <LiveStatusNote />
      {!online && <p className="sb-notice">{t('escalations.page.offline')}</p>}
      {detail.isPending && online && <p className="sb-muted">{t('escalations.loading')}</p>}
      {detail.isError && (
        <div className="sb-error" role="alert">
          <p>{t('escalations.loadError', { message: detail.error.message })}</p>
          <IonButton fill="outline" onClick={() => void detail.refetch()}>
            {t('escalations.retry')}
          </IonButton>
        </div>
      )}
      {staleError && (
        <p className="sb-error" role="alert" data-testid="escalation-stale">
          {t('escalations.stale', { message: staleError.message })}
        </p>
      )}
      {item && (
        <>
          <section className="sb-panel" aria-labelledby="escalation-summary-heading" data-testid="escalation-summary">
            <h2 id="escalation-summary-heading" className="sb-panel__heading">
              <EscalationStatusPill status={item.status} /> {item.siteName}
            </h2>
            <dl className="sb-facts">
              <dt>{t('escalations.page.reason')}</dt>
              <dd>{item.reason}</dd>
              <dt>{t('escalations.page.address')}</dt>
              <dd>{item.address ?? t('escalations.page.noAddress')}</dd>
              <dt>{t('escalations.page.inspector')}</dt>
              <dd>{item.inspector.displayName}</dd>
              <dt>{t('escalations.page.raisedAt')}</dt>
              <dd>{when(item.raisedAt)}</dd>
              <dt>{t('escalations.page.receivedAt')}</dt>
              <dd>{when(item.receivedAt)}</dd>
              <dt>{t('escalations.page.caseStatus')}</dt>
              <dd>{t(`capture.status.${item.case.status}`, { defaultValue: item.case.status })}</dd>
              <dt>{t('escalations.page.caseStarted')}</dt>
              <dd>{when(item.case.startedAt)}</dd>
              {item.status === 'raised' && (
                <>
                  <dt>{t('escalations.page.notified')}</dt>
                  <dd>
                    {t('escalations.page.notifiedCount', { count: item.notifiedCount })}
                    {item.nextNotifyAt && ` ${t('escalations.page.nextNotify', { when: when(item.nextNotifyAt) })}`}
                  </dd>
                </>
              )}
            </dl>
            {item.acknowledgedByName && item.acknowledgedAt && (
              <AcknowledgementLine
                ack={{ byName: item.acknowledgedByName, at: item.acknowledgedAt, action: item.actionTaken, ppeLevel: item.ppeLevel, comment: item.ackComment }}
              />
            )}
            {item.status === 'closed' && item.closedAt && (
              <p className="sb-ack-outcome" data-testid="closed-line">
                {t('escalations.closedLine', { when: when(item.closedAt), comment: item.closeComment ?? '' })}
              </p>
            )}
          </section>

          <section className="sb-panel" aria-labelledby="escalation-compounds-heading">
            <h2 id="escalation-compounds-heading" className="sb-panel__heading">
              {t('escalations.page.compounds')}
            </h2>
            {compounds.length === 0 && <p>{t('escalations.noCompounds')}</p>}
            {compounds.map(({ name, compound }) =>
              compound ? <CautionCardView key={name} card={cautionCard(compound)} /> : <p key={name}>{t('escalations.page.notInLibrary', { name })}</p>,
            )}
          </section>

          <section className="sb-panel" aria-labelledby="escalation-classes-heading">
            <h2 id="escalation-classes-heading" className="sb-panel__heading">
              {t('escalations.page.hazardClasses')}
            </h2>
            {item.hazardClasses.map((classId) => {
              const view = hazardClassView(classId);
              return (
                <div key={classId} className="sb-hazard-class" data-testid={`hazard-class-${classId}`}>
                  <h3>{view.name}</h3>
                  {view.cautions.length > 0 && (
                    <ul>
                      {view.cautions.map((c) => (
                        <li key={c}>{c}</li>
                      ))}
                    </ul>
                  )}
                </div>
              );
            })}
          </section>

          {mayAct && item.status === 'raised' && (
            <section className="sb-panel">
              <AcknowledgeForm baseVersion={item.version} mutation={actions.acknowledge} />
            </section>
          )}
          <EscalationNotes notes={item.notes} mutation={actions.addNote} />
          {mayAct && item.status === 'acknowledged' && (
            <section className="sb-panel">
              <CloseForm baseVersion={item.version} mutation={actions.close} />
            </section>
          )}
        </>
      )}
      <CautionNote laser />
    </PageShell>
  );
}
