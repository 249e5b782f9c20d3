/**
 * Every tag an operation may carry, with what it groups. The document defines exactly these; a
 * controller's `@ApiTags(...)` names one of them (Spectral fails an operation whose tag is not here).
 */
export const API_TAGS = {
  auth: 'Signing in and out, sessions, passwords, password resets and invitations.',
  users: 'People, their roles and invitations.',
  ships: 'The ship, its deck spots and catapults.',
  squadrons: 'Squadrons and where their summaries are mailed.',
  'aircraft-types': 'Aircraft types and their launch data.',
  aircraft: 'The airframes of the fleet.',
  cycles: 'Launch cycles: conditions, start, close and the aircraft taking part.',
  lineup: 'The live lineup of a cycle: its snapshot, change feed and the commands that change it.',
  deck: "Where a cycle's aircraft are: tows between positions, and the landing area's state.",
  imports: 'CSV uploads (air plans, launch tables) in two steps: preview, then confirm.',
  reports: "A cycle's record, its replay and shot counts, as JSON or CSV.",
  audit: 'The audit trail: who changed what and when, and every sign-in; as JSON pages or CSV.',
  health: 'Whether the API and its database answer.',
} as const;

export type ApiTag = keyof typeof API_TAGS;
