import { useCallback, useMemo, useState } from 'react';
import { Button, Grid, HStack, Stack } from '@chakra-ui/react';
import { Link as RouterLink } from 'react-router-dom';
import type { CycleReplay, CycleView } from '@catline/contracts';
import { CautionLine } from '../../../components/caution-line.js';
import { CyclePicker } from '../../../components/cycle-picker.js';
import { PageHeader } from '../../../components/page-header.js';
import { EmptyState, QueryView } from '../../../components/query-states.js';
import { useCycleReplay } from '../api/get-cycle-replay.js';
import { useReportCycle } from '../hooks/use-report-cycle.js';
import { replaySteps } from '../replay-model.js';
import { ChangeLogList } from './change-log-list.js';
import { ReplayBoard } from './replay-board.js';
import { ReplayControls } from './replay-controls.js';
import { ShipTimeZone } from '../../../lib/ship-time.js';

function ReplayPlayer({ replay }: { replay: CycleReplay }) {
  const steps = useMemo(() => replaySteps(replay), [replay]);
  const last = replay.changes.length;
  // Opens on the lineup as the cycle ended; step back from there.
  const [step, setStep] = useState(last);
  const onStep = useCallback((next: number) => setStep(Math.min(last, Math.max(0, next))), [last]);
  const changed = new Set(step === 0 ? [] : (replay.changes[step - 1].patch.slots ?? []).map((slot) => slot.id));

  return (
    <Stack gap="3">
      <ReplayControls step={step} changes={replay.changes} onStep={onStep} />
      <CautionLine />
      <Grid templateColumns={{ base: 'minmax(0, 1fr)', xl: 'minmax(0, 1fr) 22rem' }} gap="3" alignItems="start">
        <ReplayBoard snapshot={steps[step]} changed={changed} />
        <ChangeLogList changes={replay.changes} step={step} onStep={onStep} />
      </Grid>
    </Stack>
  );
}

function ReplayPanel({ cycle }: { cycle: CycleView }) {
  const replay = useCycleReplay(cycle.id);
  return (
    <QueryView query={replay} loadingLabel={`Reading the change log of cycle ${cycle.number}…`}>
      {(data) => <ReplayPlayer replay={data} />}
    </QueryView>
  );
}

/** Steps through a cycle's change log and shows the lineup as it stood after each change, and who made it. */
export function ReplayScreen() {
  const { cycles, cycle, choose } = useReportCycle();
  return (
    <ShipTimeZone zone={cycle?.timeZone}>
      <Stack gap="4">
        <PageHeader title="Replay" subtitle={cycle ? `Cycle ${cycle.number}` : undefined}>
          {cycle && (
            <Button asChild size="sm" variant="outline">
              <RouterLink to={`/reports?cycle=${cycle.id}`}>Back to the report</RouterLink>
            </Button>
          )}
        </PageHeader>
        <QueryView query={cycles} loadingLabel="Loading cycles…">
          {(list) =>
            cycle ? (
              <Stack gap="3">
                <HStack>
                  <CyclePicker cycles={list} value={cycle.id} onChange={choose} />
                </HStack>
                <ReplayPanel key={cycle.id} cycle={cycle} />
              </Stack>
            ) : (
              <EmptyState title="No cycles yet">A cycle's replay appears here once it has changes.</EmptyState>
            )
          }
        </QueryView>
      </Stack>
    </ShipTimeZone>
  );
}
