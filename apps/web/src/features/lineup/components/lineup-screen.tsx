import { useState, type ReactNode } from 'react';
import { Box, Button, Flex, Heading, HStack, Stack, Text } from '@chakra-ui/react';
import type { LaneView, LineupSnapshot, SlotView } from '@catline/contracts';
import { CautionLine } from '../../../components/caution-line.js';
import { ConnectionBadge } from '../../../components/connection-badge.js';
import { LiveFigures, useFiguresLive } from '../../../components/live-figures.js';
import { CyclePicker } from '../../../components/cycle-picker.js';
import { ClosedCycleNotice } from '../../../components/closed-cycle-notice.js';
import { StaleWindNotice } from '../../../components/stale-wind-notice.js';
import { EmptyState, ErrorState, LoadingState, QueryView } from '../../../components/query-states.js';
import { NoticeBanner, refusalNotice, useNotice } from '../../../components/refusal-notice.js';
import { ApiRequestError, errorMessage } from '../../../lib/api-error.js';
import { ShipTimeZone, useShipClock } from '../../../lib/ship-time.js';
import { useSetArmState } from '../../../lib/live/set-arm-state.js';
import { useLiveCycle } from '../../../lib/live/use-live-cycle.js';
import { useViewedCycle } from '../../../lib/queries/use-viewed-cycle.js';
import { useHasRole } from '../../../lib/session-store.js';
import { useCycleTheme } from '../../../theme/use-cycle-theme.js';
import { useApplySuggestion } from '../api/apply-suggestion.js';
import { useAssignPilot } from '../api/assign-pilot.js';
import { useCallSpare } from '../api/call-spare.js';
import { useMarkDown } from '../api/mark-down.js';
import { useMoveSlot } from '../api/move-slot.js';
import { useReturnToPool } from '../api/return-to-pool.js';
import { useSetLoad } from '../api/set-load.js';
import { useSetCatapultStatus } from '../api/set-catapult-status.js';
import { useUpAgain } from '../api/up-again.js';
import { useWaiveGate } from '../api/waive-gate.js';
import { isDone, lineupWarnings } from '../lineup-model.js';
import { slotActions, type SoftGateView } from '../slot-actions.js';
import { AssignPilotDialog } from './assign-pilot-dialog.js';
import { CallSpareDialog } from './call-spare-dialog.js';
import { CatapultStatusDialog } from './catapult-status-dialog.js';
import { LineupBoard } from './lineup-board.js';
import { LoadDialog } from './load-dialog.js';
import { MarkDownDialog } from './mark-down-dialog.js';
import { ReasonDialog } from './reason-dialog.js';
import { SuggestionDialog } from './suggestion-dialog.js';

type OpenDialog =
  | { kind: 'down' | 'pilot' | 'spare' | 'up' | 'return' | 'load'; slot: SlotView }
  /** `warning`: the server's sentence naming the aircraft a catapult down would suspend, to confirm. */
  | { kind: 'catapult'; lane: LaneView; warning?: string }
  | { kind: 'suggestion' }
  | { kind: 'waiver'; slot: SlotView; gate: SoftGateView }
  | null;

function Figure({ label, children, testId }: { label: string; children: ReactNode; testId?: string }) {
  return (
    <Box>
      <Text fontSize="xs" color="fg.muted" textTransform="uppercase" fontWeight="600" lineHeight="1.2">
        {label}
      </Text>
      {/* A size smaller below 1280 px, so the four figures stay on one row on a 1024 px tablet. */}
      <Text
        fontSize={{ base: 'md', xl: 'lg' }}
        textStyle="figure"
        lineHeight="1.3"
        whiteSpace="nowrap"
        data-testid={testId}
      >
        {children}
      </Text>
    </Box>
  );
}

