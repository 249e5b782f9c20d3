import { type ChangePasswordRequest, PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { IsString, MaxLength, MinLength } from 'class-validator';

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
