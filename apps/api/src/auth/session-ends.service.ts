import { Injectable } from '@nestjs/common';

/** Whose sessions ended: every session of a person, or one session. */
export type EndedSessions = { personId: number } | { sessionId: string };

/**
 * Told after a commit that ended sessions (logout, removal, role or password change, a reused refresh
 * token), so the live link can disconnect their sockets at once. Requests need no telling: each one checks
 * its token against the person and the session (TokenVerifier).
 */
@Injectable()
export class SessionEnds {
  private readonly listeners = new Set<(ended: EndedSessions) => void>();

  subscribe(listener: (ended: EndedSessions) => void): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  tell(ended: EndedSessions): void {
    for (const listener of this.listeners) listener(ended);
  }
}
