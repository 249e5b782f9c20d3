import { GROSS_WEIGHT_LB, READINESS_STEPS, type AdvanceSlotRequest, type ReadinessStep } from '@catline/contracts';
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
}
