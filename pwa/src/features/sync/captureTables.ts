import type { Table } from 'dexie';
import type { SitebandDb } from '../../db/db';
import type { CaptureEntity, CaptureRow } from '../../db/captureRecord';

/** The fields the tablet sends per entity; the server's own fields (inspectorId, caseId...) are left out. */
export const TABLET_FIELDS: Readonly<Record<CaptureEntity, readonly string[]>> = {
  case: ['siteName', 'address', 'latitude', 'longitude', 'locationAccuracyM', 'locationEnteredByHand', 'startedAt', 'weatherNotes', 'accessNotes', 'status'],
  sample: ['caseId', 'label', 'container', 'description', 'locationOnSite', 'observations', 'collectedBy', 'collectedAt', 'sealNumber'],
  handover: ['sampleId', 'from', 'to', 'at', 'sealNumber', 'note'],
  note: ['caseId', 'sampleId', 'text', 'recordedAt'],
  attachment: ['ownerType', 'ownerId', 'kind', 'fileName', 'contentType', 'size', 'sha256', 'caption'],
  scan: ['sampleId', 'technique', 'phase', 'excitationNm', 'recordedAt', 'instrumentCheckId', 'rawAttachmentId', 'rawSha256', 'parsedSummary', 'result', 'inspectorAcknowledgedAt'],
  escalation: ['caseId', 'scanId', 'raisedAt', 'reason', 'hazardClasses'],
  instrumentCheck: ['caseId', 'standardId', 'performedAt', 'passed', 'offsets'],
};

/** True for the entities this tablet keeps and merges from a pull. */
export function isCaptureEntity(entity: string): entity is CaptureEntity {
  return Object.hasOwn(TABLET_FIELDS, entity);
}

/** The Dexie table that holds an entity's rows. */
export function tableFor(db: SitebandDb, entity: CaptureEntity): Table<CaptureRow<unknown>, string> {
  const tables = { case: db.cases, sample: db.samples, handover: db.handovers, note: db.notes, attachment: db.photos, scan: db.scans, escalation: db.escalations, instrumentCheck: db.caseChecks };
  return tables[entity] as unknown as Table<CaptureRow<unknown>, string>;
}

/** Every capture table, the attachments' files and the outbox: the scope of a transaction that writes a record and its change. */
export function captureScope(db: SitebandDb) {
  return [db.cases, db.samples, db.handovers, db.notes, db.photos, db.attachmentBytes, db.scans, db.escalations, db.caseChecks, db.outbox];
}

/** Takes a record off the tablet, an attachment with its file; call inside a transaction of `captureScope`. */
export async function removeRecord(db: SitebandDb, entity: CaptureEntity, id: string): Promise<void> {
  await tableFor(db, entity).delete(id);
  if (entity === 'attachment') await db.attachmentBytes.delete(id);
}

/** The server's data reduced to the fields the tablet sends, so a taken-over record can be pushed again. */
export function tabletData(entity: CaptureEntity, data: Record<string, unknown>): Record<string, unknown> {
  return Object.fromEntries(TABLET_FIELDS[entity].filter((field) => field in data).map((field) => [field, data[field]]));
}

/** The case a record belongs to, read from its data (a hand-over's or scan's case comes from its sample). */
export async function caseIdOf(db: SitebandDb, entity: CaptureEntity, id: string, data: Record<string, unknown>): Promise<string | undefined> {
  if (entity === 'case') return id;
  if (typeof data.caseId === 'string') return data.caseId;
  if ((entity === 'handover' || entity === 'scan') && typeof data.sampleId === 'string') return (await db.samples.get(data.sampleId))?.caseId;
  if (entity === 'attachment' && typeof data.ownerId === 'string') {
    if (data.ownerType === 'case') return data.ownerId;
    if (data.ownerType === 'scan') return (await db.scans.get(data.ownerId))?.caseId;
    return (await db.samples.get(data.ownerId))?.caseId;
  }
  return undefined;
}
