import { AUDIT_ACTIONS, type AuditAction, type AuditEntryView } from '@catline/contracts';
import { ApiProperty, ApiSchema } from '@nestjs/swagger';
import { EnumProperty, IdProperty, InstantProperty, IntProperty } from './fields.js';
import { PageDto } from './paging.view.js';

const CHANGED_FIELDS = {
  type: 'object',
  additionalProperties: true,
  nullable: true,
} as const;

@ApiSchema({ name: 'AuditEntryView', description: 'One audited event: who, when, what, and what it changed.' })
export class AuditEntryViewDto implements AuditEntryView {
  @IdProperty()
  id: number;

  @InstantProperty()
  at: string;

  @IntProperty({ nullable: true, description: 'Null when nobody was signed in (a failed sign-in).' })
  actorId: number | null;

  @ApiProperty({ type: 'string', nullable: true, description: 'The actor, or the e-mail typed at a failed sign-in.' })
  actorEmail: string | null;

  @ApiProperty({ type: 'string', nullable: true })
  actorRole: string | null;

  @ApiProperty({ type: 'string', nullable: true })
  clientAddress: string | null;

  @EnumProperty(AUDIT_ACTIONS, 'AuditAction')
  action: AuditAction;

  @ApiProperty({ example: 'person' })
  subjectType: string;

  @IdProperty({ nullable: true })
  subjectId: number | null;

  @IdProperty({
    nullable: true,
    description: 'The ship the subject belongs to; null for a fleet admin or an unknown e-mail.',
  })
  shipId: number | null;

  @ApiProperty()
  summary: string;

  @ApiProperty({ ...CHANGED_FIELDS, description: 'The changed fields before (whole record on delete).' })
  before: Record<string, unknown> | null;

  @ApiProperty({ ...CHANGED_FIELDS, description: 'The changed fields after (whole record on create).' })
  after: Record<string, unknown> | null;
}

export const AuditEntryPageDto = PageDto(AuditEntryViewDto, 'AuditEntry', 'One page of the audit trail, newest first.');
