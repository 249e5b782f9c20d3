import { READINESS_STEPS, type CatapultPosition, type ReadinessStep } from '@catline/contracts';
import { ApiPropertyOptional } from '@nestjs/swagger';
import { ArrayMaxSize, IsArray, IsIn, IsInt, IsNumber, IsOptional, IsPositive, Max, Min } from 'class-validator';
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

  @ApiPropertyOptional({
    enum: READINESS_STEPS,
    isArray: true,
    nullable: true,
    description: "The catapult's own readiness steps, under the rules of the ship's list; null to run the ship's.",
  })
  // Null is a value here: it hands the catapult back to the ship's list.
  @IsOptional()
  @IsArray({ message: 'readinessSteps must be a list of steps, or null for the ship’s list' })
  @ArrayMaxSize(READINESS_STEPS.length)
  @IsIn(READINESS_STEPS, { each: true, message: `readinessSteps must each be one of ${READINESS_STEPS.join(', ')}` })
  readinessSteps?: ReadinessStep[] | null;
}
