import { Box, Button, Flex, Grid, Stack, Text } from '@chakra-ui/react';
import type { LineupSnapshot, ReadinessStep } from '@catline/contracts';
import { CautionLine } from '../../../components/caution-line.js';
import { ConnectionBadge } from '../../../components/connection-badge.js';
import { LaunchTiming } from '../../../components/launch-timing.js';
import { LiveFigures } from '../../../components/live-figures.js';
import { CyclePicker } from '../../../components/cycle-picker.js';
import { ClosedCycleNotice } from '../../../components/closed-cycle-notice.js';
import { StaleWindNotice } from '../../../components/stale-wind-notice.js';
import { PageHeader } from '../../../components/page-header.js';
import { EmptyState, ErrorState, LoadingState, QueryView } from '../../../components/query-states.js';
import { NoticeBanner, refusalNotice, useNotice } from '../../../components/refusal-notice.js';
import { SlotStatusBadge } from '../../../components/slot-status-badge.js';
import { SuspendControls } from '../../../components/suspend-controls.js';
import { ShipTimeZone, useShipClock } from '../../../lib/ship-time.js';
import { useSetArmState } from '../../../lib/live/set-arm-state.js';
import { useLiveCycle } from '../../../lib/live/use-live-cycle.js';
import { useViewedCycle } from '../../../lib/queries/use-viewed-cycle.js';
import { useSessionUser } from '../../../lib/session-store.js';
import { useCycleTheme } from '../../../theme/use-cycle-theme.js';
import { useAdvanceSlot } from '../api/advance-slot.js';
import { useLaunchSlot } from '../api/launch-slot.js';
import { useSuspendSlot } from '../api/suspend-slot.js';
import { STEP_LABELS } from '../../../lib/readiness-step-labels.js';
import { canSuspend, catapultQueue, lastLaunched } from '../cat-station-model.js';
import { stationState } from '../station-state.js';
import { useGiveSuspendReason } from '../api/give-suspend-reason.js';
import { useReportColdShot } from '../api/report-cold-shot.js';
import { useReportDownOnCatapult } from '../api/report-down-on-catapult.js';
import { useReportHangfire } from '../api/report-hangfire.js';
import { useUndoStep } from '../api/undo-step.js';
import { useUndoWindow } from '../hooks/use-undo-window.js';
import { useLaunchIntent } from '../hooks/use-launch-intent.js';
import { DepartureNote } from '../../../components/departure-note.js';
import { AircraftFigures } from './aircraft-figures.js';
import { ArmStateButtons } from './arm-state-buttons.js';
import { CatapultEvents } from './catapult-events.js';
import { LaunchPanel } from './launch-panel.js';
import { NextUp } from './next-up.js';
import { ReadinessSteps } from './readiness-steps.js';
import { StationBanner } from './station-banner.js';
import { DeckStatusLine } from '../../../components/deck-status-line.js';

