import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type { ApiClient } from '../api/client';
import type { AcknowledgeInput, CloseInput, EscalationDetail, EscalationNote, EscalationPage, EscalationStatus } from './types';

/** How many escalations the inbox shows per page. */
export const INBOX_PAGE_SIZE = 25;

/** Query keys of the escalations feature (under the live-events root `escalations`). */
export const escalationKeys = {
  all: ['escalations'] as const,
  list: (statuses: readonly EscalationStatus[], page: number) => [...escalationKeys.all, 'list', statuses.join(','), page] as const,
  detail: (id: string) => [...escalationKeys.all, 'detail', id] as const,
};

/** One page of the inbox: raised first, newest arrival first (the server's order). */
export function escalationListQuery(client: ApiClient, statuses: readonly EscalationStatus[], page: number) {
  const query = new URLSearchParams({ page: String(page), pageSize: String(INBOX_PAGE_SIZE) });
  if (statuses.length > 0) query.set('status', statuses.join(','));
  return queryOptions({
    queryKey: escalationKeys.list(statuses, page),
    queryFn: ({ signal }) => client.request<EscalationPage>(`/api/escalations?${query}`, { signal }),
    placeholderData: keepPreviousData,
  });
}

/** One escalation with its notes and its case. */
export function escalationQuery(client: ApiClient, id: string) {
  return queryOptions({
    queryKey: escalationKeys.detail(id),
    queryFn: ({ signal }) => client.request<EscalationDetail>(`/api/escalations/${encodeURIComponent(id)}`, { signal }),
  });
}

export function acknowledgeEscalation(client: ApiClient, id: string, input: AcknowledgeInput): Promise<EscalationDetail> {
  return client.request<EscalationDetail>(`/api/escalations/${encodeURIComponent(id)}/acknowledge`, { method: 'POST', body: input });
}

export function closeEscalation(client: ApiClient, id: string, input: CloseInput): Promise<EscalationDetail> {
  return client.request<EscalationDetail>(`/api/escalations/${encodeURIComponent(id)}/close`, { method: 'POST', body: input });
}

export function addEscalationNote(client: ApiClient, id: string, text: string): Promise<EscalationNote> {
  return client.request<EscalationNote>(`/api/escalations/${encodeURIComponent(id)}/notes`, { method: 'POST', body: { text } });
}
