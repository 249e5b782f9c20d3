import { PAGE_SIZE, type Page, type PageSize } from '@catline/contracts';
import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, IsOptional, Max, Min } from 'class-validator';

export interface PageWindow {
  limit: number;
  offset: number;
}

/**
 * The `?limit=&offset=` of a list whose page size is `size`; a route's query DTO extends it. Both are
 * always set once validated (the defaults fill what the client left out).
 */
export function PageQueryDto(size: PageSize) {
  const limitMessage = `limit must be a whole number from 1 to ${size.max}`;
  class PageQuery {
    @ApiPropertyOptional({
      type: 'integer',
      minimum: 1,
      maximum: size.max,
      default: size.default,
      description: 'How many rows the page holds.',
    })
    @IsOptional()
    @Type(() => Number)
    @IsInt({ message: limitMessage })
    @Min(1, { message: limitMessage })
    @Max(size.max, { message: limitMessage })
    limit: number = size.default;

    @ApiPropertyOptional({ type: 'integer', minimum: 0, default: 0, description: 'How many rows to skip.' })
    @IsOptional()
    @Type(() => Number)
    @IsInt({ message: 'offset must be a whole number from 0' })
    @Min(0, { message: 'offset must be a whole number from 0' })
    offset: number = 0;
  }
  return PageQuery;
}

/** A page from the rows read through `window` (the validated query) and the count of every matching row. */
export function pageOf<T>(window: PageWindow, items: T[], total: number): Page<T> {
  return { items, total, limit: window.limit, offset: window.offset };
}

/** The query of a records list (cycles, people, aircraft). */
export class RecordsPageQueryDto extends PageQueryDto(PAGE_SIZE) {}
