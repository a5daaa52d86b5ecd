import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type { ApiClient } from '../api/client';
import { downloadFile, type DownloadedFile } from '../api/download';
import { apiQueueParams, type QueueQuery } from './queueFilters';
import type { CaseBundle, DecisionInput, DecisionResult, QueuePage } from './types';

/**
 * Query keys of the review feature. A live event refreshes everything under `all` (LIVE_QUERY_ROOTS);
 * verified files never change, so they sit under their own root and are fetched once.
 */
export const reviewKeys = {
  all: ['review'] as const,
  files: ['reviewFiles'] as const,
  queue: (query: QueueQuery) => [...reviewKeys.all, 'queue', query] as const,
  case: (caseId: string) => [...reviewKeys.all, 'case', caseId] as const,
};

/** One page of the review queue; the previous page stays on screen while the next one loads. */
export function queueQuery(client: ApiClient, query: QueueQuery) {
  return queryOptions({
    queryKey: reviewKeys.queue(query),
    queryFn: ({ signal }) => client.request<QueuePage>(`/api/review/queue?${apiQueueParams(query, { paged: true })}`, { signal }),
    placeholderData: keepPreviousData,
  });
}

/** The whole case for its review page. */
export function caseBundleQuery(client: ApiClient, caseId: string) {
  return queryOptions({
    queryKey: reviewKeys.case(caseId),
    queryFn: ({ signal }) => client.request<CaseBundle>(`/api/review/cases/${encodeURIComponent(caseId)}`, { signal }),
  });
}

/** Records a decision on the case or one of its scans; 409 when the case moved on since baseVersion. */
export function postDecision(client: ApiClient, caseId: string, input: DecisionInput): Promise<DecisionResult> {
  return client.request<DecisionResult>(`/api/review/cases/${encodeURIComponent(caseId)}/decisions`, { method: 'POST', body: input });
}

/** Every queue row matching the filters, as CSV. */
export function downloadQueueCsv(client: ApiClient, query: QueueQuery): Promise<DownloadedFile> {
  return downloadFile(client, `/api/review/queue.csv?${apiQueueParams(query, { paged: false })}`);
}

/** The case report as PDF. */
export function downloadCaseReport(client: ApiClient, caseId: string): Promise<DownloadedFile> {
  return downloadFile(client, `/api/cases/${encodeURIComponent(caseId)}/report.pdf`);
}

/** One scan as JCAMP-DX. */
export function downloadScanJcamp(client: ApiClient, scanId: string): Promise<DownloadedFile> {
  return downloadFile(client, `/api/scans/${encodeURIComponent(scanId)}/spectrum.jdx`);
}

/** The verified bytes of an attachment (a raw scan file or a photo). */
export function downloadAttachment(client: ApiClient, attachmentId: string, signal?: AbortSignal): Promise<DownloadedFile> {
  return downloadFile(client, `/api/attachments/${encodeURIComponent(attachmentId)}/content`, signal);
}
