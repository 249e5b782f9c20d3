import type { ConfirmAirPlanRequest } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { IsInt, Max, Min } from 'class-validator';

export class ConfirmAirPlanDto implements ConfirmAirPlanRequest {
  @ApiProperty({ minimum: 0, description: 'The cycle version the preview was looked at against.' })
  @IsInt({ message: 'basisVersion must be a whole version number' })
  @Min(0)
  @Max(2_147_483_647)
  basisVersion: number;
}
