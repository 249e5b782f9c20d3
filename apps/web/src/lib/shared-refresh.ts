import type { SessionResponse } from '@catline/contracts';

/**
 * Every tab of this browser holds the same refresh cookie, and the server takes each cookie once (a copy
 * used again after a few seconds means it was stolen). So the tabs refresh one at a time (Web Locks), and
 * the tab that refreshed hands the new session to the others (BroadcastChannel): a tab that waited for the
 * lock while another refreshed takes that session instead of asking again, and a tab opened just after a
 * refresh (too late to hear it) asks the open tabs for it. Without Web Locks (a page over plain HTTP under
 * a host name is not a secure context) tabs may refresh together; the server's grace for a just-replaced
 * cookie answers them all alike. The access token travels only between this origin's tabs; localStorage
 * holds the time of the last refresh, never a token.
 */
const LOCK = 'catline.refresh';
const REFRESHED_AT = 'catline.refreshed-at';
// How long a tab that asked the open tabs waits for an answer before asking the server itself.
const ASK_WAIT_MS = 1_000;
// How long a tab waits for the session another tab has just refreshed: it is on its way, but a busy
// browser may take a while to deliver it, and asking again would spend the cookie twice.
const REFRESHED_WAIT_MS = 5_000;
// A refresh this recent was heard by the tabs open then; a tab opened since asks them for its session.
const RECENT_REFRESH_MS = 60_000;
// A session handed to a new tab keeps at least this long; one closer to its end is renewed instead.
const HANDOVER_MIN_LIFE_MS = 2 * 60_000;

// Held, shared, by every open tab for its whole life: a tab asks the others only when one is there to answer.
const OPEN_TAB = 'catline.open-tab';

type Message = { kind: 'session'; session: SessionResponse } | { kind: 'ask' };

void globalThis.navigator?.locks?.request(OPEN_TAB, { mode: 'shared' }, () => new Promise<never>(() => undefined));

/**
 * Whether another tab is open to hand over its session. A lone tab reloaded within a minute of its last
 * refresh waited a whole second for an answer nobody could give (the bench's cold Lineup load, and every
 * reload on deck). Without Web Locks it cannot tell, so it asks.
 */
async function anotherTabOpen(): Promise<boolean> {
  const locks = globalThis.navigator?.locks;
  if (!locks) return true;
  const { held = [] } = await locks.query();
  return held.filter((lock) => lock.name === OPEN_TAB).length > 1;
}

const channel = typeof BroadcastChannel === 'undefined' ? null : new BroadcastChannel('catline.session');
let handedOver: { session: SessionResponse; at: number } | null = null;
let currentSession: () => SessionResponse | null = () => null;
const awaiting = new Set<(session: SessionResponse) => void>();
const listeners = new Set<(session: SessionResponse) => void>();

channel?.addEventListener('message', ({ data }: MessageEvent<Message>) => {
  if (data.kind === 'ask') {
    const session = currentSession();
    if (session && Date.parse(session.expiresAt) - Date.now() > HANDOVER_MIN_LIFE_MS) {
      channel.postMessage({ kind: 'session', session } satisfies Message);
    }
    return;
  }
  handedOver = { session: data.session, at: Date.now() };
  for (const take of [...awaiting, ...listeners]) take(data.session);
  awaiting.clear();
});

/** Called in every other tab with the session one tab refreshed. */
export function onSessionHandedOver(listener: (session: SessionResponse) => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

/** What this tab answers a newly opened tab that asks for the session (null while signed out). */
export function shareSessionWithNewTabs(current: () => SessionResponse | null) {
  currentSession = current;
}

function awaitHandover(waitMs: number): Promise<SessionResponse | null> {
  return new Promise((resolve) => {
    const take = (session: SessionResponse | null) => {
      clearTimeout(timer);
      awaiting.delete(take);
      resolve(session);
    };
    const timer = setTimeout(() => take(null), waitMs);
    awaiting.add(take);
  });
}

async function sessionFromOtherTabs(askedAt: number): Promise<SessionResponse | null> {
  if (handedOver && handedOver.at >= askedAt) return handedOver.session;
  const refreshedAt = Number(globalThis.localStorage?.getItem(REFRESHED_AT) ?? 0);
  // Another tab refreshed while this one waited for the lock; its session is on the way.
  if (refreshedAt >= askedAt) return awaitHandover(REFRESHED_WAIT_MS);
  if (!channel || Date.now() - refreshedAt > RECENT_REFRESH_MS || !(await anotherTabOpen())) return null;
  const answer = awaitHandover(ASK_WAIT_MS);
  channel.postMessage({ kind: 'ask' } satisfies Message);
  return answer;
}

/** `ask` trades the cookie for a session; it runs in one tab at a time, and only when no other tab has one. */
export async function refreshOnceForAllTabs(
  ask: () => Promise<SessionResponse | null>,
): Promise<SessionResponse | null> {
  const askedAt = Date.now();
  const run = async () => {
    const taken = await sessionFromOtherTabs(askedAt);
    if (taken) return taken;
    const session = await ask();
    if (session) {
      globalThis.localStorage?.setItem(REFRESHED_AT, String(Date.now()));
      channel?.postMessage({ kind: 'session', session } satisfies Message);
    }
    return session;
  };
  const locks = globalThis.navigator?.locks;
  return locks ? locks.request(LOCK, run) : run();
}
