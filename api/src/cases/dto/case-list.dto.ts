import { ApiProperty } from '@nestjs/swagger';
import { PageQuery, type PageLimits } from '../../common/page-query';

/** `GET /api/cases` pages: 20 cases unless asked, at most 100. */
export const CASES_PAGE: PageLimits = { defaultPageSize: 20, maxPageSize: 100 };

/** `GET /api/cases` query. */
export class CaseListQueryDto extends PageQuery(CASES_PAGE) {}

/** A record for the web views: id, version, server times and the record fields in one flat object. */
export type FlatRecord = Record<string, unknown> & { id: string; version: number };

/** One page of the cases the user may see, newest visit first. */
export class CaseListDto {
  @ApiProperty({ type: Object, isArray: true, description: 'Flat case records (id, version, createdAt, updatedAt and the case fields)' })
  items: FlatRecord[];

  @ApiProperty()
  page: number;

  @ApiProperty()
  pageSize: number;

  @ApiProperty({ description: 'Number of visible cases in all pages' })
  total: number;
}

/** A case with everything recorded below it (deleted records left out; attachments as metadata only). */
export class CaseDetailDto {
  @ApiProperty({ type: Object })
  case: FlatRecord;

  @ApiProperty({ type: Object, isArray: true })
  samples: FlatRecord[];

  @ApiProperty({ type: Object, isArray: true })
  handovers: FlatRecord[];

  @ApiProperty({ type: Object, isArray: true })
  instrumentChecks: FlatRecord[];

  @ApiProperty({ type: Object, isArray: true })
  scans: FlatRecord[];

  @ApiProperty({ type: Object, isArray: true })
  notes: FlatRecord[];

  @ApiProperty({ type: Object, isArray: true })
  escalations: FlatRecord[];

  @ApiProperty({ type: Object, isArray: true })
  attachments: FlatRecord[];
}
