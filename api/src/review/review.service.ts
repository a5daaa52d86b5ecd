import { BadRequestException, ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { randomUUID } from 'node:crypto';
import { decisionsInForce, isScanDecision, type CaseStatus, type DecisionKind } from '@siteband/shared';
import { DataSource, IsNull, type EntityManager } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import type { AuthenticatedUser } from '../auth/authenticated-user';
import { Case } from '../cases/case.entity';
import { caseSyncHandler } from '../cases/case.sync-handler';
import { CasesService } from '../cases/cases.service';
import type { FlatRecord } from '../cases/dto/case-list.dto';
import { EscalationNote } from '../escalations/escalation-note.entity';
import { escalationNotePull } from '../escalations/escalation-note.pull';
import { LibraryService } from '../library/library.service';
import { Scan } from '../scans/scan.entity';
import { lockSyncCounter, takeSyncSeq } from '../sync/sync-sequence';
import type { DecisionRequestDto } from './dto/decision-request.dto';
import type { DecisionDto, DecisionResultDto } from './dto/decision.dto';
import type { CaseBundleDto } from './dto/case-bundle.dto';
import { ReviewDecision } from './review-decision.entity';
import { decisionPull } from './review-decision.pull';

/**
 * The statuses each decision applies to and the status it leaves the case in. The first decision on a
 * submitted case puts it in review; `return` sends it back, `sign_off` accepts it, `reopen` takes an
 * accepted case back into review.
 */
const TRANSITIONS: Record<DecisionKind, { from: readonly CaseStatus[]; to: CaseStatus }> = {
  accept: { from: ['submitted', 'in_review'], to: 'in_review' },
  replace: { from: ['submitted', 'in_review'], to: 'in_review' },
  needs_lab: { from: ['submitted', 'in_review'], to: 'in_review' },
  return: { from: ['submitted', 'in_review'], to: 'returned' },
  sign_off: { from: ['submitted', 'in_review'], to: 'accepted' },
  reopen: { from: ['accepted'], to: 'in_review' },
};

/** The supervisor's decisions on cases, and everything of a case on one page. */
@Injectable()
export class ReviewService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly cases: CasesService,
    private readonly library: LibraryService,
    private readonly audit: AuditService,
  ) {}

  /**
   * Appends one decision and moves the case on, in one transaction with their audit entries: the sync
   * counter is locked first (as every synced write does, before the audit chain head), so decisions and
   * tablet pushes serialise and the case's version is checked against the latest write.
   */
  async decide(caseId: string, body: DecisionRequestDto, user: AuthenticatedUser): Promise<DecisionResultDto> {
    refuseFieldsNotFor(body);
    const replacement = body.kind === 'replace' ? await this.libraryCompound(body.compoundId as string) : null;
    return this.dataSource.transaction(async (manager) => {
      const counter = await lockSyncCounter(manager);
      const row = await manager.findOneBy(Case, { id: caseId, deletedAt: IsNull() });
      if (!row) throw new NotFoundException(`No case with the id ${caseId}`);
      if (row.version !== body.baseVersion) {
        throw new ConflictException(`Case ${caseId} is at version ${row.version}, not ${body.baseVersion}: someone changed it since you looked; reload it and decide again`);
      }
      const transition = TRANSITIONS[body.kind];
      if (!transition.from.includes(row.status)) {
        throw new ConflictException(`Case ${caseId} is ${row.status}: ${body.kind} needs a case that is ${transition.from.join(' or ')}`);
      }

      let compound: { id: string; name: string } | null = replacement;
      if (isScanDecision(body.kind)) {
        const scan = await manager.findOneBy(Scan, { id: body.scanId as string, caseId, deletedAt: IsNull() });
        if (!scan) throw new NotFoundException(`No scan ${body.scanId} in case ${caseId}`);
        if (body.kind === 'accept') {
          if (!scan.likelyCompoundId) {
            throw new ConflictException(`Scan ${scan.id} has no likely compound to accept: replace it with a library compound or mark it needs_lab`);
          }
          compound = { id: scan.likelyCompoundId, name: scan.likelyCompoundName ?? scan.likelyCompoundId };
        }
      }
      if (body.kind === 'sign_off') await assertEveryScanDecided(manager, row);

      const last = await manager
        .createQueryBuilder(ReviewDecision, 'd')
        .select('MAX(d.revision)', 'revision')
        .where('d.caseId = :caseId', { caseId })
        .getRawOne<{ revision: number | null }>();
      const decision = manager.create(ReviewDecision, {
        id: randomUUID(),
        version: 1,
        syncSeq: await takeSyncSeq(manager, counter),
        deletedAt: null,
        caseId,
        scanId: body.scanId ?? null,
        kind: body.kind,
        compoundId: compound?.id ?? null,
        compoundName: compound?.name ?? null,
        reason: body.reason ?? null,
        comment: body.comment ?? null,
        revision: Number(last?.revision ?? 0) + 1,
        decidedBy: user.id,
        decidedByName: user.displayName,
        decidedAt: new Date(),
      });
      await manager.save(ReviewDecision, decision);
      const actor = { actorId: user.id, actorRole: user.role, caseId };
      await this.audit.record(manager, { ...actor, entity: 'decision', entityId: decision.id, action: 'create', before: null, after: decisionPull.toData(decision) });

      const before = structuredClone(caseSyncHandler.toData(row));
      // Every decision is a new version of the case (so a second supervisor working from the same view
      // gets 409) and a new sync sequence number (so tablets pull the new status).
      row.status = transition.to;
      row.version += 1;
      row.syncSeq = await takeSyncSeq(manager, counter);
      await manager.save(Case, row);
      await this.audit.record(manager, { ...actor, entity: 'case', entityId: row.id, action: 'update', before, after: caseSyncHandler.toData(row) });
      return { decision: decisionDto(decision), case: { id: row.id, status: row.status, version: row.version } };
    });
  }

  /** The case with samples (and their hand-overs), scans, notes, attachments, escalations (and their notes) and every decision. */
  async bundle(caseId: string, user: AuthenticatedUser): Promise<CaseBundleDto> {
    const detail = await this.cases.detail(caseId, user);
    const rows = await this.dataSource.getRepository(ReviewDecision).find({ where: { caseId }, order: { revision: 'ASC' } });
    const inForce = decisionsInForce(rows, detail.case.status as CaseStatus);
    const decisions = rows.map((row) => ({ ...decisionDto(row), earlier: inForce.isEarlier(row) }));
    const current: Record<string, DecisionDto> = {};
    for (const [scanId, row] of inForce.current) current[scanId] = decisionDto(row);
    const notes = await this.dataSource.getRepository(EscalationNote).find({ where: { caseId }, order: { at: 'ASC', id: 'ASC' } });
    const { handovers, ...rest } = detail;
    return {
      ...rest,
      samples: detail.samples.map((sample) => ({ ...sample, handovers: handovers.filter((handover: FlatRecord) => handover.sampleId === sample.id) })),
      escalations: detail.escalations.map((escalation) => ({
        ...escalation,
        notes: notes.filter((note) => note.escalationId === escalation.id).map((note) => ({ id: note.id, ...escalationNotePull.toData(note) })),
      })),
      decisions,
      currentDecisions: current,
    };
  }

  /** A compound of the library in force that a scan's identification can be replaced with. */
  private async libraryCompound(id: string): Promise<{ id: string; name: string }> {
    const { library } = await this.library.current();
    const compound = library.compounds.find((candidate) => candidate.id === id);
    if (!compound) throw new BadRequestException(`compoundId ${id} is not a compound of the library in force`);
    return { id: compound.id, name: compound.name };
  }
}

