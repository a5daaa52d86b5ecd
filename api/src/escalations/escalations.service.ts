import { randomUUID } from 'node:crypto';
import { BadRequestException, ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { DataSource, In, IsNull, type EntityManager } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import type { AuthenticatedUser } from '../auth/authenticated-user';
import { whereCaseVisible } from '../cases/case-access';
import { Case } from '../cases/case.entity';
import { Escalation } from '../scans/escalation.entity';
import { escalationSyncHandler } from '../scans/escalation.sync-handler';
import { Scan } from '../scans/scan.entity';
import { lockSyncCounter, takeSyncSeq } from '../sync/sync-sequence';
import { User } from '../users/user.entity';
import { pageOf } from '../common/page-query';
import {
  ESCALATIONS_PAGE,
  type AcknowledgeEscalationDto,
  type AddEscalationNoteDto,
  type CloseEscalationDto,
  type EscalationDetailDto,
  type EscalationDto,
  type EscalationListDto,
  type EscalationListQueryDto,
  type EscalationNoteDto,
} from './dto/escalation.dto';
import { likelyCompoundNames } from './escalation-mail';
import { EscalationNote } from './escalation-note.entity';
import { escalationNotePull } from './escalation-note.pull';

/**
 * The safety officer's inbox: read, acknowledge, note and close escalations. Writes bump the version and
 * sync sequence, so tablets pull them, and are recorded in the audit trail in the same transaction.
 */
@Injectable()
export class EscalationsService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly audit: AuditService,
  ) {}

  /** Raised first, then acknowledged, then closed; newest arrival first within each. */
  async list(query: EscalationListQueryDto, user: AuthenticatedUser): Promise<EscalationListDto> {
    const { page, pageSize, offset } = pageOf(query, ESCALATIONS_PAGE);
    const builder = this.dataSource
      .getRepository(Escalation)
      .createQueryBuilder('e')
      .where('e.deletedAt IS NULL')
      .orderBy("FIELD(e.status, 'raised', 'acknowledged', 'closed')", 'ASC')
      .addOrderBy('e.createdAt', 'DESC')
      .addOrderBy('e.id', 'ASC')
      .skip(offset)
      .take(pageSize);
    if (query.status?.length) builder.andWhere('e.status IN (:...statuses)', { statuses: query.status });
    const [rows, total] = await whereCaseVisible(builder, 'e.caseId', user).getManyAndCount();
    return { items: await this.describe(this.dataSource.manager, rows), total, page, pageSize };
  }

  /** One escalation with its notes and case; 404 when missing or not visible. */
  async detail(id: string, user: AuthenticatedUser, manager: EntityManager = this.dataSource.manager): Promise<EscalationDetailDto> {
    const row = await this.visible(manager, id, user);
    const [described] = await this.describe(manager, [row]);
    const caseRow = await manager.findOneByOrFail(Case, { id: row.caseId });
    const inspector = await manager.findOneBy(User, { id: caseRow.inspectorId });
    const notes = await manager.find(EscalationNote, { where: { escalationId: id, deletedAt: IsNull() }, order: { at: 'ASC', id: 'ASC' } });
    return {
      ...described,
      notes: notes.map(noteDto),
      case: {
        id: caseRow.id,
        siteName: caseRow.siteName,
        address: caseRow.address,
        status: caseRow.status,
        startedAt: caseRow.startedAt.toISOString(),
        latitude: caseRow.latitude,
        longitude: caseRow.longitude,
        inspector: { id: caseRow.inspectorId, displayName: inspector?.displayName ?? '' },
      },
    };
  }

  /** Raised → acknowledged, with the action taken; stops the reminders. */
  acknowledge(id: string, dto: AcknowledgeEscalationDto, user: AuthenticatedUser): Promise<EscalationDetailDto> {
    if (dto.actionTaken !== 'ppe_required' && dto.ppeLevel !== undefined) {
      throw new BadRequestException('ppeLevel goes with actionTaken ppe_required only');
    }
    return this.change(id, dto.baseVersion, user, 'acknowledge', (row) => {
      if (row.status !== 'raised') throw new ConflictException(`This escalation is already ${row.status}`);
      row.status = 'acknowledged';
      row.acknowledgedBy = user.id;
      row.acknowledgedByName = user.displayName;
      row.acknowledgedAt = new Date();
      row.actionTaken = dto.actionTaken;
      row.ppeLevel = dto.ppeLevel ?? null;
      row.ackComment = dto.comment ?? null;
      row.nextNotifyAt = null;
    });
  }

  /** Acknowledged → closed. */
  close(id: string, dto: CloseEscalationDto, user: AuthenticatedUser): Promise<EscalationDetailDto> {
    return this.change(id, dto.baseVersion, user, 'close', (row) => {
      if (row.status === 'raised') throw new ConflictException('Acknowledge this escalation before closing it');
      if (row.status === 'closed') throw new ConflictException('This escalation is already closed');
      row.status = 'closed';
      row.closedBy = user.id;
      row.closedAt = new Date();
      row.closeComment = dto.comment;
      row.nextNotifyAt = null;
    });
  }

  /** Adds a note (a permanent record, pulled by the tablet as `escalationNote`). */
  async addNote(id: string, dto: AddEscalationNoteDto, user: AuthenticatedUser): Promise<EscalationNoteDto> {
    return this.dataSource.transaction(async (manager) => {
      const counter = await lockSyncCounter(manager);
      const escalation = await this.visible(manager, id, user);
      const note = manager.create(EscalationNote, {
        id: randomUUID(),
        version: 1,
        syncSeq: await takeSyncSeq(manager, counter),
        deletedAt: null,
        escalationId: escalation.id,
        caseId: escalation.caseId,
        text: dto.text,
        authorId: user.id,
        authorName: user.displayName,
        at: new Date(),
      });
      await manager.save(note);
      await this.audit.record(manager, {
        actorId: user.id,
        actorRole: user.role,
        entity: escalationNotePull.entity,
        entityId: note.id,
        caseId: note.caseId,
        action: 'create',
        before: null,
        after: escalationNotePull.toData(note),
      });
      return noteDto(note);
    });
  }

  /**
   * Locks the sync counter (as every synced write does, first), then the escalation row; checks the
   * version the user saw; applies the change; bumps version and sync sequence.
   */
  private change(
    id: string,
    baseVersion: number,
    user: AuthenticatedUser,
    action: 'acknowledge' | 'close',
    apply: (row: Escalation) => void,
  ): Promise<EscalationDetailDto> {
    return this.dataSource.transaction(async (manager) => {
      const counter = await lockSyncCounter(manager);
      await this.visible(manager, id, user);
      const row = await manager.findOneOrFail(Escalation, { where: { id }, lock: { mode: 'pessimistic_write' } });
      if (row.version !== baseVersion) {
        throw new ConflictException(`The escalation is at version ${row.version}, not ${baseVersion}: someone changed it; reload and try again`);
      }
      const before = structuredClone(escalationSyncHandler.toData(row));
      apply(row);
      row.version += 1;
      row.syncSeq = await takeSyncSeq(manager, counter);
      await manager.save(row);
      await this.audit.record(manager, {
        actorId: user.id,
        actorRole: user.role,
        entity: escalationSyncHandler.entity,
        entityId: row.id,
        caseId: row.caseId,
        action,
        before,
        after: escalationSyncHandler.toData(row),
      });
      return this.detail(id, user, manager);
    });
  }

  /** The escalation when it exists, is live and its case is visible to the user. */
  private async visible(manager: EntityManager, id: string, user: AuthenticatedUser): Promise<Escalation> {
    const builder = manager.getRepository(Escalation).createQueryBuilder('e').where('e.id = :id AND e.deletedAt IS NULL', { id });
    const row = await whereCaseVisible(builder, 'e.caseId', user).getOne();
    if (!row) throw new NotFoundException(`No escalation with the id ${id} is visible to you`);
    return row;
  }

  /** The list view of escalations: their case's site, the inspector and the likely compounds of the scan. */
  private async describe(manager: EntityManager, rows: Escalation[]): Promise<EscalationDto[]> {
    if (!rows.length) return [];
    const cases = new Map((await manager.findBy(Case, { id: In([...new Set(rows.map((row) => row.caseId))]) })).map((row) => [row.id, row]));
    const scanIds = rows.map((row) => row.scanId).filter((scanId): scanId is string => scanId !== null);
    const scans = new Map(scanIds.length ? (await manager.findBy(Scan, { id: In(scanIds) })).map((scan) => [scan.id, scan]) : []);
    const people = new Map((await manager.findBy(User, { id: In([...new Set(rows.map((row) => row.raisedBy))]) })).map((person) => [person.id, person]));
    return rows.map((row) => {
      const caseRow = cases.get(row.caseId);
      const iso = (date: Date | null) => (date ? date.toISOString() : null);
      return {
        id: row.id,
        version: row.version,
        status: row.status,
        caseId: row.caseId,
        scanId: row.scanId,
        siteName: caseRow?.siteName ?? '',
        address: caseRow?.address ?? null,
        inspector: { id: row.raisedBy, displayName: people.get(row.raisedBy)?.displayName ?? '' },
        raisedAt: row.raisedAt.toISOString(),
        receivedAt: row.createdAt.toISOString(),
        reason: row.reason,
        hazardClasses: row.hazardClasses,
        compounds: likelyCompoundNames(row.scanId ? scans.get(row.scanId)?.result : null, 5),
        acknowledgedBy: row.acknowledgedBy,
        acknowledgedByName: row.acknowledgedByName,
        acknowledgedAt: iso(row.acknowledgedAt),
        actionTaken: row.actionTaken,
        ppeLevel: row.ppeLevel,
        ackComment: row.ackComment,
        closedBy: row.closedBy,
        closedAt: iso(row.closedAt),
        closeComment: row.closeComment,
        notifiedCount: row.notifiedCount,
        nextNotifyAt: iso(row.nextNotifyAt),
        secondContactNotifiedAt: iso(row.secondContactNotifiedAt),
      };
    });
  }
}

function noteDto(note: EscalationNote): EscalationNoteDto {
  return {
    id: note.id,
    escalationId: note.escalationId,
    caseId: note.caseId,
    text: note.text,
    authorId: note.authorId,
    authorName: note.authorName,
    at: note.at.toISOString(),
  };
}
