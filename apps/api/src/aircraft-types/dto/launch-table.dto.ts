import { applyDecorators } from '@nestjs/common';
import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { ArrayMaxSize, ArrayMinSize, IsArray, ValidateNested } from 'class-validator';
import { LaunchTableRowDto } from './launch-table-row.dto.js';

/** The rules of a launch table field, shared by the type's creation and PUT launch-table. */
export const LaunchTableRows = () =>
  applyDecorators(
    ApiProperty({ type: [LaunchTableRowDto], description: 'Ordered by strictly increasing gross weight.' }),
    IsArray(),
    ArrayMinSize(2, { message: '$property needs at least two rows to interpolate between' }),
    ArrayMaxSize(100),
    ValidateNested({ each: true }),
    Type(() => LaunchTableRowDto),
  );

export class LaunchTableDto {
  @LaunchTableRows()
  rows: LaunchTableRowDto[];
}
