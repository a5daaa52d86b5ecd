import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { Readable } from 'node:stream';
import type { INestApplicationContext } from '@nestjs/common';
import { scanResultRecord } from '@siteband/shared';
import { DataSource } from 'typeorm';
import { AttachmentUploadsService } from '../attachments/attachment-uploads.service';
import type { AuthenticatedUser } from '../auth/authenticated-user';
import { Case } from '../cases/case.entity';
import { REPO_ROOT } from '../config/paths';
import { IdentifyService } from '../identify/identify.service';
import { ReviewService } from '../review/review.service';
import { recomputeRequest } from '../scans/recompute-request';
import { ScanRecomputeQueue } from '../scans/scan-recompute.queue';
import { ChangeApplier } from '../sync/change-applier';
import type { SyncEntityName } from '../sync/sync-handler';
import { User } from '../users/user.entity';
import { DEMO_CASES, DEMO_USERS, type DemoCase, type DemoScan } from './seed-data';

/** What a run of the demo-case seed did. */
export interface DemoCasesReport {
  created: string[];
  unchanged: string[];
}

const SPECTRA_DIR = join(REPO_ROOT, 'fixtures', 'spectra');

/** The namespace of the demo's name-based UUIDs (made once at random for Siteband). */
const DEMO_NAMESPACE = '6f1c3a52-9d4e-4b7a-8e21-0c5d7f93a4b6';

/**
 * A stable UUID for a demo record: version 5, SHA-1 of the namespace and the name (RFC 9562, section 5.5),
 * so a second seed run names the same records and the same changes, and adds nothing. (MariaDB's uuid type
 * accepts versions 1–5 only.)
 */
export function demoId(name: string): string {
  const namespace = Buffer.from(DEMO_NAMESPACE.replace(/-/g, ''), 'hex');
  const bytes = createHash('sha1').update(namespace).update(name, 'utf8').digest().subarray(0, 16);
  bytes[6] = (bytes[6] & 0x0f) | 0x50;
  bytes[8] = (bytes[8] & 0x3f) | 0x80;
  const hex = bytes.toString('hex');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}

/**
 * Seeds the demo cases through the API's own code: the inspector's records go through the sync change
 * applier exactly as a tablet's push, the raw files through the upload service (so their SHA-256 is
 * checked and the server recomputes each scan), and the supervisor's decisions through the review service.
 * The tablet's result of each scan is the shared identification of the same file with the default
 * settings, so the server's recomputation agrees with it. A case already past `open` is left alone.
 */
export async function seedDemoCases(app: INestApplicationContext): Promise<DemoCasesReport> {
  const dataSource = app.get(DataSource);
  const inspector = await demoUser(dataSource, 'inspector');
  const supervisor = await demoUser(dataSource, 'supervisor');
  const report: DemoCasesReport = { created: [], unchanged: [] };
  for (const demo of DEMO_CASES) {
    const caseId = demoId(`${demo.key}/case`);
    const existing = await dataSource.getRepository(Case).findOneBy({ id: caseId });
    if (existing && existing.status !== 'open') {
      report.unchanged.push(demo.siteName);
      continue;
    }
    await seedCase(app, demo, inspector, supervisor);
    report.created.push(demo.siteName);
  }
  return report;
}

