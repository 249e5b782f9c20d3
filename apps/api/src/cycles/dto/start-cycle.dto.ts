import type { StartCycleRequest } from '@catline/contracts';
import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsOptional } from 'class-validator';
import { BasisVersionDto } from './basis-version.dto.js';

export class StartCycleDto extends BasisVersionDto implements StartCycleRequest {
  @ApiPropertyOptional({
    description: 'Start although now is outside the launch window; asked after the outside_window warning.',
  })
  @IsOptional()
  @IsBoolean({ message: 'confirmOutsideWindow must be true or false' })
  confirmOutsideWindow?: boolean;
}
