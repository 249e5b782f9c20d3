import { AUDIT_ACTIONS, type AuditAction } from '@catline/contracts';
import { ApiPropertyOptional, IntersectionType } from '@nestjs/swagger';
import {
  IsEmail,
  IsIn,
  IsISO8601,
  IsOptional,
  Validate,
  type ValidationArguments,
  ValidatorConstraint,
  type ValidatorConstraintInterface,
} from 'class-validator';
import { RecordsPageQueryDto } from '../../common/paging/page-query.dto.js';
import { QueryId } from '../../common/validation/query-id.decorator.js';

/** A range that ends before it starts matches nothing: surely a slip, so it is refused rather than answered empty. */
@ValidatorConstraint({ name: 'untilNotBeforeSince' })
class UntilNotBeforeSince implements ValidatorConstraintInterface {
  validate(until: string, { object }: ValidationArguments): boolean {
    const since = Date.parse((object as AuditFilterDto).since ?? '');
    // An instant that does not read is refused by its own ISO 8601 check, with its own sentence.
    return Number.isNaN(since) || Number.isNaN(Date.parse(until)) || since <= Date.parse(until);
  }

  defaultMessage(): string {
    return 'until must not be before since: the range runs from since to until';
  }
}

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

  @ApiPropertyOptional({
    example: '2027-01-02T00:00:00Z',
    description: 'Entries before this instant; not before `since` (400 otherwise).',
  })
  @IsOptional()
  @IsISO8601({ strict: true }, { message: 'until must be an ISO 8601 instant, e.g. 2027-01-02T00:00:00Z' })
  @Validate(UntilNotBeforeSince)
  until?: string;
}

export class AuditPageQueryDto extends IntersectionType(AuditFilterDto, RecordsPageQueryDto) {}
