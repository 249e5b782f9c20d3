import type { CatapultStatus, SetCatapultStatusRequest } from '@catline/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { IsIn } from 'class-validator';
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
}
