import { PartialType } from '@nestjs/swagger';
import { CreateSquadronDto } from './create-squadron.dto.js';

export class UpdateSquadronDto extends PartialType(CreateSquadronDto, { skipNullProperties: false }) {}
