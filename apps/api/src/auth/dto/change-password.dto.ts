import type { ChangePasswordRequest } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { IsString, MaxLength, MinLength } from 'class-validator';

// Length rules from the OWASP Authentication Cheat Sheet: at least 12 characters when there is no
// second factor, and a generous maximum so pass phrases fit.
export const PASSWORD_MIN_LENGTH = 12;
export const PASSWORD_MAX_LENGTH = 128;

export class ChangePasswordDto implements ChangePasswordRequest {
  @ApiProperty()
  @IsString()
  @MinLength(1, { message: 'currentPassword is required' })
  @MaxLength(1024)
  currentPassword: string;

  @ApiProperty({ minLength: PASSWORD_MIN_LENGTH, maxLength: PASSWORD_MAX_LENGTH })
  @IsString()
  @MinLength(PASSWORD_MIN_LENGTH, { message: `newPassword must be at least ${PASSWORD_MIN_LENGTH} characters` })
  @MaxLength(PASSWORD_MAX_LENGTH, { message: `newPassword must be at most ${PASSWORD_MAX_LENGTH} characters` })
  newPassword: string;
}
