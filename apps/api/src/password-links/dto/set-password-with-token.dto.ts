import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH, type SetPasswordWithTokenRequest } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { IsString, Matches, MaxLength, MinLength } from 'class-validator';

export class SetPasswordWithTokenDto implements SetPasswordWithTokenRequest {
  @ApiProperty({ description: 'The token from the link in the mail (after `#token=`).' })
  @IsString()
  @MaxLength(100)
  @Matches(/^[A-Za-z0-9_-]+$/, { message: 'token must be the token from the link, as it is' })
  token: string;

  @ApiProperty({ minLength: PASSWORD_MIN_LENGTH, maxLength: PASSWORD_MAX_LENGTH })
  @IsString()
  @MinLength(PASSWORD_MIN_LENGTH, { message: `newPassword must be at least ${PASSWORD_MIN_LENGTH} characters` })
  @MaxLength(PASSWORD_MAX_LENGTH, { message: `newPassword must be at most ${PASSWORD_MAX_LENGTH} characters` })
  newPassword: string;
}
