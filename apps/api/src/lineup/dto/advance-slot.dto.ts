import {
  CATAPULT_SETTING,
  GROSS_WEIGHT_LB,
  READINESS_STEPS,
  type AdvanceSlotRequest,
  type ReadinessStep,
} from '@catline/contracts';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsInt, IsOptional, Max, Min } from 'class-validator';
import { VersionField } from './fields.js';

const TARGETS = [...READINESS_STEPS, 'resume'] as const;

export class AdvanceSlotDto implements AdvanceSlotRequest {
  @VersionField('The slot version the step is based on.')
  slotVersion: number;

  @ApiProperty({ enum: TARGETS })
  @IsIn(TARGETS, { message: `to must be one of ${TARGETS.join(', ')}` })
  to: ReadinessStep | 'resume';

  @ApiPropertyOptional({
    minimum: GROSS_WEIGHT_LB.min,
    maximum: GROSS_WEIGHT_LB.max,
    description: 'With weight_agreed: the gross weight agreed with the pilot, lb.',
  })
  @IsOptional()
  @IsInt()
  @Min(GROSS_WEIGHT_LB.min)
  @Max(GROSS_WEIGHT_LB.max)
  agreedWeightLb?: number;

  @ApiPropertyOptional({
    minimum: CATAPULT_SETTING.min,
    maximum: CATAPULT_SETTING.max,
    description:
      "With setting_set: the setting read on the catapult's console; refused unless it is the approved setting for the agreed weight.",
  })
  @IsOptional()
  @IsInt({ message: 'settingReadBack is the whole-number setting read on the console' })
  @Min(CATAPULT_SETTING.min)
  @Max(CATAPULT_SETTING.max)
  settingReadBack?: number;
}