/** Fields a kind of decision does not take are refused rather than silently dropped. */
function refuseFieldsNotFor(body: DecisionRequestDto): void {
  const refused: string[] = [];
  if (!isScanDecision(body.kind) && body.scanId !== undefined) refused.push('scanId (only for accept, replace and needs_lab)');
  if (body.kind !== 'replace' && body.compoundId !== undefined) refused.push('compoundId (only for replace)');
  if (body.reason !== undefined && body.kind !== 'replace' && body.kind !== 'reopen') refused.push('reason (only for replace and reopen)');
  if (refused.length > 0) throw new BadRequestException(`A ${body.kind} decision does not take ${refused.join(', ')}`);
}

/** Sign-off needs a decision on every live scan of the case, made on its latest submission. */
async function assertEveryScanDecided(manager: EntityManager, row: Case): Promise<void> {
  const decisions = await manager.find(ReviewDecision, { where: { caseId: row.id }, select: { id: true, scanId: true, kind: true, revision: true } });
  const { current } = decisionsInForce(decisions, row.status);
  const scans = await manager.find(Scan, { where: { caseId: row.id, deletedAt: IsNull() }, select: { id: true }, order: { recordedAt: 'ASC', id: 'ASC' } });
  const undecided = scans.filter((scan) => !current.has(scan.id));
  if (undecided.length > 0) {
    throw new ConflictException(`Every scan needs a decision on the case as last submitted before sign-off; still undecided: ${undecided.map((scan) => scan.id).join(', ')}`);
  }
}

function decisionDto(row: ReviewDecision): DecisionDto {
  return { id: row.id, ...(decisionPull.toData(row) as Omit<DecisionDto, 'id'>) };
}
