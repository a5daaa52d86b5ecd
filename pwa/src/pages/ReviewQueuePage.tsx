import { useId, useMemo, useRef, useState } from 'react';
import { IonButton, IonIcon } from '@ionic/react';
import { downloadOutline } from 'ionicons/icons';
import { useQuery } from '@tanstack/react-query';
import { useLocation, useNavigate } from 'react-router-dom';
import { useTranslation } from 'react-i18next';
import { LiveStatusNote } from '../components/events/LiveStatusNote';
import { NotificationOptIn } from '../components/events/NotificationOptIn';
import { PageShell } from '../components/PageShell';
import { QueueFiltersForm } from '../components/review/QueueFiltersForm';
import { QueueCards, QueueTable } from '../components/review/QueueResults';
import '../components/review/review.css';
import { useApiClient } from '../features/api/ApiClientContext';
import { useLibrary } from '../features/library/useLibrary';
import { useOnlineStatus } from '../features/network/onlineStatus';
import { pageCount, parseQueueQuery, QUEUE_PAGE_SIZES, QUEUE_SORTS, queueSearchOf, withFilters, type QueueQuery, type QueueSort, type SortOrder } from '../features/review/queueFilters';
import { downloadQueueCsv, queueQuery } from '../features/review/reviewApi';
import { reviewPaths } from '../features/review/reviewPaths';
import { saveFile } from '../features/review/saveFile';
import { useMediaQuery } from '../features/review/useMediaQuery';
import { formatNumber } from '../features/structure/formatNumber';

/**
 * The query in force: read from the URL while the queue is the page shown. Ionic keeps this page
 * mounted under a case page, whose URL has no query; the queue keeps its own meanwhile.
 */
function useQueueQuery(): [QueueQuery, (next: QueueQuery) => void] {
  const location = useLocation();
  const navigate = useNavigate();
  const last = useRef<string>(location.search);
  if (location.pathname === reviewPaths.queue) last.current = location.search;
  const query = useMemo(() => parseQueueQuery(last.current), [last.current]);
  const setQuery = (next: QueueQuery) => {
    const search = queueSearchOf(next);
    navigate(search ? `${reviewPaths.queue}?${search}` : reviewPaths.queue, { replace: true });
  };
  return [query, setQuery];
}

