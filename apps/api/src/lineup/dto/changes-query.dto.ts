import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, Max, Min } from 'class-validator';
import { MAX_ID } from './fields.js';

export class ChangesQueryDto {
  @ApiProperty({ minimum: 0, description: 'The last version the client holds; changes after it are returned.' })
  @Type(() => Number)
  @IsInt({ message: 'since must be a whole version number' })
  @Min(0)
  @Max(MAX_ID)
  since: number;
}
