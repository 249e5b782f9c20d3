import type { QueryClient, QueryKey } from '@tanstack/react-query';
import { cycleKeys } from '../queries/cycles-query.js';
import { shipKeys } from '../queries/ships-query.js';
import { lineupKeys } from './lineup-keys.js';

/*
 * What the live screens last showed (the lineups, and the cycles and ships they are picked from), kept in
 * this browser so that a tablet reopened without the network shows its last picture rather than nothing.
 * A kept lineup is only ever shown as not live (a screen is live once the live link has caught it up) and is
 * read again as soon as the server answers. Kept for one person and dropped when the session ends; figures
 * only, never a token.
 */
const STORAGE_KEY = 'catline.kept-figures';
const KEPT_KEYS: readonly QueryKey[] = [lineupKeys.snapshots, cycleKeys.list(), shipKeys.list()];
// Changes come in bursts during a launch: one write for each burst.
const SAVE_AFTER_MS = 500;

interface KeptQuery {
  queryKey: QueryKey;
  data: unknown;
  /** When the figures were last updated from the server: what "last update" says once they are shown again. */
  updatedAt: number;
}

interface Kept {
  userId: number;
  queries: KeptQuery[];
}

const isKept = (key: QueryKey) => KEPT_KEYS.some((prefix) => prefix.every((part, index) => key[index] === part));

function read(): Kept | null {
  try {
    const kept = JSON.parse(globalThis.localStorage?.getItem(STORAGE_KEY) ?? 'null') as Kept | null;
    return kept && typeof kept.userId === 'number' && Array.isArray(kept.queries) ? kept : null;
  } catch {
    return null;
  }
}

/** Writes the kept figures of the person signed in (`userId()`, null when nobody is) whenever they change. */
export function keepLiveFigures(queryClient: QueryClient, userId: () => number | null) {
  const cache = queryClient.getQueryCache();
  let pending: ReturnType<typeof setTimeout> | undefined;
  const save = () => {
    clearTimeout(pending);
    pending = undefined;
    const owner = userId();
    if (owner === null) return;
    const queries: KeptQuery[] = cache
      .getAll()
      .filter((query) => isKept(query.queryKey) && query.state.data !== undefined)
      .map((query) => ({ queryKey: query.queryKey, data: query.state.data, updatedAt: query.state.dataUpdatedAt }));
    try {
      globalThis.localStorage?.setItem(STORAGE_KEY, JSON.stringify({ userId: owner, queries } satisfies Kept));
    } catch {
      // A full storage only costs the picture shown after an offline reopen; the live screens go on.
    }
  };
  cache.subscribe((event) => {
    if (event.type === 'updated' && event.action.type === 'success' && isKept(event.query.queryKey)) {
      pending ??= setTimeout(save, SAVE_AFTER_MS);
    }
  });
  globalThis.addEventListener?.('pagehide', () => {
    if (pending !== undefined) save();
  });
}

/** Puts back what was kept for this person, with the time each was last updated; anyone else's is left out. */
export function restoreKeptFigures(queryClient: QueryClient, userId: number) {
  const kept = read();
  if (kept?.userId !== userId) return;
  for (const { queryKey, data, updatedAt } of kept.queries) {
    if (isKept(queryKey)) queryClient.setQueryData(queryKey, data, { updatedAt });
  }
}

export function forgetKeptFigures() {
  globalThis.localStorage?.removeItem(STORAGE_KEY);
}
