import type { Page } from '@catline/contracts';
import { type Type } from '@nestjs/common';
import { ApiProperty, ApiSchema } from '@nestjs/swagger';
import { IntProperty } from './fields.js';

/** The view DTO of `Page<T>` for one item view: the schema `<Name>Page`. */
export function PageDto<T>(item: Type<T>, name: string, description: string) {
  @ApiSchema({ name: `${name}Page`, description })
  class PageOfItems implements Page<T> {
    @ApiProperty({ type: () => [item] })
    items: T[];

    @IntProperty({ minimum: 0, description: 'How many rows match in all.' })
    total: number;

    @IntProperty({ minimum: 1 })
    limit: number;

    @IntProperty({ minimum: 0 })
    offset: number;
  }
  return PageOfItems;
}
