import { isDeepStrictEqual } from 'node:util';
import { Injectable, Logger } from '@nestjs/common';
import { scanResultRecord } from '@siteband/shared';
import { DataSource } from 'typeorm';
import { Attachment } from '../attachments/attachment.entity';
import { AuditService } from '../audit/audit.service';
import { IdentifyService } from '../identify/identify.service';
import { lockSyncCounter, takeSyncSeq } from '../sync/sync-sequence';
import { compareIdentifications } from './identification-comparison';
import { RawScanFiles } from './raw-scan-files';
import { recomputeRequest } from './recompute-request';
import { Scan } from './scan.entity';

/** The server-owned fields a recomputation writes on a scan. */
type RecomputedFields = Pick<Scan, 'serverResult' | 'resultMismatch' | 'mismatch' | 'serverRecomputedAt' | 'serverRecomputeError'>;

/**
 * What the audit trail keeps of a recomputation: the outcome, not the whole server result (which stays
 * on the scan and is covered by the scan's own entries when the tablet changes it).
 */
function auditedOutcome(scan: RecomputedFields): Record<string, unknown> {
  return {
    resultMismatch: scan.resultMismatch,
    mismatch: scan.mismatch,
    serverRecomputedAt: scan.serverRecomputedAt?.toISOString() ?? null,
    serverRecomputeError: scan.serverRecomputeError,
  };
}

/** Longest failure message kept on a scan (the column's size). */
const MAX_ERROR_CHARS = 1000;

/**
 * Recomputes one scan's identification from its raw file with the shared code the tablet ran, and
 * stores it beside the tablet's result with the comparison. The tablet's result is never changed.
 */
@Injectable()
export class ScanRecomputeService {
  private readonly logger = new Logger('ScanRecompute');

  constructor(
    private readonly dataSource: DataSource,
    private readonly rawFiles: RawScanFiles,
    private readonly identify: IdentifyService,
    private readonly audit: AuditService,
  ) {}

  /**
   * Recomputes the scan when its raw file is on the server (otherwise does nothing). A failure, and
   * a tablet run that cannot be reproduced, is stored on the scan as `serverRecomputeError`; this only
   * throws when the database itself fails.
   */
  async run(scanId: string): Promise<void> {
    const scan = await this.dataSource.getRepository(Scan).findOneBy({ id: scanId });
    if (!scan || scan.deletedAt) return;
    const raw = await this.rawFiles.attachmentOf(scan);
    if (!raw?.storageKey) return;
    await this.store(scan, await this.recompute(scan, raw));
  }

  private async recompute(scan: Scan, raw: Attachment): Promise<RecomputedFields> {
    const { run, parametersFrom, cannotReproduce } = recomputeRequest(scan);
    if (run === null) {
      // The tablet's settings cannot be run again: a standing answer, not retried at start-up.
      const message = `Cannot reproduce the tablet's processing: ${cannotReproduce}`.slice(0, MAX_ERROR_CHARS);
      this.logger.warn(`Scan ${scan.id}: ${message}`);
      return { serverResult: null, resultMismatch: null, mismatch: null, serverRecomputedAt: new Date(), serverRecomputeError: message };
    }
    let stage = 'read the raw file from object storage';
    try {
      // Checked again against the SHA-256 verified on upload, so a damaged stored copy is never identified.
      const bytes = await this.rawFiles.read(raw);
      stage = 'identify the raw file';
      const { result, processed } = await this.identify.identifyFileWith({ originalname: raw.fileName, buffer: bytes }, run);
      const serverResult = scanResultRecord(result, processed);
      const { mismatch, comparison } = compareIdentifications(scan.result, serverResult, parametersFrom);
      return {
        serverResult,
        resultMismatch: mismatch,
        // Through JSON, like the stored copy, so a re-run can tell it has nothing new.
        mismatch: JSON.parse(JSON.stringify(comparison)) as Record<string, unknown>,
        serverRecomputedAt: new Date(),
        serverRecomputeError: null,
      };
    } catch (error) {
      const message = `Could not ${stage}: ${error instanceof Error ? error.message : String(error)}`.slice(0, MAX_ERROR_CHARS);
      this.logger.warn(`Scan ${scan.id}: ${message}`);
      // serverRecomputedAt stays null, so the next start-up tries again (storage may be back by then).
      return { serverResult: null, resultMismatch: null, mismatch: null, serverRecomputedAt: null, serverRecomputeError: message };
    }
  }

  /**
   * Writes the outcome with a new sync sequence number (not a new version: the tablet's edits do not
   * conflict with it), so pulls carry it. Skipped when the scan changed meanwhile (that change queued
   * its own run), when the stored outcome is already the same (re-running changes nothing), and for a
   * failure while an earlier success still stands (an acknowledgement keeps it).
   */
  private async store(read: Scan, fields: RecomputedFields): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      // Every sync write takes this lock first, so the scan cannot change until this commits.
      const counter = await lockSyncCounter(manager);
      const current = await manager.findOneBy(Scan, { id: read.id });
      if (!current || current.version !== read.version || current.deletedAt) return;
      // A passing failure (storage briefly down) never replaces a standing answer for the same inputs.
      if (fields.serverRecomputedAt === null && current.serverRecomputedAt !== null) return;
      const same =
        isDeepStrictEqual(current.serverResult, fields.serverResult) &&
        isDeepStrictEqual(current.mismatch, fields.mismatch) &&
        current.resultMismatch === fields.resultMismatch &&
        current.serverRecomputeError === fields.serverRecomputeError &&
        (current.serverRecomputedAt === null) === (fields.serverRecomputedAt === null);
      if (same) return;
      const before = auditedOutcome(current);
      Object.assign(current, fields, { syncSeq: await takeSyncSeq(manager, counter) });
      await manager.save(Scan, current);
      // The server's own work: no actor. Taken after the sync counter, as every writer does.
      await this.audit.record(manager, {
        actorId: null,
        actorRole: null,
        entity: 'scan',
        entityId: current.id,
        caseId: current.caseId,
        action: 'recompute',
        before,
        after: auditedOutcome(current),
      });
    });
  }
}
