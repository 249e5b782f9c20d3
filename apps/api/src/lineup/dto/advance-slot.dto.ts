import { READINESS_STEPS, type AdvanceSlotRequest, type ReadinessStep } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { IsIn } from 'class-validator';
import { VersionField } from './fields.js';

const TARGETS = [...READINESS_STEPS, 'resume'] as const;

export class AdvanceSlotDto implements AdvanceSlotRequest {
  @VersionField('The slot version the step is based on.')
  slotVersion: number;

  @ApiProperty({ enum: TARGETS })
  @IsIn(TARGETS, { message: `to must be one of ${TARGETS.join(', ')}` })
  to: ReadinessStep | 'resume';
}
