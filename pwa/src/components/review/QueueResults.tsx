import { IonItem, IonLabel, IonList, IonRouterLink } from '@ionic/react';
import { useTranslation } from 'react-i18next';
import type { QueueSort, SortOrder } from '../../features/review/queueFilters';
import { reviewPaths } from '../../features/review/reviewPaths';
import type { QueueItem } from '../../features/review/types';
import { formatDateTime } from '../../i18n/format';
import { HazardBadge } from './HazardBadge';

function when(iso: string | null, language: string): string {
  return iso ? formatDateTime(Date.parse(iso), language) : '—';
}

function Compounds({ item }: { item: QueueItem }) {
  const { t } = useTranslation();
  return <>{item.likelyCompounds.length > 0 ? item.likelyCompounds.map((c) => c.name).join(', ') : t('review.queue.noCompounds')}</>;
}

/** The queue as large cards, one target each, for a tablet held in the hand. */
export function QueueCards({ items }: { items: readonly QueueItem[] }) {
  const { t, i18n } = useTranslation();
  return (
    <IonList className="sb-link-list sb-case-list" lines="none" data-testid="queue-cards">
      {items.map((item) => (
        <IonItem key={item.caseId} routerLink={reviewPaths.case(item.caseId)} detail button className="sb-link-item sb-queue-card" data-testid={`queue-item-${item.caseId}`}>
          <IonLabel>
            <h2>{item.siteName}</h2>
            <p className="sb-case-card__meta">
              <span className={`sb-pill sb-status--${item.status}`}>{t(`capture.status.${item.status}`)}</span>
              <HazardBadge rank={item.highestHazard.rank} />
              {item.openEscalations > 0 && <span className="sb-pill sb-hazard sb-hazard--3">{t('review.queue.openEscalations', { count: item.openEscalations })}</span>}
            </p>
            <p>{t('review.queue.cardLine', { inspector: item.inspector.displayName, started: when(item.startedAt, i18n.language) })}</p>
            <p>
              <Compounds item={item} />
            </p>
            <p className="sb-muted">{t('review.queue.counts', { samples: t('review.queue.samples', { count: item.samples }), scans: t('review.queue.scans', { count: item.scans }) })}</p>
          </IonLabel>
        </IonItem>
      ))}
    </IonList>
  );
}

const COLUMNS: readonly { key: string; sort?: QueueSort }[] = [
  { key: 'site', sort: 'siteName' },
  { key: 'status', sort: 'status' },
  { key: 'inspector', sort: 'inspector' },
  { key: 'started', sort: 'startedAt' },
  { key: 'submitted', sort: 'submittedAt' },
  { key: 'hazard', sort: 'highestHazard' },
  { key: 'compounds' },
  { key: 'scans' },
];

export interface QueueTableProps {
  items: readonly QueueItem[];
  sort: QueueSort;
  order: SortOrder;
  onSort: (sort: QueueSort, order: SortOrder) => void;
}

/** The queue as a table for a desktop, each sortable column header a button. */
export function QueueTable({ items, sort, order, onSort }: QueueTableProps) {
  const { t, i18n } = useTranslation();
  return (
    <div className="sb-table-wrap">
      <table className="sb-table sb-queue-table" data-testid="queue-table">
        <caption className="sb-visually-hidden">{t('review.queue.tableCaption')}</caption>
        <thead>
          <tr>
            {COLUMNS.map((c) => {
              const active = c.sort === sort;
              return (
                <th key={c.key} scope="col" aria-sort={active ? (order === 'asc' ? 'ascending' : 'descending') : undefined}>
                  {c.sort ? (
                    <button
                      type="button"
                      className="sb-sort-button"
                      onClick={() => onSort(c.sort!, active && order === 'desc' ? 'asc' : 'desc')}
                      aria-label={t('review.queue.sortBy', { column: t(`review.queue.col.${c.key}`) })}
                    >
                      {t(`review.queue.col.${c.key}`)}
                      <span aria-hidden="true">{active ? (order === 'asc' ? ' ▲' : ' ▼') : ''}</span>
                    </button>
                  ) : (
                    t(`review.queue.col.${c.key}`)
                  )}
                </th>
              );
            })}
          </tr>
        </thead>
        <tbody>
          {items.map((item) => (
            <tr key={item.caseId} data-testid={`queue-item-${item.caseId}`}>
              <td>
                <IonRouterLink routerLink={reviewPaths.case(item.caseId)} className="sb-queue-link">
                  {item.siteName}
                </IonRouterLink>
                {item.address && <div className="sb-muted">{item.address}</div>}
              </td>
              <td>
                <span className={`sb-pill sb-status--${item.status}`}>{t(`capture.status.${item.status}`)}</span>
              </td>
              <td>{item.inspector.displayName}</td>
              <td>{when(item.startedAt, i18n.language)}</td>
              <td>{when(item.submittedAt, i18n.language)}</td>
              <td>
                <HazardBadge rank={item.highestHazard.rank} />
                {item.openEscalations > 0 && <div>{t('review.queue.openEscalations', { count: item.openEscalations })}</div>}
              </td>
              <td>
                <Compounds item={item} />
              </td>
              <td>{t('review.queue.counts', { samples: t('review.queue.samples', { count: item.samples }), scans: t('review.queue.scans', { count: item.scans }) })}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