function Station({ snapshot, catapultId }: { snapshot: LineupSnapshot; catapultId: number }) {
  const { optionalClock } = useShipClock();
  const cycleId = snapshot.cycle.id;
  const queue = catapultQueue(snapshot, catapultId);
  const current = queue?.current;
  const { notice, show, dismiss } = useNotice();
  const advance = useAdvanceSlot(cycleId);
  const suspend = useSuspendSlot(cycleId);
  const suspendReason = useGiveSuspendReason(cycleId);
  const launch = useLaunchSlot(cycleId);
  const undo = useUndoStep(cycleId);
  const hangfire = useReportHangfire(cycleId);
  const downOnCatapult = useReportDownOnCatapult(cycleId);
  const coldShot = useReportColdShot(cycleId);
  const arming = useSetArmState(cycleId);
  const undoWindow = useUndoWindow();
  const launchKey = useLaunchIntent(current?.id);
  const anyPending = [advance, suspend, suspendReason, launch, undo, hangfire, downOnCatapult, coldShot, arming].some(
    (command) => command.isPending,
  );

  if (!queue) {
    return (
      <EmptyState title="Your catapult is not in this cycle">
        Pick the cycle of your ship above, or ask the admin to check your catapult.
      </EmptyState>
    );
  }
  const { lane, next } = queue;
  const refused = (action: string) => (error: unknown) => show(refusalNotice(error, action));
  const events = (
    <CatapultEvents
      current={current}
      lastLaunched={lastLaunched(snapshot, catapultId)}
      catapultNumber={lane.number}
      pending={anyPending}
      onHangfire={(slot) =>
        hangfire.mutate({ slotId: slot.id, slotVersion: slot.version }, { onError: refused('Hangfire') })
      }
      onDownOnCatapult={(slot, outcome) =>
        downOnCatapult.mutate(
          { slotId: slot.id, slotVersion: slot.version, outcome },
          { onError: refused('Down on the catapult') },
        )
      }
      onColdShot={(slot) =>
        coldShot.mutate({ slotId: slot.id, slotVersion: slot.version }, { onError: refused('Cold shot') })
      }
    />
  );

  return (
    <Stack gap="3">
      <StationBanner state={stationState(lane, current, lane.readinessSteps)} />
      {notice && <NoticeBanner notice={notice} onDismiss={dismiss} />}
      <DeckStatusLine lane={lane} size="lg" />
      {current && (
        <SuspendControls
          slot={current}
          possible={canSuspend(current)}
          pending={suspend.isPending || suspendReason.isPending}
          onSuspend={() =>
            suspend.mutate({ slotId: current.id, slotVersion: current.version }, { onError: refused('Suspend') })
          }
          onReason={(reason) =>
            suspendReason.mutate(
              { slotId: current.id, slotVersion: current.version, ...reason },
              { onError: refused('The reason') },
            )
          }
        />
      )}
      {!current ? (
        <>
          <EmptyState title={`No aircraft waiting on cat ${lane.number}`}>
            The handler has not put anyone in this lane, or every aircraft in it has gone.
          </EmptyState>
          {events}
        </>
      ) : (
        <Grid
          templateColumns={{ base: 'minmax(0, 1fr)', lg: 'minmax(0, 3fr) minmax(0, 2fr)' }}
          gap="4"
          alignItems="start"
        >
          <Stack
            gap="4"
            as="section"
            aria-label="On the catapult"
            data-testid="current-aircraft"
            data-side-number={current.sideNumber}
          >
            <Flex gap="3" align="center" wrap="wrap">
              <Text fontSize={{ base: '3xl', md: '4xl' }} fontWeight="700" lineHeight="1">
                {current.sideNumber}
              </Text>
              <Box>
                <Text fontWeight="600">
                  {current.typeDesignation} · {current.squadronCode}
                </Text>
                <Text fontSize="sm" color="fg.muted">
                  {current.pilotName ?? 'No pilot assigned'} · projected {optionalClock(current.projectedLaunchAt)}
                  {current.timing && (
                    <>
                      {' · '}
                      <LaunchTiming timing={current.timing} />
                    </>
                  )}
                </Text>
              </Box>
              <SlotStatusBadge status={current.status} size="lg" />
            </Flex>
            <AircraftFigures slot={current} />
            <DepartureNote slot={current} weatherCase={snapshot.cycle.weatherCase} size="md" />
            <ArmStateButtons
              slot={current}
              pending={anyPending}
              onRecord={(armState) =>
                arming.mutate(
                  { slotId: current.id, slotVersion: current.version, armState },
                  { onError: refused('Armed or safe') },
                )
              }
            />
          </Stack>
          <Stack gap="4">
            <ReadinessSteps
              slot={current}
              steps={lane.readinessSteps}
              night={snapshot.cycle.night}
              pending={advance.isPending}
              onAdvance={(request) =>
                !anyPending &&
                advance.mutate(
                  { slotId: current.id, slotVersion: current.version, ...request },
                  {
                    onError: refused('That step'),
                    onSuccess: () =>
                      request.to !== 'resume' && undoWindow.took({ slotId: current.id, step: request.to }),
                  },
                )
              }
            />
            {undoWindow.taken?.slotId === current.id && (
              <Button
                h="touch"
                variant="outline"
                colorPalette="caution"
                disabled={anyPending}
                onClick={() =>
                  undo.mutate(
                    { slotId: current.id, slotVersion: current.version },
                    { onError: refused('Undo'), onSettled: undoWindow.clear },
                  )
                }
                data-testid="undo-step"
              >
                Undo {STEP_LABELS[undoWindow.taken.step as ReadinessStep].toLowerCase()}
              </Button>
            )}
            <LaunchPanel
              key={current.id}
              slot={current}
              steps={lane.readinessSteps}
              pending={launch.isPending}
              onLaunch={() => {
                // A second tap while the first is on its way does nothing; a retry reuses the same key.
                if (launch.isPending) return;
                launch.mutate(
                  { slotId: current.id, slotVersion: current.version, idempotencyKey: launchKey() },
                  { onError: refused('Launch') },
                );
              }}
            />
            {events}
            <NextUp
              slots={next}
              pending={anyPending}
              onTaxi={(slot) =>
                advance.mutate(
                  { slotId: slot.id, slotVersion: slot.version, to: 'taxiing' },
                  { onError: refused('Taxi') },
                )
              }
            />
          </Stack>
        </Grid>
      )}
    </Stack>
  );
}

export function CatStationScreen() {
  const user = useSessionUser();
  const { cycles, cycleId, cycle, choose, finding } = useViewedCycle();
  const live = useLiveCycle(cycleId);
  const snapshot = live.lineup.data;
  useCycleTheme((snapshot?.cycle ?? cycle)?.night);
  const lane = snapshot?.lanes.find((candidate) => candidate.catapultId === user.catapultId);

  return (
    <ShipTimeZone zone={(snapshot?.cycle ?? cycle)?.timeZone}>
      <Stack gap="3">
        <PageHeader
          title={lane ? `Cat station · Cat ${lane.number}` : 'Cat station'}
          subtitle={lane && `${lane.position} catapult${cycle ? ` · cycle ${cycle.number}` : ''}`}
        >
          {cycle && <ConnectionBadge state={live.connection} />}
          {cycles.data && cycles.data.length > 1 && (
            <CyclePicker cycles={cycles.data} value={cycle?.id} onChange={choose} />
          )}
        </PageHeader>
        <ClosedCycleNotice cycle={snapshot?.cycle ?? cycle} />
        <StaleWindNotice cycle={snapshot?.cycle ?? cycle} />
        {user.catapultId === null ? (
          <EmptyState title="No catapult assigned to you">
            The admin assigns each catapult officer a catapult under People.
          </EmptyState>
        ) : finding ? (
          <LoadingState label="Finding the current cycle…" />
        ) : cycles.isError && !cycles.data ? (
          <ErrorState error={cycles.error} onRetry={() => void cycles.refetch()} />
        ) : !cycle ? (
          <EmptyState title="No cycle yet">
            Your catapult's aircraft appear here once air operations creates a cycle.
          </EmptyState>
        ) : live.refusal ? (
          <ErrorState title="This cycle cannot be followed live" error={new Error(live.refusal)} />
        ) : (
          <QueryView query={live.lineup} keepsStaleData loadingLabel="Loading your catapult…">
            {(data) => (
              <LiveFigures freshness={live.freshness}>
                <Station key={data.cycle.id} snapshot={data} catapultId={user.catapultId!} />
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
