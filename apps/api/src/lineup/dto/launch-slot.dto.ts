import type { LaunchSlotRequest } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { IsString, Matches } from 'class-validator';
import { VersionField } from './fields.js';

export class LaunchSlotDto implements LaunchSlotRequest {
  @VersionField('The slot version the launch is based on.')
  slotVersion: number;

  @ApiProperty({
    description: 'Chosen once per launch intent (8 to 64 letters, digits, - or _); a repeat is answered, not applied.',
  })
  @IsString()
  @Matches(/^[A-Za-z0-9_-]{8,64}$/, { message: 'idempotencyKey must be 8 to 64 letters, digits, - or _' })
  idempotencyKey: string;
}
