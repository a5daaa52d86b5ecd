import { Injectable, NotFoundException } from '@nestjs/common';
import { DataSource, IsNull } from 'typeorm';
import { attachmentSyncHandler } from '../attachments/attachment.sync-handler';
import type { AuthenticatedUser } from '../auth/authenticated-user';
import { siteNoteSyncHandler } from '../notes/site-note.sync-handler';
import { handoverSyncHandler } from '../samples/handover.sync-handler';
import { sampleSyncHandler } from '../samples/sample.sync-handler';
import { escalationSyncHandler } from '../scans/escalation.sync-handler';
import { instrumentCheckSyncHandler } from '../scans/instrument-check.sync-handler';
import { scanSyncHandler } from '../scans/scan.sync-handler';
import type { SyncHandler } from '../sync/sync-handler';
import type { SyncedRecord } from '../sync/synced-record';
import { canSeeCase, whereCaseVisible } from './case-access';
import { Case } from './case.entity';
import { caseSyncHandler } from './case.sync-handler';
import { CASES_PAGE, type CaseDetailDto, type CaseListDto, type CaseListQueryDto, type FlatRecord } from './dto/case-list.dto';
import { pageOf } from '../common/page-query';

/** Reads of cases for the web views (all writes go through sync). */
@Injectable()
export class CasesService {
  constructor(private readonly dataSource: DataSource) {}

  /** One page of the live cases the user may see, by visit start, newest first. */
  async list(query: CaseListQueryDto, user: AuthenticatedUser): Promise<CaseListDto> {
    const { page, pageSize, offset } = pageOf(query, CASES_PAGE);
    const builder = this.dataSource
      .getRepository(Case)
      .createQueryBuilder('r')
      .where('r.deletedAt IS NULL')
      .orderBy('r.startedAt', 'DESC')
      .addOrderBy('r.id', 'ASC')
      .skip(offset)
      .take(pageSize);
    const [rows, total] = await whereCaseVisible(builder, 'r.id', user).getManyAndCount();
    return { items: rows.map((row) => flat(caseSyncHandler, row)), page, pageSize, total };
  }

  /** The case with everything below it; 404 when it does not exist, is deleted or is not visible to the user. */
  async detail(id: string, user: AuthenticatedUser): Promise<CaseDetailDto> {
    const row = await this.dataSource.getRepository(Case).findOneBy({ id, deletedAt: IsNull() });
    if (!row || !canSeeCase(user, row)) throw new NotFoundException(`No case with the id ${id} is visible to you`);
    const below = async <E extends SyncedRecord & { caseId: string }>(handler: SyncHandler<E, object>): Promise<FlatRecord[]> => {
      const rows = await this.dataSource
        .getRepository<SyncedRecord & { caseId: string }>(handler.target)
        .find({ where: { caseId: id, deletedAt: IsNull() }, order: { createdAt: 'ASC', id: 'ASC' } });
      return rows.map((child) => flat(handler, child as E));
    };
    return {
      case: flat(caseSyncHandler, row),
      samples: await below(sampleSyncHandler),
      handovers: await below(handoverSyncHandler),
      instrumentChecks: await below(instrumentCheckSyncHandler),
      scans: await below(scanSyncHandler),
      notes: await below(siteNoteSyncHandler),
      escalations: await below(escalationSyncHandler),
      attachments: await below(attachmentSyncHandler),
    };
  }
}

/** id, version and server times, then the record's fields as its handler shows them. */
function flat<E extends SyncedRecord>(handler: SyncHandler<E, object>, row: E): FlatRecord {
  return {
    id: row.id,
    version: row.version,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    ...handler.toData(row),
  };
}
