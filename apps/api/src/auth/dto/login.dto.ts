import { EMAIL_MAX_LENGTH, type LoginRequest } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsString, MaxLength, MinLength } from 'class-validator';
import { Trim } from '../../common/validation/trim.decorator.js';

export class LoginDto implements LoginRequest {
  @ApiProperty({ example: 'admin@catline.example' })
  @Trim()
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(EMAIL_MAX_LENGTH)
  email: string;

  @ApiProperty()
  @IsString()
  @MinLength(1, { message: 'password is required' })
  @MaxLength(1024)
  password: string;
}
