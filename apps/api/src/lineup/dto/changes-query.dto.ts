import { CHANGES_PAGE_SIZE } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, Max, Min } from 'class-validator';
import { PageQueryDto } from '../../common/paging/page-query.dto.js';
import { MAX_ID } from './fields.js';

export class ChangesQueryDto extends PageQueryDto(CHANGES_PAGE_SIZE) {
  @ApiProperty({ minimum: 0, description: 'The last version the client holds; changes after it are returned.' })
  @Type(() => Number)
  @IsInt({ message: 'since must be a whole version number' })
  @Min(0)
  @Max(MAX_ID)
  since: number;
}
