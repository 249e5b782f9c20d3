import { AUDIT_ACTIONS, type AuditAction } from '@catline/contracts';
import { ApiPropertyOptional, IntersectionType } from '@nestjs/swagger';
import { IsEmail, IsIn, IsISO8601, IsOptional } from 'class-validator';
import { RecordsPageQueryDto } from '../../common/paging/page-query.dto.js';
import { QueryId } from '../../common/validation/query-id.decorator.js';

/** Which entries: every filter given must hold. */
export class AuditFilterDto {
  @ApiPropertyOptional({ enum: AUDIT_ACTIONS })
  @IsOptional()
  @IsIn(AUDIT_ACTIONS, { message: `action must be one of ${AUDIT_ACTIONS.join(', ')}` })
  action?: AuditAction;

  @ApiPropertyOptional({ description: 'The actor’s e-mail (or the address typed at a failed sign-in).' })
  @IsOptional()
  @IsEmail({}, { message: 'actor must be an e-mail address' })
  actor?: string;

  @ApiPropertyOptional({ example: '2027-01-01T00:00:00Z', description: 'Entries at or after this instant.' })
  @IsOptional()
  @IsISO8601({ strict: true }, { message: 'since must be an ISO 8601 instant, e.g. 2027-01-01T00:00:00Z' })
  since?: string;

  @ApiPropertyOptional({
    type: 'integer',
    minimum: 1,
    description: "Entries of one ship's data; a ship's admin only ever reads their own ship's.",
  })
  @IsOptional()
  @QueryId('ship must be a ship id, a whole number from 1 written in digits only')
  ship?: number;

  @ApiPropertyOptional({ example: '2027-01-02T00:00:00Z', description: 'Entries before this instant.' })
  @IsOptional()
  @IsISO8601({ strict: true }, { message: 'until must be an ISO 8601 instant, e.g. 2027-01-02T00:00:00Z' })
  until?: string;
}

export class AuditPageQueryDto extends IntersectionType(AuditFilterDto, RecordsPageQueryDto) {}
