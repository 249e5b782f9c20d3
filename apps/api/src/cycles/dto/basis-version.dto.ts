import type { CycleCommandRequest } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { IsInt, Max, Min } from 'class-validator';

export class BasisVersionDto implements CycleCommandRequest {
  @ApiProperty({ minimum: 0, description: 'The cycle version the command was based on.' })
  @IsInt({ message: 'basisVersion must be a whole version number' })
  @Min(0)
  @Max(2_147_483_647)
  basisVersion: number;
}
