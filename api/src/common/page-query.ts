import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, IsOptional, Max, Min } from 'class-validator';

/** A paged route's page size when the query leaves it out, and the largest it accepts. */
export interface PageLimits {
  defaultPageSize: number;
  maxPageSize: number;
}

/** The page a query asks for, defaults filled in: 1-based `page` and the rows to skip before it. */
export interface PageRequest {
  page: number;
  pageSize: number;
  offset: number;
}

/**
 * The `page` and `pageSize` query fields of a paged route, validated and documented with the route's
 * limits; a route's query class extends it with its own filters. `pageOf` reads them with the defaults.
 */
export function PageQuery(limits: PageLimits) {
  abstract class PageQueryDto {
    @ApiPropertyOptional({ minimum: 1, default: 1 })
    @IsOptional()
    @Type(() => Number)
    @IsInt()
    @Min(1)
    page?: number;

    @ApiPropertyOptional({ minimum: 1, maximum: limits.maxPageSize, default: limits.defaultPageSize })
    @IsOptional()
    @Type(() => Number)
    @IsInt()
    @Min(1)
    @Max(limits.maxPageSize)
    pageSize?: number;
  }
  return PageQueryDto;
}

/** The page asked for, with the route's default page size when the query leaves it out. */
export function pageOf(query: { page?: number; pageSize?: number }, limits: PageLimits): PageRequest {
  const page = query.page ?? 1;
  const pageSize = query.pageSize ?? limits.defaultPageSize;
  return { page, pageSize, offset: (page - 1) * pageSize };
}