/** The cycle's figures, above its warnings. */
function LineupSummary({ snapshot }: { snapshot: LineupSnapshot }) {
  const { optionalClock, timeRange } = useShipClock();
  const slots = snapshot.slots;
  const launched = slots.filter((slot) => slot.status === 'launched').length;
  // A held spare launches only once it is called for a down aircraft.
  const toLaunch = slots.filter(
    (slot) => slot.status !== 'down' && slot.status !== 'scratched' && !slot.heldSpare,
  ).length;
  return (
    <HStack gap="3" wrap="wrap" rowGap="1" data-testid="lineup-summary">
      <Figure label="Last launch" testId="last-launch">
        {optionalClock(snapshot.lastLaunchAt)}
      </Figure>
      <Figure label="Window">{timeRange(snapshot.cycle.windowStartAt, snapshot.cycle.windowEndAt)}</Figure>
      <Figure label="Launched" testId="launched-count">
        {launched} of {toLaunch}
      </Figure>
      <Figure label="Case">
        {snapshot.cycle.weatherCase} · {snapshot.cycle.night ? 'night' : 'day'}
      </Figure>
    </HStack>
  );
}

function LineupWorkspace({ snapshot }: { snapshot: LineupSnapshot }) {
  const { clock } = useShipClock();
  const cycleId = snapshot.cycle.id;
  const open = snapshot.cycle.state !== 'closed';
  const arranges = useHasRole('handler') && open;
  const plans = useHasRole('handler', 'air_operations') && open;
  const waives = useHasRole('air_boss') && open;
  // Moves are drags, which the disabled fieldset of a stale board does not stop: they wait for it to be live.
  const live = useFiguresLive();
  const editable = arranges && live;
  const { notice, show, dismiss } = useNotice();
  const [dialog, setDialog] = useState<OpenDialog>(null);
  const move = useMoveSlot(cycleId);
  const markDown = useMarkDown(cycleId);
  const catapultStatus = useSetCatapultStatus(cycleId);
  const applySuggestion = useApplySuggestion(cycleId);
  const assignPilot = useAssignPilot(cycleId);
  const callSpare = useCallSpare(cycleId);
  const upAgain = useUpAgain(cycleId);
  const returnToPool = useReturnToPool(cycleId);
  const setLoad = useSetLoad(cycleId);
  const arming = useSetArmState(cycleId);
  const waive = useWaiveGate(cycleId);

  const close = () => setDialog(null);
  const done = (title: string) => () => {
    close();
    show({ tone: 'done', title, message: 'Everyone on the cycle sees it now.' });
  };
  const refused = (action: string) => (error: unknown) => {
    close();
    show(refusalNotice(error, action));
  };

  const spares = snapshot.slots.filter((slot) => slot.spare && slot.catapultId === null && !isDone(slot));

  return (
    <Stack gap="2">
      {notice && <NoticeBanner notice={notice} onDismiss={dismiss} />}
      <LineupBoard
        snapshot={snapshot}
        arranges={arranges}
        editable={editable}
        onMove={(request) => move.mutate(request, { onError: refused('Your move') })}
        actionsFor={(slot) =>
          slotActions(
            slot,
            { arranges, plans, waives },
            {
              markDown: (chosen) => setDialog({ kind: 'down', slot: chosen }),
              assignPilot: (chosen) => setDialog({ kind: 'pilot', slot: chosen }),
              callSpare: (chosen) => setDialog({ kind: 'spare', slot: chosen }),
              upAgain: (chosen) => setDialog({ kind: 'up', slot: chosen }),
              returnToPool: (chosen) => setDialog({ kind: 'return', slot: chosen }),
              setLoad: (chosen) => setDialog({ kind: 'load', slot: chosen }),
              recordArmState: (chosen, armState) =>
                arming.mutate(
                  { slotId: chosen.id, slotVersion: chosen.version, armState },
                  { onSuccess: done(`${chosen.sideNumber} recorded ${armState}`), onError: refused('Armed or safe') },
                ),
              waive: (chosen, gate) => setDialog({ kind: 'waiver', slot: chosen, gate }),
            },
          )
        }
        onCatapultStatus={(lane) => setDialog({ kind: 'catapult', lane })}
        poolAction={
          arranges ? (
            <Button size="sm" minH="tap" colorPalette="accent" onClick={() => setDialog({ kind: 'suggestion' })}>
              Suggest lineup
            </Button>
          ) : (
            <Text fontSize="xs" color="fg.muted" px="2" maxW="9rem" data-testid="read-only-note">
              Read only: the handler arranges the lineup.
            </Text>
          )
        }
        summary={<LineupSummary snapshot={snapshot} />}
        warnings={lineupWarnings(snapshot, clock)}
      />
      {dialog?.kind === 'down' && (
        <MarkDownDialog
          slot={dialog.slot}
          spares={spares}
          pending={markDown.isPending}
          onClose={close}
          onConfirm={(spareSlotId) =>
            markDown.mutate(
              { slotId: dialog.slot.id, slotVersion: dialog.slot.version, spareSlotId },
              { onSuccess: done(`${dialog.slot.sideNumber} is down`), onError: refused('Marking down') },
            )
          }
        />
      )}
      {dialog?.kind === 'pilot' && (
        <AssignPilotDialog
          snapshot={snapshot}
          slot={dialog.slot}
          pending={assignPilot.isPending}
          onClose={close}
          onConfirm={(pilotId) =>
            assignPilot.mutate(
              { slotId: dialog.slot.id, slotVersion: dialog.slot.version, pilotId },
              { onSuccess: done(`Pilot of ${dialog.slot.sideNumber} saved`), onError: refused('The pilot change') },
            )
          }
        />
      )}
      {dialog?.kind === 'spare' && (
        <CallSpareDialog
          snapshot={snapshot}
          down={dialog.slot}
          pending={callSpare.isPending}
          onClose={close}
          onConfirm={(spare) =>
            callSpare.mutate(
              {
                slotId: dialog.slot.id,
                slotVersion: dialog.slot.version,
                spareSlotId: spare.id,
                spareVersion: spare.version,
              },
              {
                onSuccess: done(`${spare.sideNumber} called for ${dialog.slot.sideNumber}`),
                onError: refused('Calling the spare'),
              },
            )
          }
        />
      )}
      {dialog?.kind === 'up' && (
        <ReasonDialog
          title={`${dialog.slot.sideNumber} up again`}
          explanation="It goes back to the deck pool, planned, and can join a catapult again."
          confirmLabel={`${dialog.slot.sideNumber} is up`}
          placeholder="e.g. hydraulic leak fixed"
          pending={upAgain.isPending}
          onClose={close}
          onConfirm={(reason) =>
            upAgain.mutate(
              { slotId: dialog.slot.id, slotVersion: dialog.slot.version, reason },
              { onSuccess: done(`${dialog.slot.sideNumber} is up again`), onError: refused('Up again') },
            )
          }
        />
      )}
      {dialog?.kind === 'return' && (
        <ReasonDialog
          title={`Return ${dialog.slot.sideNumber} to the deck pool`}
          explanation="It leaves its catapult and keeps its pilot; the catapult's steps start again when it next comes up."
          confirmLabel={`Return ${dialog.slot.sideNumber}`}
          placeholder="e.g. nose wheel steering fault"
          agreement="The catapult officer agreed"
          pending={returnToPool.isPending}
          onClose={close}
          onConfirm={(reason, catapultOfficerAgreed) =>
            returnToPool.mutate(
              { slotId: dialog.slot.id, slotVersion: dialog.slot.version, reason, catapultOfficerAgreed },
              { onSuccess: done(`${dialog.slot.sideNumber} is back in the deck pool`), onError: refused('The return') },
            )
          }
        />
      )}
      {dialog?.kind === 'load' && (
        <LoadDialog
          slot={dialog.slot}
          pending={setLoad.isPending}
          onClose={close}
          onConfirm={(load) =>
            setLoad.mutate(
              { slotId: dialog.slot.id, slotVersion: dialog.slot.version, ...load },
              {
                onSuccess: done(`Fuel and stores of ${dialog.slot.sideNumber} saved`),
                onError: refused('The fuel and stores'),
              },
            )
          }
        />
      )}
      {dialog?.kind === 'catapult' && (
        <CatapultStatusDialog
          lane={dialog.lane}
          warning={dialog.warning}
          pending={catapultStatus.isPending}
          onClose={close}
          onConfirm={(reason) =>
            catapultStatus.mutate(
              {
                catapultId: dialog.lane.catapultId,
                status: dialog.lane.status === 'up' ? 'down' : 'up',
                basisStatus: dialog.lane.status,
                reason,
                ...(dialog.warning ? { confirm: true } : {}),
              },
              {
                onSuccess: done(`Cat ${dialog.lane.number} is ${dialog.lane.status === 'up' ? 'down' : 'up'}`),
                onError: (error) =>
                  error instanceof ApiRequestError && error.code === 'aircraft_on_catapult'
                    ? setDialog({ ...dialog, warning: errorMessage(error) })
                    : refused('The catapult change')(error),
              },
            )
          }
        />
      )}
      {dialog?.kind === 'waiver' && (
        <ReasonDialog
          title={`Waiver for ${dialog.slot.sideNumber}`}
          explanation={`${dialog.gate.message} It may launch under your waiver, marked in its record and the cycle's report.`}
          confirmLabel="Grant waiver"
          placeholder="e.g. ship cannot make more wind"
          showsFigures
          pending={waive.isPending}
          onClose={close}
          onConfirm={(reason) =>
            waive.mutate(
              { slotId: dialog.slot.id, slotVersion: dialog.slot.version, gate: dialog.gate.gate, reason },
              { onSuccess: done(`Waiver granted for ${dialog.slot.sideNumber}`), onError: refused('The waiver') },
            )
          }
        />
      )}
      {dialog?.kind === 'suggestion' && (
        <SuggestionDialog
          snapshot={snapshot}
          pending={applySuggestion.isPending}
          onClose={close}
          onApply={(suggestion) =>
            applySuggestion.mutate(
              { basisVersion: suggestion.basisVersion, lanes: suggestion.lanes },
              { onSuccess: done('Suggested lineup applied'), onError: refused('Applying the suggestion') },
            )
          }
        />
      )}
    </Stack>
  );
}

