import { scanResultRecord, sha256Hex } from '@siteband/shared';
import type { SitebandDb } from '../../db/db';
import type { CaseCheckData } from '../../db/caseChecksTable';
import type { InstrumentCheckRow } from '../../db/instrumentChecksTable';
import type { PhotoData } from '../../db/photosTable';
import type { ScanData } from '../../db/scansTable';
import type { IdentifyOutcome, ScanFile } from '../identify/protocol';
import type { ScanSettings } from '../identify/scanSettings';
import { captureScope } from '../sync/captureTables';
import { recordUpsert } from '../sync/recordChange';
import { escalationData } from './escalationData';
import { checkRawScanFile, rawScanContentType } from './rawScanFile';

/** Everything the scan screen holds when the inspector saves an acknowledged scan. */
export interface NewScan {
  readonly caseId: string;
  readonly sampleId: string;
  readonly settings: ScanSettings;
  readonly file: ScanFile;
  readonly outcome: IdentifyOutcome;
  /** The latest instrument check of the technique; attached only when it passed (a failed one is not in force). */
  readonly check: InstrumentCheckRow | null;
  readonly recordedAt: string;
  readonly acknowledgedAt: string;
}

/** The ids written: the scan, its raw file's attachment, and the escalation when one was raised. */
export interface SavedScan {
  readonly scanId: string;
  readonly attachmentId: string;
  readonly escalationId: string | null;
  readonly instrumentCheckId: string | null;
}

/** The case's copy of a local check, created on first use so the server can link the scan to it. Call inside a capture transaction. */
export async function caseCheckId(db: SitebandDb, caseId: string, check: InstrumentCheckRow | null, now: number): Promise<string | null> {
  if (!check?.pass || check.id === undefined) return null;
  const existing = await db.caseChecks.where('caseId').equals(caseId).filter((row) => row.localCheckId === check.id).first();
  if (existing) return existing.id;
  const id = crypto.randomUUID();
  const data: CaseCheckData = {
    caseId,
    standardId: check.standardId,
    performedAt: new Date(check.checkedAt).toISOString(),
    passed: check.pass,
    offsets: check.bands.map((band) => ({ ...band })),
  };
  await recordUpsert(db, { entity: 'instrumentCheck', id, caseId, data, extra: { localCheckId: check.id } }, now);
  return id;
}

/** Refuses to store a result computed with other settings than the ones saved with it. */
export function assertOutcomeOf(outcome: IdentifyOutcome, settings: ScanSettings): void {
  if (outcome.result.technique !== settings.technique || outcome.result.phase !== settings.phase) {
    throw new TypeError('The result on screen was computed with other scan settings; wait for the new result before saving');
  }
}

/**
 * Saves an acknowledged scan with its raw file, its result and, when the result requires it, the
 * escalation. All of them and their changes go in ONE transaction: a scan without its raw file
 * could never be recomputed, and a hazard found but not escalated is the failure that hurts.
 * Outbox order is check, scan, attachment, escalation, the parents-first order the server needs.
 */
export async function saveScan(db: SitebandDb, scan: NewScan, now = Date.now()): Promise<SavedScan> {
  const { file, outcome, settings } = scan;
  checkRawScanFile(file.name, file.bytes);
  assertOutcomeOf(outcome, settings);
  // Hashed before the transaction: IndexedDB commits a transaction that waits on anything else.
  const sha256 = await sha256Hex(file.bytes);
  const scanId = crypto.randomUUID();
  const attachmentId = crypto.randomUUID();
  const escalation = escalationData(outcome.result, { caseId: scan.caseId, scanId, raisedAt: scan.acknowledgedAt });
  const escalationId = escalation ? crypto.randomUUID() : null;
  const attachment: PhotoData = {
    ownerType: 'scan',
    ownerId: scanId,
    kind: 'raw-scan',
    fileName: file.name.replace(/[/\\\0]/g, '_').slice(0, 255),
    contentType: rawScanContentType(file.name),
    size: file.bytes.byteLength,
    sha256,
  };
  return db.transaction('rw', captureScope(db), async () => {
    const instrumentCheckId = await caseCheckId(db, scan.caseId, scan.check, now);
    const data: ScanData = {
      sampleId: scan.sampleId,
      technique: settings.technique,
      phase: settings.phase,
      excitationNm: settings.technique === 'raman' ? settings.excitationNm : null,
      recordedAt: scan.recordedAt,
      instrumentCheckId,
      rawAttachmentId: attachmentId,
      rawSha256: sha256,
      result: scanResultRecord(outcome.result, outcome.processed),
      inspectorAcknowledgedAt: scan.acknowledgedAt,
    };
    await recordUpsert(db, { entity: 'scan', id: scanId, caseId: scan.caseId, data }, now);
    await recordUpsert(db, { entity: 'attachment', id: attachmentId, caseId: scan.caseId, data: attachment, bytes: file.bytes.slice(0), extra: { receivedBytes: 0, uploadedAt: null } }, now);
    if (escalation && escalationId) await recordUpsert(db, { entity: 'escalation', id: escalationId, caseId: scan.caseId, data: escalation }, now);
    return { scanId, attachmentId, escalationId, instrumentCheckId };
  });
}
