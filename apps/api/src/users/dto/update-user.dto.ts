import type { UpdateUserRequest } from '@catline/contracts';
import { ApiPropertyOptional, OmitType, PartialType } from '@nestjs/swagger';
import { IsBoolean } from 'class-validator';
import { SkipIfAbsent } from '../../common/validation/skip-if-absent.decorator.js';
import { CreateUserDto } from './create-user.dto.js';

// skipNullProperties: false keeps `null` from blanking required columns; catapultId and squadronId
// stay nullable through their own @IsOptional(). A person stays on their ship.
export class UpdateUserDto
  extends PartialType(OmitType(CreateUserDto, ['email', 'password', 'shipId'] as const), {
    skipNullProperties: false,
  })
  implements UpdateUserRequest
{
  @ApiPropertyOptional()
  @SkipIfAbsent()
  @IsBoolean()
  active?: boolean;
}
