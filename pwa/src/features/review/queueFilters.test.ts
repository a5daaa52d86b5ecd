import { describe, expect, it } from 'vitest';
import { apiQueueParams, DEFAULT_QUEUE_QUERY, pageCount, parseQueueQuery, queueSearchOf, withFilters } from './queueFilters';

describe('review queue filters in the URL', () => {
  it('opens on the cases waiting for review, most dangerous first, with a bare link', () => {
    expect(parseQueueQuery('')).toEqual(DEFAULT_QUEUE_QUERY);
    expect(queueSearchOf(DEFAULT_QUEUE_QUERY)).toBe('');
  });

  it('restores every filter, the sort and the page from a link', () => {
    const query = {
      ...DEFAULT_QUEUE_QUERY,
      status: ['returned' as const, 'accepted' as const],
      inspectorId: 'u-7',
      site: 'Dock 4',
      from: '2026-11-01',
      to: '2026-11-30',
      hazard: 2 as const,
      compound: 'chlorine',
      q: 'warehouse',
      sort: 'siteName' as const,
      order: 'asc' as const,
      page: 3,
      pageSize: 50,
    };
    const search = queueSearchOf(query);
    expect(search).toContain('status=returned%2Caccepted');
    expect(parseQueueQuery(`?${search}`)).toEqual(query);
  });

  it('keeps "every status" apart from the default', () => {
    const all = { ...DEFAULT_QUEUE_QUERY, status: [] };
    expect(queueSearchOf(all)).toBe('status=');
    expect(parseQueueQuery(queueSearchOf(all)).status).toEqual([]);
    expect(apiQueueParams(all, { paged: true }).get('status')).toBe('submitted,in_review,returned,accepted,open');
  });

  it('falls back to the default for values a hand-edited link got wrong', () => {
    const q = parseQueueQuery('status=submitted,bogus&hazard=9&sort=colour&order=up&page=-2&pageSize=1000&from=yesterday');
    expect(q.status).toEqual(['submitted']);
    expect(q.hazard).toBeNull();
    expect(q.sort).toBe(DEFAULT_QUEUE_QUERY.sort);
    expect(q.order).toBe(DEFAULT_QUEUE_QUERY.order);
    expect(q.page).toBe(1);
    expect(q.pageSize).toBe(DEFAULT_QUEUE_QUERY.pageSize);
    expect(q.from).toBe('');
  });

  it("sends the API whole days in UTC, and no paging for the CSV of every matching row", () => {
    const query = { ...DEFAULT_QUEUE_QUERY, from: '2026-11-01', to: '2026-11-02', site: '  Pier  ', page: 2 };
    const paged = apiQueueParams(query, { paged: true });
    expect(Object.fromEntries(paged)).toEqual({
      status: 'submitted,in_review',
      site: 'Pier',
      from: '2026-11-01T00:00:00.000Z',
      to: '2026-11-02T23:59:59.999Z',
      sort: 'highestHazard',
      order: 'desc',
      page: '2',
      pageSize: '25',
    });
    const csv = apiQueueParams(query, { paged: false });
    expect(csv.has('page')).toBe(false);
    expect(csv.has('pageSize')).toBe(false);
  });

  it('goes back to page 1 when a filter changes', () => {
    expect(withFilters({ ...DEFAULT_QUEUE_QUERY, page: 4 }, { hazard: 3 })).toMatchObject({ page: 1, hazard: 3 });
  });

  it('counts pages, at least one', () => {
    expect(pageCount(0, 25)).toBe(1);
    expect(pageCount(25, 25)).toBe(1);
    expect(pageCount(26, 25)).toBe(2);
  });
});
