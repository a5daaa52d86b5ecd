import type { CaseStatus } from '@siteband/shared';
import type { CaseListItem } from './useCases';

/** The list's filters: free text, a status, and a day range (ISO dates, inclusive; empty = open-ended). */
export interface CaseFilter {
  text: string;
  status: CaseStatus | 'all';
  from: string;
  to: string;
}

export const NO_FILTER: CaseFilter = { text: '', status: 'all', from: '', to: '' };

/** The cases that match every filter; the text is searched in site name and address, ignoring case. */
export function filterCases(items: readonly CaseListItem[], filter: CaseFilter): CaseListItem[] {
  const text = filter.text.trim().toLocaleLowerCase();
  return items.filter(({ row: { data } }) => {
    if (filter.status !== 'all' && data.status !== filter.status) return false;
    const day = data.startedAt.slice(0, 10);
    if (filter.from && day < filter.from) return false;
    if (filter.to && day > filter.to) return false;
    return !text || `${data.siteName} ${data.address ?? ''}`.toLocaleLowerCase().includes(text);
  });
}
