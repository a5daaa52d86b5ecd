/**
 * The review queue's filters, sort and page, kept in the page's URL query so a link restores them.
 * The same names go to GET /api/review/queue; this is the one place that reads and writes them.
 */
import type { CaseStatus } from '@siteband/shared';
import type { HazardRank } from './types';

export const QUEUE_SORTS = ['startedAt', 'submittedAt', 'siteName', 'inspector', 'status', 'highestHazard'] as const;
export type QueueSort = (typeof QUEUE_SORTS)[number];
export type SortOrder = 'asc' | 'desc';

/** The statuses a supervisor filters by (an open case has not reached the server's review yet, but may be listed). */
export const QUEUE_STATUSES = ['submitted', 'in_review', 'returned', 'accepted', 'open'] as const satisfies readonly CaseStatus[];

export const QUEUE_PAGE_SIZES = [10, 25, 50, 100] as const;

export interface QueueQuery {
  status: CaseStatus[];
  inspectorId: string;
  site: string;
  /** ISO dates (yyyy-mm-dd) on the visit's start. */
  from: string;
  to: string;
  /** Minimum hazard rank; null for any. */
  hazard: HazardRank | null;
  compound: string;
  q: string;
  sort: QueueSort;
  order: SortOrder;
  page: number;
  pageSize: number;
}

/** What the queue shows first: cases waiting for review, the most dangerous first. */
export const DEFAULT_QUEUE_QUERY: QueueQuery = {
  status: ['submitted', 'in_review'],
  inspectorId: '',
  site: '',
  from: '',
  to: '',
  hazard: null,
  compound: '',
  q: '',
  sort: 'highestHazard',
  order: 'desc',
  page: 1,
  pageSize: 25,
};

const DATE = /^\d{4}-\d{2}-\d{2}$/;

function positiveInt(value: string | null, fallback: number, max = Number.MAX_SAFE_INTEGER): number {
  const n = value === null ? NaN : Number(value);
  return Number.isInteger(n) && n >= 1 && n <= max ? n : fallback;
}

/**
 * Reads the query from a URL's search part. Unknown or malformed values fall back to the default,
 * so a hand-edited link still opens the queue. `status=` (empty) means every status.
 */
export function parseQueueQuery(search: string | URLSearchParams): QueueQuery {
  const p = typeof search === 'string' ? new URLSearchParams(search) : search;
  const d = DEFAULT_QUEUE_QUERY;
  const statusParam = p.get('status');
  const status =
    statusParam === null ? d.status : statusParam.split(',').filter((s): s is CaseStatus => (QUEUE_STATUSES as readonly string[]).includes(s));
  const hazardN = Number(p.get('hazard'));
  const sort = p.get('sort');
  const order = p.get('order');
  const pageSize = positiveInt(p.get('pageSize'), d.pageSize, 100);
  const date = (name: string) => {
    const v = p.get(name) ?? '';
    return DATE.test(v) ? v : '';
  };
  return {
    status: [...new Set(status)],
    inspectorId: p.get('inspectorId') ?? '',
    site: p.get('site') ?? '',
    from: date('from'),
    to: date('to'),
    hazard: p.get('hazard') !== null && [1, 2, 3].includes(hazardN) ? (hazardN as HazardRank) : null,
    compound: p.get('compound') ?? '',
    q: p.get('q') ?? '',
    sort: (QUEUE_SORTS as readonly string[]).includes(sort ?? '') ? (sort as QueueSort) : d.sort,
    order: order === 'asc' || order === 'desc' ? order : d.order,
    page: positiveInt(p.get('page'), d.page),
    pageSize,
  };
}

/** Only what differs from the default, so the page's own link stays short. */
export function queueSearchOf(query: QueueQuery): string {
  const p = new URLSearchParams();
  const d = DEFAULT_QUEUE_QUERY;
  if (query.status.join(',') !== d.status.join(',')) p.set('status', query.status.join(','));
  for (const key of ['inspectorId', 'site', 'from', 'to', 'compound', 'q'] as const) {
    const v = query[key].trim();
    if (v) p.set(key, v);
  }
  if (query.hazard !== null) p.set('hazard', String(query.hazard));
  if (query.sort !== d.sort) p.set('sort', query.sort);
  if (query.order !== d.order) p.set('order', query.order);
  if (query.page !== d.page) p.set('page', String(query.page));
  if (query.pageSize !== d.pageSize) p.set('pageSize', String(query.pageSize));
  return p.toString();
}

/**
 * The API's query for these filters: every parameter spelled out (statuses as a comma list; no status
 * ticked means every status, open ones included, which the API must be told), dates as the start and
 * end of the chosen days in UTC. Without page and pageSize for the CSV.
 */
export function apiQueueParams(query: QueueQuery, { paged }: { paged: boolean }): URLSearchParams {
  const p = new URLSearchParams();
  p.set('status', (query.status.length > 0 ? query.status : QUEUE_STATUSES).join(','));
  for (const key of ['inspectorId', 'site', 'compound', 'q'] as const) {
    const v = query[key].trim();
    if (v) p.set(key, v);
  }
  if (query.from) p.set('from', `${query.from}T00:00:00.000Z`);
  if (query.to) p.set('to', `${query.to}T23:59:59.999Z`);
  if (query.hazard !== null) p.set('hazard', String(query.hazard));
  p.set('sort', query.sort);
  p.set('order', query.order);
  if (paged) {
    p.set('page', String(query.page));
    p.set('pageSize', String(query.pageSize));
  }
  return p;
}

/** A change of any filter or of the sort starts again at page 1; a change of page keeps the filters. */
export function withFilters(query: QueueQuery, change: Partial<Omit<QueueQuery, 'page'>>): QueueQuery {
  return { ...query, ...change, page: 1 };
}

/** The number of pages for a total (at least 1). */
export function pageCount(total: number, pageSize: number): number {
  return Math.max(1, Math.ceil(total / pageSize));
}
