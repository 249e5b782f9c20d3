import { useEffect } from 'react';
import { useQuery } from '@tanstack/react-query';
import { useStore } from 'zustand';
import type { Freshness } from './connection-state.js';
import { lineupSnapshotQueryOptions } from './lineup-query.js';
import { liveCycles } from './live-cycles.js';

/**
 * The live lineup of a cycle and the state of the link that keeps it live. The only way a screen follows
 * a cycle: it never touches the socket itself.
 */
export function useLiveCycle(cycleId: number | undefined) {
  useEffect(() => (cycleId === undefined ? undefined : liveCycles.watch(cycleId)), [cycleId]);
  const live = useStore(liveCycles.state);
  const lineup = useQuery({ ...lineupSnapshotQueryOptions(cycleId ?? 0), enabled: cycleId !== undefined });
  const caughtUp = cycleId !== undefined && live.connection.kind === 'live' && live.caughtUp.has(cycleId);
  return {
    lineup,
    connection: live.connection,
    freshness: freshness(
      caughtUp,
      cycleId === undefined ? undefined : live.liveUntil.get(cycleId),
      lineup.dataUpdatedAt,
    ),
    refusal: cycleId === undefined ? undefined : live.refusals.get(cycleId),
  };
}

/**
 * The one rule for "is this screen live": the link is up and the lineup has caught up with the server's
 * version since. Until then the figures were last known current when this screen last stopped being live,
 * or when the lineup was last read, whichever is later (a lineup kept from before a reload only the latter).
 */
function freshness(caughtUp: boolean, liveUntil: Date | undefined, dataUpdatedAt: number): Freshness {
  if (caughtUp) return { live: true };
  return { live: false, lastUpdate: new Date(Math.max(liveUntil?.getTime() ?? 0, dataUpdatedAt)) };
}

/**
 * Keeps the ship's lists of cycles and pickers up with the live feed while the screen shows one, and says
 * whether a list read at `dataUpdatedAt` is current: the link is up and the lists were read since it came up.
 */
export function useLiveCycleList(dataUpdatedAt = 0) {
  useEffect(() => liveCycles.followCycleList(), []);
  const connection = useStore(liveCycles.state, (state) => state.connection);
  const caughtUp = useStore(liveCycles.state, (state) => state.listsCaughtUp);
  const liveUntil = useStore(liveCycles.state, (state) => state.listsLiveUntil);
  return { connection, freshness: freshness(connection.kind === 'live' && caughtUp, liveUntil, dataUpdatedAt) };
}

/** Hands a command's answer to the live feed so the sender sees its own change at once, in order. */
export const receiveLineupChange = liveCycles.receive.bind(liveCycles);
