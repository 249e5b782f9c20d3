import type { CatapultStatus, SetCatapultStatusRequest } from '@catline/contracts';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsIn, IsOptional } from 'class-validator';
import { ReasonField } from './fields.js';

const STATUSES: CatapultStatus[] = ['up', 'down'];

export class SetCatapultStatusDto implements SetCatapultStatusRequest {
  @ApiProperty({ enum: STATUSES })
  @IsIn(STATUSES, { message: 'status must be up or down' })
  status: CatapultStatus;

  @ApiProperty({ enum: STATUSES, description: 'The status the sender saw.' })
  @IsIn(STATUSES, { message: 'basisStatus must be up or down' })
  basisStatus: CatapultStatus;

  @ReasonField('reason', { optional: true })
  reason?: string;

  @ApiPropertyOptional({
    description:
      'Mark it down although an aircraft is on it or tensioned; asked after the aircraft_on_catapult refusal. The aircraft is suspended.',
  })
  @IsOptional()
  @IsBoolean({ message: 'confirm must be true or false' })
  confirm?: boolean;
}
