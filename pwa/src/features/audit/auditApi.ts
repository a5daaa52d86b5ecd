import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type { ApiClient } from '../api/client';

/** One audit entry (api/README.md, `GET /api/audit`). */
export interface AuditEntry {
  seq: number;
  at: string;
  actorId: string | null;
  actorRole: string | null;
  entity: string;
  entityId: string;
  caseId: string | null;
  action: string;
  before: unknown;
  after: unknown;
  prevHash: string;
  hash: string;
}

export interface AuditPage {
  items: AuditEntry[];
  total: number;
  page: number;
  pageSize: number;
}

/** `GET /api/audit/verify`: the walk along the whole chain. */
export interface AuditVerification {
  ok: boolean;
  checked: number;
  firstBroken?: { seq: number; reason: string };
}

export const AUDIT_PAGE_SIZE = 25;

/** Query keys of the audit feature (under the live-events root `audit`). */
export const auditKeys = {
  all: ['audit'] as const,
  entries: (page: number) => [...auditKeys.all, 'entries', page] as const,
};

/** Recent entries, newest first. */
export function auditEntriesQuery(client: ApiClient, page: number) {
  const query = new URLSearchParams({ page: String(page), pageSize: String(AUDIT_PAGE_SIZE) });
  return queryOptions({
    queryKey: auditKeys.entries(page),
    queryFn: ({ signal }) => client.request<AuditPage>(`/api/audit?${query}`, { signal }),
    placeholderData: keepPreviousData,
  });
}

/** Walks the chain on the server (on demand: it reads every entry). */
export function verifyAuditChain(client: ApiClient): Promise<AuditVerification> {
  return client.request<AuditVerification>('/api/audit/verify');
}
