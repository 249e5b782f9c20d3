/** What a live screen says about its link to the server. */
export type ConnectionState =
  { kind: 'connecting' } | { kind: 'live' } | { kind: 'reconnecting'; since: Date } | { kind: 'offline'; since: Date };

/** Whether a screen's live figures can be trusted as current, and if not, when they last were. */
export type Freshness = { live: true } | { live: false; lastUpdate: Date };
