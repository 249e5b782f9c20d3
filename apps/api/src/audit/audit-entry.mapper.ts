import type { AuditEntryView } from '@catline/contracts';
import type { AuditEntry } from '../database/entities/audit-entry.entity.js';

export function toAuditEntryView(entry: AuditEntry): AuditEntryView {
  return {
    // A bigint column read as text; ids stay below 2^53 for millions of years of entries.
    id: Number(entry.id),
    at: entry.at.toISOString(),
    actorId: entry.actorId,
    actorEmail: entry.actorEmail,
    actorRole: entry.actorRole,
    clientAddress: entry.clientAddress,
    action: entry.action,
    subjectType: entry.subjectType,
    subjectId: entry.subjectId,
    shipId: entry.shipId,
    summary: entry.summary,
    before: entry.before,
    after: entry.after,
  };
}
