import type { SetLaunchPrerequisiteRequest } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { IsBoolean } from 'class-validator';
import { BasisVersionDto } from './basis-version.dto.js';

export class SetLaunchPrerequisiteDto extends BasisVersionDto implements SetLaunchPrerequisiteRequest {
  @ApiProperty({ description: 'True: the prerequisite is done; false: take the tick back.' })
  @IsBoolean({ message: 'ticked must be true or false' })
  ticked: boolean;
}
