import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Library, Phase, Technique } from '@siteband/shared';
import { useApiClient } from '../api/ApiClientContext';
import { isApiStatus } from '../api/apiError';
import type { IdentifyClient } from '../identify/identifyClient';
import type { IdentifyOutcome } from '../identify/protocol';
import { DEFAULT_PROCESSING, type ScanSettings } from '../identify/scanSettings';
import { useOnlineStatus } from '../network/onlineStatus';
import { caseBundleQuery, downloadAttachment, postDecision, reviewKeys } from './reviewApi';
import type { DecisionInput, QueuePage } from './types';

/** The case's review bundle, online only. */
export function useCaseBundle(caseId: string) {
  const client = useApiClient();
  const online = useOnlineStatus();
  return useQuery({ ...caseBundleQuery(client, caseId), enabled: online && caseId !== '' });
}

/** Records a decision; afterwards the case and the queue are read again. */
export function useDecide(caseId: string) {
  const client = useApiClient();
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: DecisionInput) => postDecision(client, caseId, input),
    onSettled: () => queryClient.invalidateQueries({ queryKey: reviewKeys.all }),
  });
}

/** True when a decision was refused because someone else decided first (the case's version moved on). */
export function isStaleDecision(error: unknown): boolean {
  return isApiStatus(error, 409);
}

/** How a saved scan was taken, as the identify worker needs it to read its raw file again. */
export interface RawScanInput {
  rawAttachmentId: string;
  technique: Technique;
  phase: Phase;
  excitationNm: number | null;
  /** The scan was taken on a diamond ATR (from the stored result's processing). */
  atr: boolean;
  /** The stored result's `processing`, run again as recorded; null when the tablet recorded none (the defaults then). */
  processing: unknown;
}

/** The scan settings of a saved scan. */
export function scanSettingsOf(scan: RawScanInput): ScanSettings {
  return { technique: scan.technique, phase: scan.phase, atr: scan.atr, excitationNm: scan.excitationNm ?? 785 };
}

/**
 * A saved scan's raw file from the server, imported and processed in the identify worker (the same
 * code the tablet ran), for its plot. Kept for the session: the file never changes once verified.
 */
export function useRawScanOutcome(scan: RawScanInput | null, worker: () => IdentifyClient, library: Library | undefined) {
  const client = useApiClient();
  return useQuery({
    queryKey: [...reviewKeys.files, 'raw', scan?.rawAttachmentId, scan && scanSettingsOf(scan), scan?.processing, library?.version.contentHash] as const,
    enabled: scan !== null,
    staleTime: Infinity,
    queryFn: async ({ signal }): Promise<IdentifyOutcome> => {
      const file = await downloadAttachment(client, scan!.rawAttachmentId, signal);
      const bytes = await file.blob.arrayBuffer();
      // Plotted as the tablet processed it, with the settings the inspector tuned.
      const processing = scan!.processing === null ? DEFAULT_PROCESSING : { recorded: scan!.processing };
      return worker().identify({ name: file.fileName ?? scan!.rawAttachmentId, bytes }, scanSettingsOf(scan!), processing, library);
    },
  });
}

/** An attachment's bytes (a photo) as a blob, for the session. */
export function useAttachmentBlob(attachmentId: string) {
  const client = useApiClient();
  return useQuery({
    queryKey: [...reviewKeys.files, 'attachment', attachmentId] as const,
    staleTime: Infinity,
    queryFn: async ({ signal }) => (await downloadAttachment(client, attachmentId, signal)).blob,
  });
}

/**
 * The inspector of a case as the queue listed them (the case bundle names the inspector by id only);
 * undefined when the case was opened without the queue, e.g. from a link.
 */
export function useQueuedInspector(caseId: string): { id: string; displayName: string } | undefined {
  const queryClient = useQueryClient();
  for (const [, page] of queryClient.getQueriesData<QueuePage>({ queryKey: [...reviewKeys.all, 'queue'] })) {
    const item = page?.items.find((i) => i.caseId === caseId);
    if (item) return item.inspector;
  }
  return undefined;
}
