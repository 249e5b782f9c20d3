import type { AssignPilotRequest } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { IsInt, Max, Min, ValidateIf } from 'class-validator';
import { MAX_ID, VersionField } from './fields.js';

export class AssignPilotDto implements AssignPilotRequest {
  @VersionField('The slot version the assignment is based on.')
  slotVersion: number;

  @ApiProperty({ type: 'integer', nullable: true, minimum: 1, description: 'An active pilot, or null for none.' })
  @ValidateIf((_, value) => value !== null)
  @IsInt()
  @Min(1)
  @Max(MAX_ID)
  pilotId: number | null;
}
