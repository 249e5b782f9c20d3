import { OmitType, PartialType } from '@nestjs/swagger';
import { CreateSquadronDto } from './create-squadron.dto.js';

/** A squadron stays on its ship. */
export class UpdateSquadronDto extends PartialType(OmitType(CreateSquadronDto, ['shipId'] as const), {
  skipNullProperties: false,
}) {}
