import { IonButton, IonList } from '@ionic/react';
import { useQuery } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { useSearchParams } from 'react-router-dom';
import { CautionNote } from '../components/CautionNote';
import { PageShell } from '../components/PageShell';
import { LiveStatusNote } from '../components/events/LiveStatusNote';
import { NotificationOptIn } from '../components/events/NotificationOptIn';
import { EscalationCard } from '../components/escalations/EscalationCard';
import { useApiClient } from '../features/api/ApiClientContext';
import { escalationListQuery, INBOX_PAGE_SIZE } from '../features/escalations/escalationsApi';
import { ESCALATION_STATUSES, type EscalationStatus } from '../features/escalations/types';
import { useOnlineStatus } from '../features/network/onlineStatus';

type InboxFilter = EscalationStatus | 'all';
const FILTERS: readonly InboxFilter[] = ['all', ...ESCALATION_STATUSES];

function filterOf(value: string | null): InboxFilter {
  return FILTERS.find((f) => f === value) ?? 'all';
}

/** The safety officer's inbox: raised first, newest first, filtered by state in the URL; updates live. */
export default function EscalationsPage() {
  const { t } = useTranslation();
  const client = useApiClient();
  const online = useOnlineStatus();
  const [params, setParams] = useSearchParams();
  const filter = filterOf(params.get('status'));
  const page = Math.max(1, Number.parseInt(params.get('page') ?? '1', 10) || 1);
  const statuses = filter === 'all' ? [] : [filter];
  const list = useQuery({ ...escalationListQuery(client, statuses, page), enabled: online });
  const pages = list.data ? Math.max(1, Math.ceil(list.data.total / INBOX_PAGE_SIZE)) : 1;

  function go(next: { filter?: InboxFilter; page?: number }) {
    const f = next.filter ?? filter;
    const query = new URLSearchParams();
    if (f !== 'all') query.set('status', f);
    const p = next.page ?? 1;
    if (p > 1) query.set('page', String(p));
    setParams(query, { replace: true });
  }

  return (
    <PageShell title={t('pages.escalations.title')}>
      <LiveStatusNote />
      <NotificationOptIn reasonKey="events.optIn.escalationsReason" />
      <section className="sb-panel" aria-labelledby="inbox-heading">
        <h2 id="inbox-heading" className="sb-panel__heading">
          {t('escalations.inbox.heading')}
        </h2>
        <div className="sb-inbox-filters" role="group" aria-label={t('escalations.inbox.filterLabel')}>
          {FILTERS.map((f) => (
            <IonButton
              key={f}
              className="sb-big-button"
              fill={f === filter ? 'solid' : 'outline'}
              aria-pressed={f === filter}
              onClick={() => go({ filter: f })}
              data-testid={`inbox-filter-${f}`}
            >
              {t(`escalations.inbox.filter.${f}`)}
            </IonButton>
          ))}
        </div>
        {!online && <p className="sb-notice">{t('escalations.inbox.offline')}</p>}
        {list.isPending && online && <p className="sb-muted">{t('escalations.loading')}</p>}
        {list.isError && (
          <div className="sb-error" role="alert">
            <p>{t('escalations.loadError', { message: list.error.message })}</p>
            <IonButton fill="outline" onClick={() => void list.refetch()}>
              {t('escalations.retry')}
            </IonButton>
          </div>
        )}
        {list.data && (
          <p className="sb-muted" role="status" data-testid="inbox-count">
            {t('escalations.inbox.count', { count: list.data.total })}
          </p>
        )}
        {list.data && list.data.items.length > 0 && (
          <IonList className="sb-link-list" lines="none">
            {list.data.items.map((item) => (
              <EscalationCard key={item.id} item={item} />
            ))}
          </IonList>
        )}
        {list.data && pages > 1 && (
          <nav className="sb-inbox-pager" aria-label={t('escalations.inbox.pager')}>
            <IonButton fill="outline" disabled={page <= 1} onClick={() => go({ page: page - 1 })}>
              {t('escalations.inbox.previous')}
            </IonButton>
            <span>{t('escalations.inbox.pageOf', { page, pages })}</span>
            <IonButton fill="outline" disabled={page >= pages} onClick={() => go({ page: page + 1 })}>
              {t('escalations.inbox.next')}
            </IonButton>
          </nav>
        )}
      </section>
      <CautionNote />
    </PageShell>
  );
}
