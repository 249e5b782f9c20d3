import { Box, Grid, HStack, SimpleGrid, Stack, Text } from '@chakra-ui/react';
import type { LineupSnapshot, SlotView } from '@catline/contracts';
import { CautionLine } from '../../../components/caution-line.js';
import { ConnectionBadge } from '../../../components/connection-badge.js';
import { CyclePicker } from '../../../components/cycle-picker.js';
import { DepartureNote } from '../../../components/departure-note.js';
import { ClosedCycleNotice } from '../../../components/closed-cycle-notice.js';
import { StaleWindNotice } from '../../../components/stale-wind-notice.js';
import { FigureStat } from '../../../components/figure-stat.js';
import { LaunchTiming } from '../../../components/launch-timing.js';
import { LiveFigures, useFiguresLive } from '../../../components/live-figures.js';
import { PageHeader } from '../../../components/page-header.js';
import { EmptyState, ErrorState, LoadingState, QueryView } from '../../../components/query-states.js';
import { NoticeBanner, refusalNotice, useNotice } from '../../../components/refusal-notice.js';
import { SlotStatusBadge } from '../../../components/slot-status-badge.js';
import { SuspendControls } from '../../../components/suspend-controls.js';
import { formatClearingTurn, formatCountdown, formatPounds, ordinal } from '../../../lib/format.js';
import { ShipTimeZone, useShipClock } from '../../../lib/ship-time.js';
import { useLiveCycle } from '../../../lib/live/use-live-cycle.js';
import { useViewedCycle } from '../../../lib/queries/use-viewed-cycle.js';
import { useSessionUser } from '../../../lib/session-store.js';
import { useNow } from '../../../lib/use-now.js';
import { useCycleTheme } from '../../../theme/use-cycle-theme.js';
import { useAcknowledgeWeight } from '../api/acknowledge-weight.js';
import { useGiveSuspendReason } from '../api/give-suspend-reason.js';
import { useSuspendSlot } from '../api/suspend-slot.js';
import { findMySlot, onTheCatapult } from '../my-launch-model.js';
import { WeightAnswer } from './weight-answer.js';

function Countdown({ slot }: { slot: Pick<SlotView, 'projectedLaunchAt' | 'launchedAt' | 'timing'> }) {
  const { projectedLaunchAt, launchedAt } = slot;
  const { clock } = useShipClock();
  const now = useNow(1_000, useFiguresLive());
  if (launchedAt) return <FigureStat label="Launched" value={clock(launchedAt)} tone="go" size="xl" />;
  if (!projectedLaunchAt) return <FigureStat label="Projected launch" value="Not yet planned" size="lg" />;
  return (
    <Box data-testid="countdown">
      <FigureStat
        label={`Projected launch ${clock(projectedLaunchAt)}`}
        value={formatCountdown(projectedLaunchAt, now)}
        size="xl"
      />
      <Text fontSize="sm">
        <LaunchTiming timing={slot.timing} />
      </Text>
    </Box>
  );
}

