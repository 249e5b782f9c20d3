// The audit trail: who did what, when, and what it changed. A new kind of audited change adds its
// action here first (the server's AuditTrail.record takes its type from this list, the web filters by it).

export const AUDIT_ACTIONS = [
  'sign_in.succeeded',
  'sign_in.failed',
  'password.changed',
  'password.set_by_link',
  'person.created',
  'person.updated',
  'person.removed',
  'person.invited',
  'aircraft.created',
  'aircraft.updated',
  'aircraft.deleted',
  'squadron.created',
  'squadron.updated',
  'squadron.deleted',
  'aircraft_type.created',
  'aircraft_type.updated',
  'aircraft_type.deleted',
  'launch_table.replaced',
  'stores_catalogue.replaced',
  'ship.updated',
  'catapult.updated',
  'deck_layout.replaced',
  'setting_tables.replaced',
  'cycle.created',
] as const;
export type AuditAction = (typeof AUDIT_ACTIONS)[number];

/** One audited event. `before`/`after` hold only the fields that changed (whole records on create/delete). */
export interface AuditEntryView {
  id: number;
  at: string;
  /** Null when nobody was signed in (a failed sign-in, a password set through a link). */
  actorId: number | null;
  /** The actor's e-mail, or for a failed sign-in the address as typed. */
  actorEmail: string | null;
  actorRole: string | null;
  clientAddress: string | null;
  action: AuditAction;
  subjectType: string;
  subjectId: number | null;
  /** The ship the subject belongs to; null for a fleet admin or an e-mail nobody signs in with. */
  shipId: number | null;
  summary: string;
  before: Record<string, unknown> | null;
  after: Record<string, unknown> | null;
}

/** The most rows one CSV export holds (newest first); narrow the filters for older ones. */
export const AUDIT_EXPORT_MAX_ROWS = 20_000;
