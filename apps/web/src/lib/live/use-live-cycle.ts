import { useEffect } from 'react';
import { useQuery } from '@tanstack/react-query';
import { useStore } from 'zustand';
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
  return {
    lineup,
    connection: live.connection,
    refusal: cycleId === undefined ? undefined : live.refusals.get(cycleId),
  };
}

/** Hands a command's answer to the live feed so the sender sees its own change at once, in order. */
export const receiveLineupChange = liveCycles.receive.bind(liveCycles);
