import { useLiveQuery } from 'dexie-react-hooks';
import { isLive, liveOrNull } from '../../db/captureRecord';
import type { CaseCheckRow } from '../../db/caseChecksTable';
import type { EscalationRow } from '../../db/escalationsTable';
import type { PhotoRow } from '../../db/photosTable';
import type { ScanRow } from '../../db/scansTable';
import { captureDb } from '../cases/captureDb';

/** Live: a sample's scans, newest first. */
export function useSampleScans(sampleId: string): ScanRow[] | undefined {
  return useLiveQuery(async () => {
    const rows = await captureDb().scans.filter((s) => s.data.sampleId === sampleId && isLive(s)).toArray();
    return rows.sort((a, b) => b.data.recordedAt.localeCompare(a.data.recordedAt));
  }, [sampleId]);
}

/** Live: one scan with its raw file's attachment and its escalations; null when the tablet has no such scan (or it was deleted here). */
export function useScanRecord(scanId: string): { scan: ScanRow; raw: PhotoRow | null; escalations: EscalationRow[] } | null | undefined {
  return useLiveQuery(async () => {
    const db = captureDb();
    const scan = liveOrNull(await db.scans.get(scanId));
    if (!scan) return null;
    const raw = (await db.photos.get(scan.data.rawAttachmentId)) ?? null;
    const escalations = await db.escalations.filter((e) => e.data.scanId === scanId).toArray();
    return { scan, raw, escalations };
  }, [scanId]);
}

/** Live: a case's copy of an instrument check (what a scan links to); null when there is none. */
export function useCaseCheck(id: string | null): CaseCheckRow | null | undefined {
  return useLiveQuery(async () => (id ? ((await captureDb().caseChecks.get(id)) ?? null) : null), [id]);
}
