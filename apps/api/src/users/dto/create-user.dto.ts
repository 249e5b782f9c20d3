import {
  type CreateUserRequest,
  EMAIL_MAX_LENGTH,
  NAME_MAX_LENGTH,
  PASSWORD_MAX_LENGTH,
  PASSWORD_MIN_LENGTH,
  ROLES,
  type Role,
} from '@catline/contracts';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsEmail, IsIn, IsInt, IsNotEmpty, IsOptional, IsString, MaxLength, Min, MinLength } from 'class-validator';
import { SkipIfAbsent } from '../../common/validation/skip-if-absent.decorator.js';
import { Trim } from '../../common/validation/trim.decorator.js';
import { PlainText } from '../../common/validation/plain-text.decorator.js';

export class CreateUserDto implements CreateUserRequest {
  @ApiPropertyOptional({
    type: 'integer',
    nullable: true,
    minimum: 1,
    description:
      "The person's ship. Left out, the caller's own; a fleet admin must give it, or null for another fleet admin.",
  })
  @IsOptional()
  @IsInt()
  @Min(1)
  shipId?: number | null;

  @ApiProperty()
  @Trim()
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(EMAIL_MAX_LENGTH)
  email: string;

  @ApiProperty()
  @Trim()
  @IsString()
  @IsNotEmpty({ message: 'name is required' })
  @PlainText()
  @MaxLength(NAME_MAX_LENGTH)
  name: string;

  @ApiProperty({ enum: ROLES })
  @IsIn(ROLES, { message: `role must be one of ${ROLES.join(', ')}` })
  role: Role;

  @ApiPropertyOptional({
    minLength: PASSWORD_MIN_LENGTH,
    description: 'Left out, the person is mailed an invitation link to choose one.',
  })
  @SkipIfAbsent()
  @IsString()
  @MinLength(PASSWORD_MIN_LENGTH, { message: `password must be at least ${PASSWORD_MIN_LENGTH} characters` })
  @MaxLength(PASSWORD_MAX_LENGTH, { message: `password must be at most ${PASSWORD_MAX_LENGTH} characters` })
  password?: string;

  @ApiPropertyOptional({
    type: 'integer',
    nullable: true,
    description: 'Required for a catapult officer, absent otherwise.',
  })
  @IsOptional()
  @IsInt()
  @Min(1)
  catapultId?: number | null;

  @ApiPropertyOptional({ type: 'integer', nullable: true })
  @IsOptional()
  @IsInt()
  @Min(1)
  squadronId?: number | null;
}