async function seedCase(app: INestApplicationContext, demo: DemoCase, inspector: AuthenticatedUser, supervisor: AuthenticatedUser): Promise<void> {
  const id = (label: string) => demoId(`${demo.key}/${label}`);
  const caseId = id('case');
  const sampleId = id('sample');
  const applier = app.get(ChangeApplier);
  const identify = app.get(IdentifyService);
  let changeNumber = 0;
  const apply = async (entity: SyncEntityName, recordId: string, data: Record<string, unknown>, baseVersion: number | null = null) => {
    const change = { changeId: id(`change-${changeNumber++}`), entity, op: 'upsert', id: recordId, baseVersion, data };
    const result = await applier.apply(change, { clientId: 'demo-seed', batchId: id('batch') }, inspector);
    const status = result.status === 'duplicate' ? result.firstStatus : result.status;
    if (status !== 'applied') throw new Error(`Demo ${entity} ${recordId} of ${demo.key} was ${status}: ${result.reason ?? ''}`);
  };

  const caseData = {
    siteName: demo.siteName,
    address: demo.address,
    latitude: demo.latitude,
    longitude: demo.longitude,
    locationAccuracyM: 6,
    locationEnteredByHand: false,
    startedAt: demo.startedAt,
    weatherNotes: demo.weatherNotes,
    accessNotes: demo.accessNotes,
    status: 'open',
  };
  await apply('case', caseId, caseData);
  await apply('sample', sampleId, { caseId, ...demo.sample, collectedBy: inspector.displayName });
  if (demo.handover) {
    await apply('handover', id('handover'), { sampleId, from: inspector.displayName, ...demo.handover, sealNumber: demo.sample.sealNumber });
  }

  const files: { attachmentId: string; bytes: Buffer; contentType: string }[] = [];
  const scanIds: string[] = [];
  for (const [index, scan] of demo.scans.entries()) {
    const scanId = id(`scan-${index}`);
    const attachmentId = id(`raw-${index}`);
    const bytes = readFileSync(join(SPECTRA_DIR, scan.file));
    const sha256 = createHash('sha256').update(bytes).digest('hex');
    await apply('scan', scanId, {
      sampleId,
      technique: scan.technique,
      phase: scan.phase,
      ...(scan.excitationNm !== undefined ? { excitationNm: scan.excitationNm } : {}),
      recordedAt: scan.recordedAt,
      rawAttachmentId: attachmentId,
      rawSha256: sha256,
      result: await tabletResult(identify, scan, bytes),
      inspectorAcknowledgedAt: scan.recordedAt,
    });
    await apply('attachment', attachmentId, {
      ownerType: 'scan',
      ownerId: scanId,
      kind: 'raw-scan',
      fileName: scan.file,
      contentType: 'text/csv',
      size: bytes.length,
      sha256,
    });
    files.push({ attachmentId, bytes, contentType: 'text/csv' });
    scanIds.push(scanId);
  }
  await apply('note', id('note'), { caseId, sampleId: null, text: demo.note, recordedAt: demo.sample.collectedAt });
  if (demo.escalation) {
    const { scan, ...escalation } = demo.escalation;
    await apply('escalation', id('escalation'), { caseId, scanId: scanIds[scan], ...escalation });
  }

  const uploads = app.get(AttachmentUploadsService);
  for (const file of files) {
    await uploads.receive(file.attachmentId, inspector, { contentType: file.contentType, contentRange: undefined, body: Readable.from([file.bytes]) });
  }
  // The server's own identification of each raw file, before the supervisor looks at it.
  await app.get(ScanRecomputeQueue).idle();
  if (demo.submit === false) return;
  await apply('case', caseId, { ...caseData, status: 'submitted' }, 1);

  const review = app.get(ReviewService);
  let version = 2;
  for (const decision of demo.decisions) {
    const body = 'scan' in decision ? { kind: decision.kind, scanId: scanIds[decision.scan], comment: decision.comment } : { kind: decision.kind, comment: decision.comment };
    const answer = await review.decide(caseId, { ...body, baseVersion: version }, supervisor);
    version = answer.case.version;
  }
}

/** The result a tablet stores for the scan: the shared identification of the file, with the pipeline's defaults. */
async function tabletResult(identify: IdentifyService, scan: DemoScan, bytes: Buffer): Promise<Record<string, unknown>> {
  // Without a recorded result there is always a run: the pipeline's defaults.
  const { run } = recomputeRequest({ technique: scan.technique, phase: scan.phase, excitationNm: scan.excitationNm ?? null, result: null });
  const { result, processed } = await identify.identifyFileWith({ originalname: scan.file, buffer: bytes }, run!);
  return scanResultRecord(result, processed);
}

async function demoUser(dataSource: DataSource, role: 'inspector' | 'supervisor'): Promise<AuthenticatedUser> {
  const email = DEMO_USERS.find((user) => user.role === role)!.email;
  const user = await dataSource.getRepository(User).findOneBy({ email });
  if (!user) throw new Error(`The demo ${role} ${email} is missing: seed the demo users first`);
  return { id: user.id, email: user.email, displayName: user.displayName, role: user.role };
}
