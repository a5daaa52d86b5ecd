import { Injectable } from '@nestjs/common';
import { hazardRankOf, toCsv } from '@siteband/shared';
import { DataSource, type SelectQueryBuilder } from 'typeorm';
import { Case } from '../cases/case.entity';
import { User } from '../users/user.entity';
import { pageOf } from '../common/page-query';
import { DEFAULT_QUEUE_STATUSES, QUEUE_PAGE, type QueueItemDto, type QueuePageDto, type QueueQueryDto, type QueueSort } from './dto/queue.dto';

/** At most this many likely compounds are listed per queue row. */
const MAX_LISTED_COMPOUNDS = 5;

/**
 * A case's highest hazard: the highest rank of its live scans (kept on each scan when it is pushed), raised
 * to 3 while an escalation of the case is not closed. The ranks themselves are the shared rule.
 */
const HIGHEST_HAZARD_SQL =
  'GREATEST(' +
  'COALESCE((SELECT MAX(s.hazardRank) FROM scans s WHERE s.caseId = c.id AND s.deletedAt IS NULL), 0), ' +
  "IF(EXISTS (SELECT 1 FROM escalations e WHERE e.caseId = c.id AND e.deletedAt IS NULL AND e.status <> 'closed'), 3, 0))";

const SORT_COLUMNS: Record<QueueSort, string> = {
  startedAt: 'c.startedAt',
  submittedAt: 'c.submittedAt',
  siteName: 'c.siteName',
  inspector: 'u.displayName',
  status: 'c.status',
  highestHazard: 'highestHazard',
};

interface QueueRow {
  caseId: string;
  siteName: string;
  address: string | null;
  status: QueueItemDto['status'];
  inspectorId: string;
  inspectorName: string;
  startedAt: Date;
  submittedAt: Date | null;
  highestHazard: string | number;
  samples: string | number;
  scans: string | number;
  openEscalations: string | number;
  version: number;
}

/** The supervisor's review queue: one row per case, filtered, sorted and paged in MariaDB; and its CSV. */
@Injectable()
export class ReviewQueueService {
  constructor(private readonly dataSource: DataSource) {}

  /** One page of the queue. */
  async page(query: QueueQueryDto): Promise<QueuePageDto> {
    const { page, pageSize, offset } = pageOf(query, QUEUE_PAGE);
    const total = await this.filtered(query).getCount();
    const rows = await this.sorted(query)
      .offset(offset)
      .limit(pageSize)
      .getRawMany<QueueRow>();
    return { items: await this.items(rows), total, page, pageSize };
  }

  /** Every matching row (no paging) as CSV, in the queue's order. */
  async csv(query: QueueQueryDto): Promise<string> {
    const items = await this.items(await this.sorted(query).getRawMany<QueueRow>());
    return toCsv(
      ['caseId', 'siteName', 'address', 'status', 'inspector', 'startedAt', 'submittedAt', 'highestHazard', 'hazardRank', 'likelyCompounds', 'samples', 'scans', 'openEscalations'],
      items.map((item) => [
        item.caseId,
        item.siteName,
        item.address,
        item.status,
        item.inspector.displayName,
        item.startedAt,
        item.submittedAt,
        item.highestHazard.label,
        item.highestHazard.rank,
        item.likelyCompounds.map((compound) => compound.name).join('; '),
        item.samples,
        item.scans,
        item.openEscalations,
      ]),
    );
  }

  /** The live cases matching the filters, with their inspector. */
  private filtered(query: QueueQueryDto): SelectQueryBuilder<Case> {
    const builder = this.dataSource
      .createQueryBuilder(Case, 'c')
      .innerJoin(User, 'u', 'u.id = c.inspectorId')
      .where('c.deletedAt IS NULL')
      .andWhere('c.status IN (:...statuses)', { statuses: query.status ?? DEFAULT_QUEUE_STATUSES });
    if (query.inspectorId) builder.andWhere('c.inspectorId = :inspectorId', { inspectorId: query.inspectorId });
    if (query.site) builder.andWhere('c.siteName LIKE :site', { site: containing(query.site) });
    if (query.q) builder.andWhere('(c.siteName LIKE :q OR c.address LIKE :q)', { q: containing(query.q) });
    if (query.from) builder.andWhere('c.startedAt >= :from', { from: new Date(query.from) });
    if (query.to) {
      // A date alone means through the end of that day (UTC).
      if (/^\d{4}-\d{2}-\d{2}$/.test(query.to)) builder.andWhere('c.startedAt < :to', { to: new Date(Date.parse(query.to) + 86_400_000) });
      else builder.andWhere('c.startedAt <= :to', { to: new Date(query.to) });
    }
    if (query.hazard !== undefined) builder.andWhere(`${HIGHEST_HAZARD_SQL} >= :hazard`, { hazard: query.hazard });
    if (query.compound) {
      builder.andWhere(
        'EXISTS (SELECT 1 FROM scans lc WHERE lc.caseId = c.id AND lc.deletedAt IS NULL ' +
          'AND (lc.likelyCompoundId = :compound OR lc.likelyCompoundName LIKE :compoundName))',
        { compound: query.compound, compoundName: containing(query.compound) },
      );
    }
    return builder;
  }

