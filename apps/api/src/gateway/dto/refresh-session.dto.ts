import { IsNotEmpty, IsString, MaxLength } from 'class-validator';

export class RefreshSessionDto {
  @IsString()
  @IsNotEmpty({ message: 'accessToken is required' })
  @MaxLength(4096)
  accessToken: string;
}
