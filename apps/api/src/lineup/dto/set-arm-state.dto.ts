import { ARM_STATES, type ArmState, type SetArmStateRequest } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { IsIn } from 'class-validator';
import { VersionField } from './fields.js';

export class SetArmStateDto implements SetArmStateRequest {
  @VersionField('The slot version the record is based on.')
  slotVersion: number;

  @ApiProperty({ enum: ARM_STATES })
  @IsIn(ARM_STATES, { message: `armState is one of: ${ARM_STATES.join(', ')}` })
  armState: ArmState;
}