  /** The filtered cases with the queue's columns, in the requested order (ties by submission, then id). */
  private sorted(query: QueueQueryDto): SelectQueryBuilder<Case> {
    const sort = query.sort ?? 'highestHazard';
    const order = (query.order ?? (sort === 'highestHazard' ? 'desc' : 'asc')).toUpperCase() as 'ASC' | 'DESC';
    return this.filtered(query)
      .select('c.id', 'caseId')
      .addSelect('c.siteName', 'siteName')
      .addSelect('c.address', 'address')
      .addSelect('c.status', 'status')
      .addSelect('c.inspectorId', 'inspectorId')
      .addSelect('u.displayName', 'inspectorName')
      .addSelect('c.startedAt', 'startedAt')
      .addSelect('c.submittedAt', 'submittedAt')
      .addSelect('c.version', 'version')
      .addSelect(HIGHEST_HAZARD_SQL, 'highestHazard')
      .addSelect('(SELECT COUNT(*) FROM samples sa WHERE sa.caseId = c.id AND sa.deletedAt IS NULL)', 'samples')
      .addSelect('(SELECT COUNT(*) FROM scans sc WHERE sc.caseId = c.id AND sc.deletedAt IS NULL)', 'scans')
      .addSelect("(SELECT COUNT(*) FROM escalations oe WHERE oe.caseId = c.id AND oe.deletedAt IS NULL AND oe.status <> 'closed')", 'openEscalations')
      .orderBy(SORT_COLUMNS[sort], order)
      .addOrderBy('c.submittedAt', 'ASC')
      .addOrderBy('c.id', 'ASC');
  }

  /** The rows as queue items, with the likely compounds of the listed cases read in one query. */
  private async items(rows: QueueRow[]): Promise<QueueItemDto[]> {
    const compounds = new Map<string, { id: string; name: string }[]>();
    if (rows.length > 0) {
      const found = await this.dataSource
        .createQueryBuilder()
        .select(['s.caseId AS caseId', 's.likelyCompoundId AS id', 's.likelyCompoundName AS name'])
        .from('scans', 's')
        .where('s.caseId IN (:...ids)', { ids: rows.map((row) => row.caseId) })
        .andWhere('s.deletedAt IS NULL AND s.likelyCompoundId IS NOT NULL')
        .orderBy('s.recordedAt', 'ASC')
        .addOrderBy('s.id', 'ASC')
        .getRawMany<{ caseId: string; id: string; name: string | null }>();
      for (const scan of found) {
        const listed = compounds.get(scan.caseId) ?? [];
        if (listed.length < MAX_LISTED_COMPOUNDS && !listed.some((compound) => compound.id === scan.id)) {
          listed.push({ id: scan.id, name: scan.name ?? scan.id });
        }
        compounds.set(scan.caseId, listed);
      }
    }
    return rows.map((row) => ({
      caseId: row.caseId,
      siteName: row.siteName,
      address: row.address,
      status: row.status,
      inspector: { id: row.inspectorId, displayName: row.inspectorName },
      startedAt: new Date(row.startedAt).toISOString(),
      submittedAt: row.submittedAt ? new Date(row.submittedAt).toISOString() : null,
      highestHazard: hazardRankOf(Number(row.highestHazard)),
      likelyCompounds: compounds.get(row.caseId) ?? [],
      samples: Number(row.samples),
      scans: Number(row.scans),
      openEscalations: Number(row.openEscalations),
      version: Number(row.version),
    }));
  }
}

/** A LIKE pattern matching the text anywhere, with LIKE's wildcards in it taken literally. */
function containing(text: string): string {
  return `%${text.replace(/[\\%_]/g, (wildcard) => `\\${wildcard}`)}%`;
}
