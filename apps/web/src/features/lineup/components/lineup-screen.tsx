import { useState } from 'react';
import { Box, Button, Flex, HStack, Stack, Text } from '@chakra-ui/react';
import type { LaneView, LineupSnapshot, SlotView } from '@catline/contracts';
import { CautionLine } from '../../../components/caution-line.js';
import { ConnectionBadge } from '../../../components/connection-badge.js';
import { LiveFigures, useFiguresLive } from '../../../components/live-figures.js';
import { CyclePicker } from '../../../components/cycle-picker.js';
import { PageHeader } from '../../../components/page-header.js';
import { EmptyState, ErrorState, LoadingState, QueryView } from '../../../components/query-states.js';
import { NoticeBanner, refusalNotice, useNotice } from '../../../components/refusal-notice.js';
import { formatClock, formatOptionalClock, formatShortClock } from '../../../lib/format.js';
import { useLiveCycle } from '../../../lib/live/use-live-cycle.js';
import { useViewedCycle } from '../../../lib/queries/use-viewed-cycle.js';
import { useHasRole } from '../../../lib/session-store.js';
import { useCycleTheme } from '../../../theme/use-cycle-theme.js';
import { useApplySuggestion } from '../api/apply-suggestion.js';
import { useMarkDown } from '../api/mark-down.js';
import { useMoveSlot } from '../api/move-slot.js';
import { useSetCatapultStatus } from '../api/set-catapult-status.js';
import { isDone, lineupWarnings } from '../lineup-model.js';
import { slotActions } from '../slot-actions.js';
import { CatapultStatusDialog } from './catapult-status-dialog.js';
import { LineupBoard } from './lineup-board.js';
import { LineupWarnings } from './lineup-warnings.js';
import { MarkDownDialog } from './mark-down-dialog.js';
import { SuggestionDialog } from './suggestion-dialog.js';

type OpenDialog =
  { kind: 'down'; slot: SlotView } | { kind: 'catapult'; lane: LaneView } | { kind: 'suggestion' } | null;

