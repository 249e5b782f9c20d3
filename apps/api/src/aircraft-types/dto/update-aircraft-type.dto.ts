import { OmitType, PartialType } from '@nestjs/swagger';
import { CreateAircraftTypeDto } from './create-aircraft-type.dto.js';

/** The launch table changes only through PUT /aircraft-types/:id/launch-table. */
export class UpdateAircraftTypeDto extends PartialType(OmitType(CreateAircraftTypeDto, ['launchTable'] as const), {
  skipNullProperties: false,
}) {}
