import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsIn, IsInt, IsOptional, IsString, Max, MaxLength, Min } from 'class-validator';

export type SortOrder = 'asc' | 'desc';
export const SORT_ORDERS: SortOrder[] = ['asc', 'desc'];
export const MAX_PAGE_SIZE = 100;
/** 10,000 pages of 100 rows: far past any shop's list, and small enough that the row offset stays exact. */
export const MAX_PAGE = 10_000;

/** Shared list parameters; each list DTO extends it and adds a whitelisted `sort` and its filters. */
export class PageQueryDto {
  @ApiPropertyOptional({ minimum: 1, maximum: MAX_PAGE, default: 1 })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(MAX_PAGE, { message: `page must not be greater than ${MAX_PAGE}; narrow the list with search or filters instead` })
  page: number = 1;

  @ApiPropertyOptional({ minimum: 1, maximum: MAX_PAGE_SIZE, default: 20 })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(MAX_PAGE_SIZE)
  pageSize: number = 20;

  @ApiPropertyOptional({ enum: SORT_ORDERS })
  @IsOptional()
  @IsIn(SORT_ORDERS, { message: 'order must be asc or desc' })
  order?: SortOrder;

  @ApiPropertyOptional({ maxLength: 100, description: 'Matches inside the main text fields.' })
  @IsOptional()
  @IsString()
  @MaxLength(100)
  search?: string;
}

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

export function toPage<T>(items: T[], total: number, query: Pick<PageQueryDto, 'page' | 'pageSize'>): Page<T> {
  return { items, total, page: query.page, pageSize: query.pageSize };
}

export function skipOf(query: Pick<PageQueryDto, 'page' | 'pageSize'>): number {
  return (query.page - 1) * query.pageSize;
}