function MySlot({ snapshot, pilotId }: { snapshot: LineupSnapshot; pilotId: number }) {
  const mine = findMySlot(snapshot, pilotId);
  const acknowledge = useAcknowledgeWeight(snapshot.cycle.id);
  const suspend = useSuspendSlot(snapshot.cycle.id);
  const suspendReason = useGiveSuspendReason(snapshot.cycle.id);
  const { notice, show, dismiss } = useNotice();
  if (!mine) {
    return (
      <EmptyState title={`You are not in cycle ${snapshot.cycle.number}`}>
        When air operations gives you an aircraft in this cycle, it appears here.
      </EmptyState>
    );
  }
  const { slot, lane, place } = mine;
  const turn = slot.figures ? formatClearingTurn(slot.figures.clearingTurnDeg) : 'Known once you have a catapult';
  return (
    <Stack gap="4" data-testid="my-slot" data-side-number={slot.sideNumber}>
      {notice && <NoticeBanner notice={notice} onDismiss={dismiss} />}
      <Grid
        templateColumns={{ base: '1fr', md: 'repeat(3, minmax(0, 1fr))' }}
        gap="3"
        borderWidth="2px"
        borderColor="accent.border"
        rounded="card"
        p={{ base: '3', md: '4' }}
        bg="bg.panel"
      >
        <Box data-testid="my-catapult">
          <FigureStat
            label="Catapult"
            value={lane ? `Cat ${lane.number} · ${lane.position}` : 'Deck pool: no catapult yet'}
            size="xl"
          />
        </Box>
        <Box data-testid="my-place">
          <FigureStat
            label="Place in line"
            value={
              slot.status === 'launched' ? 'Gone' : place === null ? '—' : place === 1 ? 'Next (1st)' : ordinal(place)
            }
            size="xl"
          />
        </Box>
        <Countdown slot={slot} />
      </Grid>
      <HStack gap="3" wrap="wrap">
        <Text fontSize="2xl" fontWeight="700">
          {slot.sideNumber}
        </Text>
        <Text color="fg.muted">
          {slot.typeDesignation} · {slot.squadronCode} · {slot.mission}
        </Text>
        <SlotStatusBadge status={slot.status} size="lg" />
      </HStack>
      {(onTheCatapult(slot) || slot.status === 'suspended') && (
        <SuspendControls
          slot={slot}
          possible={onTheCatapult(slot)}
          pending={suspend.isPending || suspendReason.isPending}
          onSuspend={() =>
            suspend.mutate(
              { slotId: slot.id, slotVersion: slot.version },
              { onError: (error) => show(refusalNotice(error, 'Suspend')) },
            )
          }
          onReason={(reason) =>
            suspendReason.mutate(
              { slotId: slot.id, slotVersion: slot.version, ...reason },
              { onError: (error) => show(refusalNotice(error, 'The reason')) },
            )
          }
        />
      )}
      <WeightAnswer
        slot={slot}
        pending={acknowledge.isPending}
        onAnswer={(grossWeightLb) =>
          acknowledge.mutate(
            { slotId: slot.id, slotVersion: slot.version, grossWeightLb },
            { onError: (error) => show(refusalNotice(error, 'Your answer')) },
          )
        }
      />
      <SimpleGrid columns={{ base: 2, md: 4 }} gap="3">
        <FigureStat label="Take-off trim" value={slot.trimDeg === null ? '—' : `${slot.trimDeg}°`} />
        <FigureStat
          label="Afterburner"
          value={slot.afterburnerRequired ? 'Required' : 'Not required'}
          tone={slot.afterburnerRequired ? 'caution' : undefined}
        />
        <FigureStat label="Clearing turn" value={turn} size="md" />
        <FigureStat label="Fuel" value={formatPounds(slot.fuelLb)} size="md" />
      </SimpleGrid>
      <DepartureNote slot={slot} weatherCase={snapshot.cycle.weatherCase} />
    </Stack>
  );
}

export function MyLaunchScreen() {
  const user = useSessionUser();
  const { cycles, cycleId, cycle, choose, finding } = useViewedCycle();
  const live = useLiveCycle(cycleId);
  useCycleTheme((live.lineup.data?.cycle ?? cycle)?.night);
  return (
    <ShipTimeZone zone={(live.lineup.data?.cycle ?? cycle)?.timeZone}>
      <Stack gap="3">
        <PageHeader title="My launch" subtitle={cycle && `Cycle ${cycle.number}`}>
          {cycle && <ConnectionBadge state={live.connection} />}
          {cycles.data && cycles.data.length > 1 && (
            <CyclePicker cycles={cycles.data} value={cycle?.id} onChange={choose} />
          )}
        </PageHeader>
        <ClosedCycleNotice cycle={live.lineup.data?.cycle ?? cycle} />
        <StaleWindNotice cycle={live.lineup.data?.cycle ?? cycle} />
        {finding ? (
          <LoadingState label="Finding the current cycle…" />
        ) : cycles.isError && !cycles.data ? (
          <ErrorState error={cycles.error} onRetry={() => void cycles.refetch()} />
        ) : !cycle ? (
          <EmptyState title="No cycle yet">
            Your launch appears here once air operations plans a cycle with you in it.
          </EmptyState>
        ) : live.refusal ? (
          <ErrorState title="This cycle cannot be followed live" error={new Error(live.refusal)} />
        ) : (
          <QueryView query={live.lineup} keepsStaleData loadingLabel="Loading your launch…">
            {(snapshot) => (
              <LiveFigures freshness={live.freshness}>
                <MySlot key={snapshot.cycle.id} snapshot={snapshot} pilotId={user.id} />
              </LiveFigures>
            )}
          </QueryView>
        )}
        {/* Pinned to the foot of the tablet's screen: the figures scroll, the caution stays in view. */}
        <CautionLine pinned />
      </Stack>
    </ShipTimeZone>
  );
}
