import { SUSPEND_REASONS, type SuspendReason, type SuspendReasonRequest } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { IsIn } from 'class-validator';
import { ReasonField, VersionField } from './fields.js';

export class SuspendReasonDto implements SuspendReasonRequest {
  @VersionField('The slot version the reason is based on.')
  slotVersion: number;

  @ApiProperty({ enum: SUSPEND_REASONS })
  @IsIn(SUSPEND_REASONS, {
    message: `reason must be one of ${SUSPEND_REASONS.join(', ')}`,
  })
  reason: SuspendReason;

  /** Required with `other` (the service says so in a sentence); a quick choice says it all. */
  @ReasonField('text', { optional: true })
  text?: string;
}