function LineupWorkspace({ snapshot }: { snapshot: LineupSnapshot }) {
  const cycleId = snapshot.cycle.id;
  const arranges = useHasRole('handler') && snapshot.cycle.state !== 'closed';
  // Moves are drags, which the disabled fieldset of a stale board does not stop: they wait for it to be live.
  const live = useFiguresLive();
  const editable = arranges && live;
  const { notice, show, dismiss } = useNotice();
  const [dialog, setDialog] = useState<OpenDialog>(null);
  const move = useMoveSlot(cycleId);
  const markDown = useMarkDown(cycleId);
  const catapultStatus = useSetCatapultStatus(cycleId);
  const applySuggestion = useApplySuggestion(cycleId);

  const close = () => setDialog(null);
  const done = (title: string) => () => {
    close();
    show({ tone: 'done', title, message: 'Everyone on the cycle sees it now.' });
  };
  const refused = (action: string) => (error: unknown) => {
    close();
    show(refusalNotice(error, action));
  };

  const slots = snapshot.slots;
  const launched = slots.filter((slot) => slot.status === 'launched').length;
  const toLaunch = slots.filter((slot) => slot.status !== 'down' && slot.status !== 'scratched').length;
  const spares = slots.filter((slot) => slot.spare && slot.catapultId === null && !isDone(slot));

  return (
    <Stack gap="3">
      {notice && <NoticeBanner notice={notice} onDismiss={dismiss} />}
      <Flex gap="3" wrap="wrap" align="stretch">
        <Stack
          gap="1"
          flex="1 1 18rem"
          borderWidth="1px"
          rounded="card"
          p="3"
          bg="bg.panel"
          data-testid="lineup-summary"
        >
          <HStack gap="4" wrap="wrap">
            <Box>
              <Text fontSize="xs" color="fg.muted" textTransform="uppercase" fontWeight="600">
                Last projected launch
              </Text>
              <Text fontSize="2xl" textStyle="figure" data-testid="last-launch">
                {formatOptionalClock(snapshot.lastLaunchAt)}
              </Text>
            </Box>
            <Box>
              <Text fontSize="xs" color="fg.muted" textTransform="uppercase" fontWeight="600">
                Window
              </Text>
              <Text fontSize="lg" textStyle="figure">
                {formatShortClock(snapshot.cycle.windowStartAt)}–{formatShortClock(snapshot.cycle.windowEndAt)}
              </Text>
            </Box>
            <Box>
              <Text fontSize="xs" color="fg.muted" textTransform="uppercase" fontWeight="600">
                Launched
              </Text>
              <Text fontSize="lg" textStyle="figure" data-testid="launched-count">
                {launched} of {toLaunch}
              </Text>
            </Box>
          </HStack>
          {arranges ? (
            <HStack gap="2" wrap="wrap" mt="1">
              <Button size="sm" colorPalette="accent" onClick={() => setDialog({ kind: 'suggestion' })}>
                Suggest lineup
              </Button>
              <Text fontSize="xs" color="fg.muted">
                Drag cards, or focus one and press Enter, then the arrow keys.
              </Text>
            </HStack>
          ) : (
            <Text fontSize="sm" color="fg.muted" data-testid="read-only-note">
              Read only: the handler arranges the lineup.
            </Text>
          )}
        </Stack>
        <Box flex="2 1 22rem" minW="0">
          <LineupWarnings warnings={lineupWarnings(snapshot, formatClock)} />
        </Box>
      </Flex>
      <LineupBoard
        snapshot={snapshot}
        editable={editable}
        onMove={(request) => move.mutate(request, { onError: refused('Your move') })}
        actionsFor={(slot) => slotActions(slot, { markDown: (chosen) => setDialog({ kind: 'down', slot: chosen }) })}
        onCatapultStatus={(lane) => setDialog({ kind: 'catapult', lane })}
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
      {dialog?.kind === 'catapult' && (
        <CatapultStatusDialog
          lane={dialog.lane}
          pending={catapultStatus.isPending}
          onClose={close}
          onConfirm={(reason) =>
            catapultStatus.mutate(
              {
                catapultId: dialog.lane.catapultId,
                status: dialog.lane.status === 'up' ? 'down' : 'up',
                basisStatus: dialog.lane.status,
                reason,
              },
              {
                onSuccess: done(`Cat ${dialog.lane.number} is ${dialog.lane.status === 'up' ? 'down' : 'up'}`),
                onError: refused('The catapult change'),
              },
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
  const { cycles, cycle, choose } = useViewedCycle();
  const live = useLiveCycle(cycle?.id);
  const snapshotCycle = live.lineup.data?.cycle ?? cycle;
  useCycleTheme(snapshotCycle?.night);

  return (
    <Stack gap="3">
      <PageHeader
        title="Lineup"
        subtitle={
          snapshotCycle &&
          `Cycle ${snapshotCycle.number} · ${snapshotCycle.state} · ${snapshotCycle.night ? 'night' : 'day'} · case ${snapshotCycle.weatherCase}`
        }
      >
        {cycle && <ConnectionBadge state={live.connection} />}
        {cycles.data && cycles.data.length > 0 && (
          <CyclePicker cycles={cycles.data} value={cycle?.id} onChange={choose} />
        )}
      </PageHeader>
      <CautionLine />
      {cycles.isPending ? (
        <LoadingState label="Finding the current cycle…" />
      ) : cycles.isError ? (
        <ErrorState error={cycles.error} onRetry={() => void cycles.refetch()} />
      ) : !cycle ? (
        <EmptyState title="No cycle yet">
          Air operations creates cycles; the lineup appears here as soon as one exists.
        </EmptyState>
      ) : live.refusal ? (
        <ErrorState title="This cycle cannot be followed live" error={new Error(live.refusal)} />
      ) : (
        <QueryView query={live.lineup} loadingLabel="Loading the lineup…">
          {(snapshot) => (
            <LiveFigures freshness={live.freshness}>
              <LineupWorkspace key={snapshot.cycle.id} snapshot={snapshot} />
            </LiveFigures>
          )}
        </QueryView>
      )}
    </Stack>
  );
}
