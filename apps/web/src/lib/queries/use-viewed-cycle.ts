import { useEffect } from 'react';
import { useQuery } from '@tanstack/react-query';
import { useSearchParams } from 'react-router-dom';
import type { CycleLanding } from '@catline/contracts';
import { apiRequest } from '../api-client.js';
import { useLiveCycleList } from '../live/use-live-cycle.js';
import { cycleKeys, useCycles } from './cycles-query.js';

/** Where the server lands this person when the address names no cycle (its rule: GET /cycles/landing). */
const useLanding = (enabled: boolean) =>
  useQuery({
    queryKey: cycleKeys.landing(),
    queryFn: ({ signal }) => apiRequest<CycleLanding>('/cycles/landing', { signal }),
    enabled,
    staleTime: 0,
    // A screen that cannot learn its cycle says so (the route's error page) rather than show none.
    throwOnError: true,
  });

/**
 * The cycle a live screen shows: `?cycle=<id>` when given, else the one the server lands this person on,
 * which is then written into the address (replacing it), so a reload or a shared link keeps the cycle.
 */
export function useViewedCycle() {
  const cycles = useCycles();
  useLiveCycleList();
  const [params, setParams] = useSearchParams();
  const named = params.get('cycle');
  const landing = useLanding(named === null);
  const landedId = landing.data?.cycleId ?? null;

  useEffect(() => {
    if (named !== null || landedId === null) return;
    setParams(
      (current) => {
        const next = new URLSearchParams(current);
        next.set('cycle', String(landedId));
        return next;
      },
      { replace: true },
    );
  }, [named, landedId, setParams]);

  const chosenId = named === null ? landedId : Number(named);
  const cycle = cycles.data?.find((candidate) => candidate.id === chosenId);
  const choose = (cycleId: number) =>
    setParams((current) => {
      const next = new URLSearchParams(current);
      next.set('cycle', String(cycleId));
      return next;
    });
  // Until the server has said where to land, the screen is still finding its cycle, not without one.
  const finding = cycles.isPending || (named === null && landing.isPending);
  // The id is known before the list arrives: a screen follows it at once (lineup and live link in
  // parallel with the list) instead of waiting for the list to name it.
  const cycleId = chosenId !== null && Number.isSafeInteger(chosenId) && chosenId > 0 ? chosenId : undefined;
  return { cycles, cycleId, cycle, choose, finding };
}
