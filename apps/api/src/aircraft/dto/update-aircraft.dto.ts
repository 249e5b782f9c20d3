import { PartialType } from '@nestjs/swagger';
import { CreateAircraftDto } from './create-aircraft.dto.js';

export class UpdateAircraftDto extends PartialType(CreateAircraftDto, { skipNullProperties: false }) {}
