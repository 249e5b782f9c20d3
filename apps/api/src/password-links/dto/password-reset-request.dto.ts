import { EMAIL_MAX_LENGTH, type PasswordResetRequest } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, MaxLength } from 'class-validator';
import { Trim } from '../../common/validation/trim.decorator.js';

export class PasswordResetRequestDto implements PasswordResetRequest {
  @ApiProperty({ example: 'pilot@catline.example' })
  @Trim()
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(EMAIL_MAX_LENGTH)
  email: string;
}
