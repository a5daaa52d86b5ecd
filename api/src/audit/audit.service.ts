import { Injectable } from '@nestjs/common';
import type { Role } from '@siteband/shared';
import { DataSource, type EntityManager } from 'typeorm';
import { AUDIT_CHAIN_HEAD_ID, AuditChainHead } from './audit-chain-head.entity';
import { walkChain } from './audit-chain';
import { AuditEntry } from './audit-entry.entity';
import { canonicalJson, entryHash } from './audit-hash';
import type { AuditListDto, AuditListQueryDto, AuditVerifyDto } from './dto/audit.dto';
import { AuditEntryDto } from './dto/audit.dto';

/** What a caller records: who changed which record how, with the record before and after. */
export interface AuditRecordInput {
  /** null for the server's own work. */
  actorId: string | null;
  actorRole: Role | null;
  entity: string;
  entityId: string;
  caseId?: string | null;
  action: string;
  /** The record before (null when created) and after (null when deleted), as clients see it. */
  before: unknown;
  after: unknown;
}

/** Entries read per query while verifying. */
const VERIFY_PAGE = 500;

export const AUDIT_PAGE_SIZE = 50;

/** The append-only, hash-chained audit trail: the only writer of audit_log. */
@Injectable()
export class AuditService {
  constructor(private readonly dataSource: DataSource) {}

  /**
   * Appends one entry in the caller's transaction (`manager` must be inside one). Locks the chain head
   * until that transaction ends, so take it after other locks (the sync counter) to keep one lock order.
   */
  async record(manager: EntityManager, input: AuditRecordInput): Promise<AuditEntry> {
    const head = await manager.findOne(AuditChainHead, { where: { id: AUDIT_CHAIN_HEAD_ID }, lock: { mode: 'pessimistic_write' } });
    if (!head) throw new Error('The audit_chain_head row is missing: run the migrations');
    const entry = manager.create(AuditEntry, {
      seq: head.lastSeq + 1,
      at: new Date(),
      actorId: input.actorId,
      actorRole: input.actorRole,
      entity: input.entity,
      entityId: input.entityId,
      caseId: input.caseId ?? null,
      action: input.action,
      before: input.before === null || input.before === undefined ? null : canonicalJson(input.before),
      after: input.after === null || input.after === undefined ? null : canonicalJson(input.after),
      prevHash: head.lastHash,
    });
    entry.hash = entryHash(entry);
    await manager.insert(AuditEntry, entry);
    await manager.update(AuditChainHead, { id: AUDIT_CHAIN_HEAD_ID }, { lastSeq: entry.seq, lastHash: entry.hash });
    return entry;
  }

  /** Walks the whole chain (`walkChain`) in one read snapshot, so writers meanwhile do not disturb it. */
  verify(): Promise<AuditVerifyDto> {
    return this.dataSource.transaction('REPEATABLE READ', async (manager) => {
      const head = await manager.findOneBy(AuditChainHead, { id: AUDIT_CHAIN_HEAD_ID });
      if (!head) throw new Error('The audit_chain_head row is missing: run the migrations');
      return walkChain(head, VERIFY_PAGE, (afterSeq, limit) =>
        manager
          .createQueryBuilder(AuditEntry, 'entry')
          .where('entry.seq > :afterSeq', { afterSeq })
          .orderBy('entry.seq', 'ASC')
          .limit(limit)
          .getMany(),
      );
    });
  }

  /** One page of entries, newest first, filtered by record or case. */
  async list(query: AuditListQueryDto): Promise<AuditListDto> {
    const page = query.page ?? 1;
    const pageSize = query.pageSize ?? AUDIT_PAGE_SIZE;
    const builder = this.dataSource.getRepository(AuditEntry).createQueryBuilder('entry');
    if (query.entity !== undefined) builder.andWhere('entry.entity = :entity', { entity: query.entity });
    if (query.entityId !== undefined) builder.andWhere('entry.entityId = :entityId', { entityId: query.entityId });
    if (query.caseId !== undefined) builder.andWhere('entry.caseId = :caseId', { caseId: query.caseId });
    const [rows, total] = await builder
      .orderBy('entry.seq', 'DESC')
      .skip((page - 1) * pageSize)
      .take(pageSize)
      .getManyAndCount();
    return { items: rows.map((row) => AuditEntryDto.of(row)), total, page, pageSize };
  }
}
