import type { SessionResponse } from '@catline/contracts';

/**
 * Every tab of this browser holds the same refresh cookie, and the server takes each cookie once (a copy
 * used again after a few seconds means it was stolen). So the tabs refresh one at a time (Web Locks), and
 * the tab that refreshed hands the new session to the others (BroadcastChannel): a tab that waited for the
 * lock while another refreshed takes that session instead of asking again. Without Web Locks (a page over
 * plain HTTP under a host name is not a secure context) tabs may refresh together; the server's grace for
 * a just-replaced cookie answers them all alike. The access token travels only between this origin's tabs;
 * localStorage holds the time of the last refresh, never a token.
 */
const LOCK = 'catline.refresh';
const REFRESHED_AT = 'catline.refreshed-at';
// How long a tab that saw another refresh waits for its session to arrive before asking itself.
const HANDOVER_WAIT_MS = 1_000;

const channel = typeof BroadcastChannel === 'undefined' ? null : new BroadcastChannel('catline.session');
let handedOver: { session: SessionResponse; at: number } | null = null;
const awaiting = new Set<(session: SessionResponse) => void>();
const listeners = new Set<(session: SessionResponse) => void>();

channel?.addEventListener('message', (event: MessageEvent<SessionResponse>) => {
  handedOver = { session: event.data, at: Date.now() };
  for (const take of [...awaiting, ...listeners]) take(event.data);
  awaiting.clear();
});

/** Called in every other tab with the session one tab refreshed. */
export function onSessionHandedOver(listener: (session: SessionResponse) => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

function sessionHandedOverSince(askedAt: number): Promise<SessionResponse | null> {
  if (handedOver && handedOver.at >= askedAt) return Promise.resolve(handedOver.session);
  const refreshedAt = Number(globalThis.localStorage?.getItem(REFRESHED_AT) ?? 0);
  if (refreshedAt < askedAt) return Promise.resolve(null);
  // Another tab refreshed while this one waited for the lock; its session is on the way.
  return new Promise((resolve) => {
    const take = (session: SessionResponse | null) => {
      clearTimeout(timer);
      awaiting.delete(take);
      resolve(session);
    };
    const timer = setTimeout(() => take(null), HANDOVER_WAIT_MS);
    awaiting.add(take);
  });
}

/** `ask` trades the cookie for a session; it runs in one tab at a time, and only when no other tab just did. */
export async function refreshOnceForAllTabs(
  ask: () => Promise<SessionResponse | null>,
): Promise<SessionResponse | null> {
  const askedAt = Date.now();
  const run = async () => {
    const taken = await sessionHandedOverSince(askedAt);
    if (taken) return taken;
    const session = await ask();
    if (session) {
      globalThis.localStorage?.setItem(REFRESHED_AT, String(Date.now()));
      channel?.postMessage(session);
    }
    return session;
  };
  const locks = globalThis.navigator?.locks;
  return locks ? locks.request(LOCK, run) : run();
}
