import type { ReturnToPoolRequest } from '@catline/contracts';
import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsOptional } from 'class-validator';
import { ReasonField, VersionField } from './fields.js';

export class ReturnToPoolDto implements ReturnToPoolRequest {
  @VersionField('The slot version the command is based on.')
  slotVersion: number;

  @ReasonField('reason')
  reason: string;

  @ApiPropertyOptional({ description: "From the handler: the aircraft's catapult officer agreed." })
  @IsOptional()
  @IsBoolean()
  catapultOfficerAgreed?: boolean;
}
