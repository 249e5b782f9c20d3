import type { CreateSquadronRequest } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsNotEmpty, IsString, Matches, MaxLength } from 'class-validator';
import { Trim } from '../../common/validation/trim.decorator.js';

export class CreateSquadronDto implements CreateSquadronRequest {
  @ApiProperty()
  @Trim()
  @IsString()
  @IsNotEmpty({ message: 'name is required' })
  @MaxLength(120)
  name: string;

  @ApiProperty({ example: 'TDC' })
  @Trim()
  @IsString()
  @Matches(/^[A-Za-z0-9-]{1,12}$/, { message: 'code must be 1 to 12 letters, digits or dashes' })
  code: string;

  @ApiProperty({ description: 'Where the cycle summary goes.' })
  @Trim()
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(254)
  email: string;
}
