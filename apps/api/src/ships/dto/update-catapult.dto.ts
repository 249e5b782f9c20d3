import type { CatapultPosition } from '@catline/contracts';
import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsInt, IsNumber, IsPositive, Max, Min } from 'class-validator';
import { SkipIfAbsent } from '../../common/validation/skip-if-absent.decorator.js';

const POSITIONS: CatapultPosition[] = ['bow', 'waist'];

/** Configuration only: status belongs to the handler's lineup commands, shot counts to launches. */
export class UpdateCatapultDto {
  @ApiPropertyOptional({ enum: POSITIONS })
  @SkipIfAbsent()
  @IsIn(POSITIONS, { message: 'position must be bow or waist' })
  position?: CatapultPosition;

  @ApiPropertyOptional({ minimum: -180, maximum: 180, description: 'Degrees from the heading; negative to port.' })
  @SkipIfAbsent()
  @IsNumber()
  @Min(-180)
  @Max(180)
  axisAngleDeg?: number;

  @ApiPropertyOptional({ description: 'Metres.' })
  @SkipIfAbsent()
  @IsNumber()
  @IsPositive()
  @Max(1000)
  strokeM?: number;

  @ApiPropertyOptional({ description: 'Megajoules at the lowest setting.' })
  @SkipIfAbsent()
  @IsNumber()
  @IsPositive()
  @Max(10_000)
  energyMinMj?: number;

  @ApiPropertyOptional({ description: 'Megajoules at the highest setting; above energyMinMj.' })
  @SkipIfAbsent()
  @IsNumber()
  @IsPositive()
  @Max(10_000)
  energyMaxMj?: number;

  @ApiPropertyOptional({ minimum: 2 })
  @SkipIfAbsent()
  @IsInt()
  @Min(2)
  @Max(1000)
  settingCount?: number;

  @ApiPropertyOptional({ description: 'Seconds from a launch to the next on this catapult.' })
  @SkipIfAbsent()
  @IsInt()
  @Min(1)
  @Max(3600)
  resetIntervalS?: number;

  @ApiPropertyOptional({ minimum: 1, maximum: 9 })
  @SkipIfAbsent()
  @IsInt()
  @Min(1)
  @Max(9)
  pair?: number;
}
