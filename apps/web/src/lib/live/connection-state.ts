/** What a live screen says about its link to the server. */
export type ConnectionState =
  | { kind: 'connecting' }
  | { kind: 'live' }
  | { kind: 'reconnecting'; since: Date }
  | { kind: 'offline'; since: Date };