/** The supervisor's review queue: synced cases, filtered, sorted and paged on the server. */
export default function ReviewQueuePage() {
  const { t, i18n } = useTranslation();
  const client = useApiClient();
  const online = useOnlineStatus();
  const wide = useMediaQuery('(min-width: 1000px)');
  const [query, setQuery] = useQueueQuery();
  const queue = useQuery({ ...queueQuery(client, query), enabled: online });
  const library = useLibrary().data;
  const compoundNames = useMemo(() => (library?.library.compounds ?? []).map((c) => c.name).sort(), [library]);
  const [csvError, setCsvError] = useState<string>();
  const [csvBusy, setCsvBusy] = useState(false);
  const ids = { sort: useId(), order: useId(), size: useId() };

  // Inspectors the queue has shown, to offer in the filter (the server has no inspector list for supervisors).
  const seen = useRef(new Map<string, string>());
  for (const item of queue.data?.items ?? []) seen.current.set(item.inspector.id, item.inspector.displayName);
  const inspectors = [...seen.current].map(([id, displayName]) => ({ id, displayName })).sort((a, b) => a.displayName.localeCompare(b.displayName));

  const data = queue.data;
  const pages = data ? pageCount(data.total, data.pageSize) : 1;
  const sort = (s: QueueSort, order: SortOrder) => setQuery(withFilters(query, { sort: s, order }));

  async function exportCsv() {
    setCsvError(undefined);
    setCsvBusy(true);
    try {
      saveFile(await downloadQueueCsv(client, query), 'review-queue.csv');
    } catch (error) {
      setCsvError(t('review.queue.csvError', { message: error instanceof Error ? error.message : String(error) }));
    } finally {
      setCsvBusy(false);
    }
  }

  return (
    <PageShell title={t('pages.review.title')}>
      {!online && (
        <p className="sb-notice" role="status" data-testid="review-offline">
          {t('review.queue.offline')}
        </p>
      )}
      <section className="sb-panel" aria-labelledby="queue-filters-heading">
        <h2 id="queue-filters-heading" className="sb-panel__heading">
          {t('review.queue.filtersHeading')}
        </h2>
        <QueueFiltersForm query={query} inspectors={inspectors} compoundNames={compoundNames} onApply={(filters) => setQuery(withFilters(query, filters))} />
      </section>

      <section className="sb-panel" aria-labelledby="queue-heading" aria-busy={queue.isFetching}>
        <h2 id="queue-heading" className="sb-panel__heading">
          {t('review.queue.heading')}
        </h2>
        {/* Every live event refreshes the queries under the review root: the queue follows by itself. */}
        <LiveStatusNote />
        <NotificationOptIn reasonKey="events.optIn.reviewReason" />
        <div className="sb-queue-toolbar">
          <div className="sb-field">
            <label htmlFor={ids.sort}>{t('review.queue.sort')}</label>
            <select id={ids.sort} className="sb-select" value={query.sort} onChange={(e) => sort(e.target.value as QueueSort, query.order)}>
              {QUEUE_SORTS.map((s) => (
                <option key={s} value={s}>
                  {t(`review.queue.sortOption.${s}`)}
                </option>
              ))}
            </select>
          </div>
          <div className="sb-field">
            <label htmlFor={ids.order}>{t('review.queue.order')}</label>
            <select id={ids.order} className="sb-select" value={query.order} onChange={(e) => sort(query.sort, e.target.value as SortOrder)}>
              <option value="desc">{t('review.queue.desc')}</option>
              <option value="asc">{t('review.queue.asc')}</option>
            </select>
          </div>
          <IonButton fill="outline" onClick={() => void exportCsv()} disabled={!online || csvBusy} data-testid="queue-csv">
            <IonIcon icon={downloadOutline} slot="start" aria-hidden="true" />
            {t('review.queue.csv')}
          </IonButton>
        </div>
        {csvError && (
          <p className="sb-error" role="alert">
            {csvError}
          </p>
        )}
        {queue.isError && (
          <div className="sb-error" role="alert">
            <p>{t('review.queue.loadError', { message: queue.error.message })}</p>
            <IonButton fill="outline" onClick={() => void queue.refetch()}>
              {t('review.queue.retry')}
            </IonButton>
          </div>
        )}
        {online && queue.isPending && <p className="sb-muted">{t('review.queue.loading')}</p>}
        {data && (
          <p className="sb-muted" role="status" data-testid="queue-count">
            {t('review.queue.count', { count: data.total, total: formatNumber(data.total, i18n.language) })}
          </p>
        )}
        {data && data.items.length === 0 && <p>{t('review.queue.none')}</p>}
        {data &&
          data.items.length > 0 &&
          (wide ? <QueueTable items={data.items} sort={query.sort} order={query.order} onSort={sort} /> : <QueueCards items={data.items} />)}
        {data && (
          <nav className="sb-pager" aria-label={t('review.queue.pages')}>
            <IonButton fill="outline" disabled={query.page <= 1} onClick={() => setQuery({ ...query, page: query.page - 1 })}>
              {t('review.queue.previous')}
            </IonButton>
            <span data-testid="queue-page">{t('review.queue.pageOf', { page: query.page, pages })}</span>
            <IonButton fill="outline" disabled={query.page >= pages || queue.isPlaceholderData} onClick={() => setQuery({ ...query, page: query.page + 1 })}>
              {t('review.queue.next')}
            </IonButton>
            <div className="sb-field">
              <label htmlFor={ids.size}>{t('review.queue.pageSize')}</label>
              <select id={ids.size} className="sb-select sb-select--compact" value={query.pageSize} onChange={(e) => setQuery({ ...query, pageSize: Number(e.target.value), page: 1 })}>
                {QUEUE_PAGE_SIZES.map((n) => (
                  <option key={n} value={n}>
                    {n}
                  </option>
                ))}
              </select>
            </div>
          </nav>
        )}
      </section>
    </PageShell>
  );
}
