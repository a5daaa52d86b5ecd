import { Injectable } from '@nestjs/common';
import type { Role } from '@siteband/shared';
import { DataSource, In, type EntityManager } from 'typeorm';
import { pageOf } from '../common/page-query';
import { AUDIT_CHAIN_HEAD_ID, AuditChainHead } from './audit-chain-head.entity';
import { checkEntries, walkChain } from './audit-chain';
import { AuditEntry } from './audit-entry.entity';
import { canonicalJson, entryHash } from './audit-hash';
import { AUDIT_PAGE, AuditEntryDto, type AuditListDto, type AuditListQueryDto, type AuditVerifyDto } from './dto/audit.dto';

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

/**
 * Characters of record JSON per INSERT of several entries: well below the server's packet limit
 * (MariaDB's max_allowed_packet, 16 MiB by default; from memory), however large each record is.
 */
const INSERT_CHARS = 4_000_000;

/** The entries in order, in groups of at most INSERT_CHARS characters of JSON (an entry over it alone). */
function insertGroups(entries: AuditEntry[]): AuditEntry[][] {
  const groups: AuditEntry[][] = [];
  let chars = Infinity;
  for (const entry of entries) {
    const size = (entry.before?.length ?? 0) + (entry.after?.length ?? 0);
    if (chars + size > INSERT_CHARS) {
      groups.push([]);
      chars = 0;
    }
    groups[groups.length - 1].push(entry);
    chars += size;
  }
  return groups;
}

/** The append-only, hash-chained audit trail: the only writer of audit_log. */
@Injectable()
export class AuditService {
  constructor(private readonly dataSource: DataSource) {}

  /**
   * Appends one entry in the caller's transaction (`manager` must be inside one). Locks the chain head
   * until that transaction ends, so take it after other locks (the sync counter) to keep one lock order.
   */
  async record(manager: EntityManager, input: AuditRecordInput): Promise<AuditEntry> {
    const [entry] = await this.recordAll(manager, [input]);
    return entry;
  }

  /**
   * Appends entries in the given order in the caller's transaction, under one lock of the chain head:
   * each entry names the hash of the one before it, as if they had been recorded one by one.
   */
  async recordAll(manager: EntityManager, inputs: readonly AuditRecordInput[]): Promise<AuditEntry[]> {
    if (inputs.length === 0) return [];
    const head = await manager.findOne(AuditChainHead, { where: { id: AUDIT_CHAIN_HEAD_ID }, lock: { mode: 'pessimistic_write' } });
    if (!head) throw new Error('The audit_chain_head row is missing: run the migrations');
    const at = new Date();
    let last = { seq: head.lastSeq, hash: head.lastHash };
    const entries = inputs.map((input) => {
      const entry = manager.create(AuditEntry, {
        seq: last.seq + 1,
        at,
        actorId: input.actorId,
        actorRole: input.actorRole,
        entity: input.entity,
        entityId: input.entityId,
        caseId: input.caseId ?? null,
        action: input.action,
        before: input.before === null || input.before === undefined ? null : canonicalJson(input.before),
        after: input.after === null || input.after === undefined ? null : canonicalJson(input.after),
        prevHash: last.hash,
      });
      entry.hash = entryHash(entry);
      last = entry;
      return entry;
    });
    for (const group of insertGroups(entries)) await manager.insert(AuditEntry, group);
    await manager.update(AuditChainHead, { id: AUDIT_CHAIN_HEAD_ID }, { lastSeq: last.seq, lastHash: last.hash });
    return entries;
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

  /**
   * Checks one case's entries only (`checkEntries`): each entry's hash recomputed and its link to the
   * entry before it, in one read snapshot. What a case report vouches for; the rest of the chain is
   * `verify`'s.
   */
  verifyCase(caseId: string): Promise<AuditVerifyDto> {
    return this.dataSource.transaction('REPEATABLE READ', async (manager) => {
      const entries = await manager.find(AuditEntry, { where: { caseId }, order: { seq: 'ASC' } });
      const before = entries.filter((entry) => entry.seq > 1).map((entry) => entry.seq - 1);
      const predecessors = new Map<number, string>();
      for (let i = 0; i < before.length; i += VERIFY_PAGE) {
        const rows = await manager.find(AuditEntry, { select: { seq: true, hash: true }, where: { seq: In(before.slice(i, i + VERIFY_PAGE)) } });
        for (const row of rows) predecessors.set(row.seq, row.hash);
      }
      return checkEntries(entries, (seq) => predecessors.get(seq - 1));
    });
  }

  /** One page of entries, newest first, filtered by record or case. */
  async list(query: AuditListQueryDto): Promise<AuditListDto> {
    const { page, pageSize, offset } = pageOf(query, AUDIT_PAGE);
    const builder = this.dataSource.getRepository(AuditEntry).createQueryBuilder('entry');
    if (query.entity !== undefined) builder.andWhere('entry.entity = :entity', { entity: query.entity });
    if (query.entityId !== undefined) builder.andWhere('entry.entityId = :entityId', { entityId: query.entityId });
    if (query.caseId !== undefined) builder.andWhere('entry.caseId = :caseId', { caseId: query.caseId });
    const [rows, total] = await builder
      .orderBy('entry.seq', 'DESC')
      .skip(offset)
      .take(pageSize)
      .getManyAndCount();
    return { items: rows.map((row) => AuditEntryDto.of(row)), total, page, pageSize };
  }
}
