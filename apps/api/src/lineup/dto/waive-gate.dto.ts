import { SOFT_LAUNCH_GATE_CODES, type SoftLaunchGateCode, type WaiveGateRequest } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { IsIn } from 'class-validator';
import { ReasonField, VersionField } from './fields.js';

export class WaiveGateDto implements WaiveGateRequest {
  @VersionField('The slot version the waiver is based on.')
  slotVersion: number;

  @ApiProperty({ enum: SOFT_LAUNCH_GATE_CODES, description: 'Only a soft gate can be waived; hard limits cannot.' })
  @IsIn(SOFT_LAUNCH_GATE_CODES, { message: `gate must be one of ${SOFT_LAUNCH_GATE_CODES.join(', ')}` })
  gate: SoftLaunchGateCode;

  @ReasonField('reason')
  reason: string;
}
