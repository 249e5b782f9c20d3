import {
  type CreateSquadronRequest,
  EMAIL_MAX_LENGTH,
  NAME_MAX_LENGTH,
  SQUADRON_CODE_MAX_LENGTH,
  SQUADRON_CODE_PATTERN,
} from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsNotEmpty, IsString, Matches, MaxLength } from 'class-validator';
import { Trim } from '../../common/validation/trim.decorator.js';
import { PlainText } from '../../common/validation/plain-text.decorator.js';
import { ShipChoiceDto } from '../../ships/dto/ship-choice.dto.js';

export class CreateSquadronDto extends ShipChoiceDto implements CreateSquadronRequest {
  @ApiProperty()
  @Trim()
  @IsString()
  @IsNotEmpty({ message: 'name is required' })
  @PlainText()
  @MaxLength(NAME_MAX_LENGTH)
  name: string;

  @ApiProperty({ example: 'CWR' })
  @Trim()
  @IsString()
  @Matches(SQUADRON_CODE_PATTERN, {
    message: `code must be 1 to ${SQUADRON_CODE_MAX_LENGTH} letters, digits or dashes`,
  })
  code: string;

  @ApiProperty({ description: 'Where the cycle summary goes.' })
  @Trim()
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(EMAIL_MAX_LENGTH)
  email: string;
}
