import type { AuditAction } from '@catline/contracts';
import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { requestContext } from '../common/request-context.js';
import { AuditEntry } from '../database/entities/audit-entry.entity.js';

type Fields = Record<string, unknown>;

/** A signed-in person, or only the e-mail typed at a failed sign-in. */
export type AuditActor =
  Pick<AuthenticatedUser, 'id' | 'email' | 'role'> | { id?: undefined; email: string; role?: undefined };

export interface AuditRecord {
  action: AuditAction;
  subject: { type: string; id?: number | null };
  /** The ship the subject belongs to; null for a fleet admin or an e-mail nobody signs in with. */
  shipId: number | null;
  summary: string;
  /** The record before the change (null on create); only fields that differ from `after` are kept. */
  before?: Fields | null;
  /** The record after the change (null on delete). Never pass secrets (password hashes, tokens). */
  after?: Fields | null;
  /** Who acted, when it is not the signed-in caller of this request (a sign-in, a password link). */
  actor?: AuditActor;
}

const SUMMARY_MAX = 300;

/** The fields of `before` and `after` whose values differ (compared as JSON), or both whole when one is absent. */
export function changedFields(
  before: Fields | null,
  after: Fields | null,
): { before: Fields | null; after: Fields | null } {
  if (!before || !after) return { before, after };
  const keys = [...new Set([...Object.keys(before), ...Object.keys(after)])].filter(
    (key) => JSON.stringify(before[key]) !== JSON.stringify(after[key]),
  );
  return {
    before: Object.fromEntries(keys.map((key) => [key, before[key] ?? null])),
    after: Object.fromEntries(keys.map((key) => [key, after[key] ?? null])),
  };
}

/**
 * The one way to add to the audit trail. Call it with the transaction's manager of the change it
 * describes, so the entry exists exactly when the change committed:
 *   await this.audit.record(manager, { action: 'aircraft.updated', subject: { type: 'aircraft', id }, shipId, summary, before, after });
 * The actor and client address come from the request (set by the auth guard) unless given.
 */
@Injectable()
export class AuditTrail {
  async record(manager: EntityManager, record: AuditRecord): Promise<void> {
    const context = requestContext();
    const actor: AuditActor | null = record.actor ?? context?.actor ?? null;
    const { before, after } = changedFields(record.before ?? null, record.after ?? null);
    const entry = Object.assign(new AuditEntry(), {
      actorId: actor?.id ?? null,
      actorEmail: actor?.email.slice(0, 254) ?? null,
      actorRole: actor?.role ?? null,
      clientAddress: context?.clientAddress?.slice(0, 64) ?? null,
      action: record.action,
      subjectType: record.subject.type,
      subjectId: record.subject.id ?? null,
      shipId: record.shipId,
      summary: record.summary.slice(0, SUMMARY_MAX),
      before,
      after,
    });
    await manager.save(entry);
  }
}
