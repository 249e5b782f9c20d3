import { useSearchParams } from 'react-router-dom';
import type { CycleView } from '@catline/contracts';
import { useCycles } from './cycles-query.js';

/** The cycle to show when none is chosen: the one flying now, else the next planned, else the latest. */
export function pickCurrentCycle(cycles: CycleView[]): CycleView | undefined {
  const executing = cycles.find((cycle) => cycle.state === 'executing');
  if (executing) return executing;
  const planned = cycles
    .filter((cycle) => cycle.state === 'planning')
    .sort((a, b) => Date.parse(a.plannedLaunchAt) - Date.parse(b.plannedLaunchAt));
  return planned[0] ?? cycles[0];
}

/** The cycle a live screen shows: `?cycle=<id>` when given, else the current one. */
export function useViewedCycle() {
  const cycles = useCycles();
  const [params, setParams] = useSearchParams();
  const chosen = Number(params.get('cycle'));
  const list = cycles.data ?? [];
  const cycle = list.find((candidate) => candidate.id === chosen) ?? pickCurrentCycle(list);
  const choose = (cycleId: number) =>
    setParams((current) => {
      const next = new URLSearchParams(current);
      next.set('cycle', String(cycleId));
      return next;
    });
  return { cycles, cycle, choose };
}
