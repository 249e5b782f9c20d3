import { DOWN_ON_CATAPULT_OUTCOMES, type DownOnCatapultOutcome, type DownOnCatapultRequest } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { IsIn } from 'class-validator';
import { VersionField } from './fields.js';

export class DownOnCatapultDto implements DownOnCatapultRequest {
  @VersionField('The slot version the event is based on.')
  slotVersion: number;

  @ApiProperty({
    enum: DOWN_ON_CATAPULT_OUTCOMES,
    description: 'pool: back to the deck pool to be fixed and placed again; down: out of the cycle.',
  })
  @IsIn(DOWN_ON_CATAPULT_OUTCOMES, { message: 'outcome must be pool or down' })
  outcome: DownOnCatapultOutcome;
}
