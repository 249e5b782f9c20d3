import { LANDING_AREA_STATES, type LandingAreaState, type SetLandingAreaRequest } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { IsIn, ValidateIf } from 'class-validator';
import { ReasonField, VersionField } from '../../lineup/dto/fields.js';

export class SetLandingAreaDto implements SetLandingAreaRequest {
  @ApiProperty({ enum: LANDING_AREA_STATES })
  @IsIn(LANDING_AREA_STATES, { message: `state must be one of ${LANDING_AREA_STATES.join(', ')}` })
  state: LandingAreaState;

  /** Required when fouled: what fouls it. */
  @ValidateIf((dto: SetLandingAreaDto, value) => dto.state === 'fouled' || (value !== undefined && value !== null))
  @ReasonField('reason', { optional: false })
  reason?: string | null;

  @VersionField('The cycle version the change is based on.')
  basisVersion: number;
}
