import { plainToInstance } from 'class-transformer';
import { validateSync } from 'class-validator';
import { AuditListQueryDto, AUDIT_PAGE } from '../audit/dto/audit.dto';
import { CaseListQueryDto, CASES_PAGE } from '../cases/dto/case-list.dto';
import { EscalationListQueryDto, ESCALATIONS_PAGE } from '../escalations/dto/escalation.dto';
import { QueueQueryDto, QUEUE_PAGE } from '../review/dto/queue.dto';
import { pageOf, type PageLimits } from './page-query';

/** The messages class-validator gives for a query as the route receives it (strings). */
function errorsOf(dto: new () => object, query: Record<string, string>): string[] {
  return validateSync(plainToInstance(dto, query)).flatMap((error) => Object.values(error.constraints ?? {}));
}

describe('PageQuery', () => {
  const routes: [string, new () => object, PageLimits][] = [
    ['audit', AuditListQueryDto, AUDIT_PAGE],
    ['cases', CaseListQueryDto, CASES_PAGE],
    ['escalations', EscalationListQueryDto, ESCALATIONS_PAGE],
    ['review queue', QueueQueryDto, QUEUE_PAGE],
  ];

  it.each(routes)('%s: takes pages up to its own maximum and refuses beyond it', (_name, dto, limits) => {
    expect(errorsOf(dto, { page: '3', pageSize: String(limits.maxPageSize) })).toEqual([]);
    expect(errorsOf(dto, { pageSize: String(limits.maxPageSize + 1) })).toEqual([`pageSize must not be greater than ${limits.maxPageSize}`]);
    expect(errorsOf(dto, { page: '0' })).toEqual(['page must not be less than 1']);
    expect(errorsOf(dto, { pageSize: '2.5' })).toEqual(['pageSize must be an integer number']);
  });

  it('keeps each route its own limits', () => {
    expect([AUDIT_PAGE, CASES_PAGE, ESCALATIONS_PAGE, QUEUE_PAGE]).toEqual([
      { defaultPageSize: 50, maxPageSize: 200 },
      { defaultPageSize: 20, maxPageSize: 100 },
      { defaultPageSize: 25, maxPageSize: 100 },
      { defaultPageSize: 25, maxPageSize: 100 },
    ]);
  });

  it('fills in the defaults and the rows to skip', () => {
    expect(pageOf({}, CASES_PAGE)).toEqual({ page: 1, pageSize: 20, offset: 0 });
    expect(pageOf({ page: 3 }, AUDIT_PAGE)).toEqual({ page: 3, pageSize: 50, offset: 100 });
    expect(pageOf({ page: 2, pageSize: 7 }, QUEUE_PAGE)).toEqual({ page: 2, pageSize: 7, offset: 7 });
  });
});
