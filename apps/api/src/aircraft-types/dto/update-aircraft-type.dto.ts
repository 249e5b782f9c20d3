import { AIRCRAFT_TYPE_RANGES as RANGES } from '@catline/contracts';
import { ApiPropertyOptional, OmitType, PartialType } from '@nestjs/swagger';
import { IsNumber, Max, Min, ValidateIf } from 'class-validator';
import { CreateAircraftTypeDto } from './create-aircraft-type.dto.js';

/**
 * The launch table changes only through PUT /aircraft-types/:id/launch-table; a type stays on its ship. The
 * maximum end speed may be left out but never cleared: a type without it could not be launched.
 */
export class UpdateAircraftTypeDto extends PartialType(
  OmitType(CreateAircraftTypeDto, ['launchTable', 'maxEndSpeedKt', 'shipId'] as const),
  { skipNullProperties: false },
) {
  @ApiPropertyOptional({ description: 'The highest end speed the airframe takes (overstress), knots.' })
  @ValidateIf((_, value) => value !== undefined)
  @IsNumber({}, { message: 'maxEndSpeedKt must be a number of knots' })
  @Min(RANGES.maxEndSpeedKt.min)
  @Max(RANGES.maxEndSpeedKt.max)
  maxEndSpeedKt?: number;
}
