import { useSearchParams } from 'react-router-dom';
import { useLiveCycleList } from '../../../lib/live/use-live-cycle.js';
import { useCycles } from '../../../lib/queries/cycles-query.js';
import { pickReportCycle } from '../report-model.js';

/** The cycle a report screen shows: `?cycle=<id>` when given, else the latest closed one. */
export function useReportCycle() {
  const cycles = useCycles();
  useLiveCycleList();
  const [params, setParams] = useSearchParams();
  const chosen = params.get('cycle');
  const cycle = pickReportCycle(cycles.data ?? [], chosen === null ? null : Number(chosen));
  const choose = (cycleId: number) =>
    setParams((current) => {
      const next = new URLSearchParams(current);
      next.set('cycle', String(cycleId));
      return next;
    });
  return { cycles, cycle, choose };
}
