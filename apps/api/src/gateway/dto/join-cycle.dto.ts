import type { JoinCycleRequest } from '@catline/contracts';
import { IsInt, IsOptional, Max, Min } from 'class-validator';

export class JoinCycleDto implements JoinCycleRequest {
  @IsInt({ message: 'cycleId must be a cycle id' })
  @Min(1)
  @Max(2_147_483_647)
  cycleId: number;

  @IsOptional()
  @IsInt({ message: 'sinceVersion must be a whole version number' })
  @Min(0)
  @Max(2_147_483_647)
  sinceVersion?: number;
}
