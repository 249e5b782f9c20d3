import type { SetDeckStatusRequest } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { IsBoolean, ValidateIf } from 'class-validator';
import { IdField, ReasonField, VersionField } from '../../lineup/dto/fields.js';

export class SetDeckStatusDto implements SetDeckStatusRequest {
  @IdField('The catapult of the cycle’s ship.')
  catapultId: number;

  @ApiProperty({ description: 'True: clear to launch; false: not clear, for the reason given.' })
  @IsBoolean({ message: 'clear must be true or false' })
  clear: boolean;

  /** Required when not clear: what keeps the deck ahead of the catapult from launching. */
  @ValidateIf((dto: SetDeckStatusDto, value) => dto.clear === false || (value !== undefined && value !== null))
  @ReasonField('reason', { optional: false })
  reason?: string | null;

  @VersionField('The cycle version the change is based on.')
  basisVersion: number;
}
