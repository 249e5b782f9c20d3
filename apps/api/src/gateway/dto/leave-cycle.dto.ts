import { IsInt, Max, Min } from 'class-validator';

export class LeaveCycleDto {
  @IsInt({ message: 'cycleId must be a cycle id' })
  @Min(1)
  @Max(2_147_483_647)
  cycleId: number;
}