export function LineupScreen() {
  const { cycles, cycleId, cycle, choose, finding } = useViewedCycle();
  const live = useLiveCycle(cycleId);
  useCycleTheme((live.lineup.data?.cycle ?? cycle)?.night);

  return (
    <ShipTimeZone zone={(live.lineup.data?.cycle ?? cycle)?.timeZone}>
      <Stack gap="2">
        <Flex gap="2" rowGap="1" wrap="wrap" align="center">
          <Heading as="h1" size="xl" fontWeight="700" flexShrink={0}>
            Lineup
          </Heading>
          <Box flex="1 1 24rem" minW="0">
            <CautionLine compact />
          </Box>
          {cycle && <ConnectionBadge state={live.connection} />}
          {cycles.data && cycles.data.length > 0 && (
            <CyclePicker cycles={cycles.data} value={cycle?.id} onChange={choose} />
          )}
        </Flex>
        <ClosedCycleNotice cycle={live.lineup.data?.cycle ?? cycle} />
        <StaleWindNotice cycle={live.lineup.data?.cycle ?? cycle} />
        {finding ? (
          <LoadingState label="Finding the current cycle…" />
        ) : cycles.isError && !cycles.data ? (
          <ErrorState error={cycles.error} onRetry={() => void cycles.refetch()} />
        ) : !cycle ? (
          <EmptyState title="No cycle yet">
            Air operations creates cycles; the lineup appears here as soon as one exists.
          </EmptyState>
        ) : live.refusal ? (
          <ErrorState title="This cycle cannot be followed live" error={new Error(live.refusal)} />
        ) : (
          <QueryView query={live.lineup} keepsStaleData loadingLabel="Loading the lineup…">
            {(snapshot) => (
              <LiveFigures freshness={live.freshness}>
                <LineupWorkspace key={snapshot.cycle.id} snapshot={snapshot} />
              </LiveFigures>
            )}
          </QueryView>
        )}
      </Stack>
    </ShipTimeZone>
  );
}
