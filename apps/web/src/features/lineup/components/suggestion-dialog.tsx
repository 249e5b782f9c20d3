import { Box, HStack, Stack, Table, Text } from '@chakra-ui/react';
import type { LineupSnapshot, SuggestedLineup } from '@catline/contracts';
import { ActionDialog } from '../../../components/action-dialog.js';
import { EmptyState, QueryView } from '../../../components/query-states.js';
import { useShipClock } from '../../../lib/ship-time.js';
import { useSuggestion } from '../api/get-suggestion.js';
import { compareSuggestion, type LaneComparison } from '../suggestion-model.js';
import { slotsById } from '../lineup-model.js';

interface SuggestionDialogProps {
  snapshot: LineupSnapshot;
  pending: boolean;
  onClose: () => void;
  onApply: (suggestion: SuggestedLineup) => void;
}

/** "4 min 05 s sooner", "1 min later", "no sooner". */
function gainWords(gainMs: number | null): string {
  if (gainMs === null) return '';
  const seconds = Math.round(Math.abs(gainMs) / 1000);
  if (seconds === 0) return 'no sooner';
  const minutes = Math.floor(seconds / 60);
  const rest = seconds % 60;
  const span = minutes === 0 ? `${rest} s` : `${minutes} min${rest ? ` ${String(rest).padStart(2, '0')} s` : ''}`;
  return `${span} ${gainMs > 0 ? 'sooner' : 'later'}`;
}

function changeWords(lane: LaneComparison): string {
  const parts = [
    lane.joining.length > 0 && `${lane.joining.join(', ')} join`,
    lane.leaving.length > 0 && `${lane.leaving.join(', ')} leave`,
    lane.reordered && 'new order',
  ].filter(Boolean);
  return parts.length > 0 ? parts.join('; ') : 'no change';
}

function Gain({
  label,
  now,
  suggested,
  gain,
  testId,
}: {
  label: string;
  now: string;
  suggested: string;
  gain: string;
  testId: string;
}) {
  return (
    <Box borderWidth="1px" rounded="card" px="3" py="2" data-testid={testId}>
      <Text fontSize="xs" color="fg.muted" textTransform="uppercase" fontWeight="600">
        {label}
      </Text>
      <Text fontSize="lg" textStyle="figure">
        {now} → {suggested}
      </Text>
      <Text fontSize="sm" fontWeight="600">
        {gain}
      </Text>
    </Box>
  );
}

function SuggestionSummary({ snapshot, suggested }: { snapshot: LineupSnapshot; suggested: SuggestedLineup }) {
  const { optionalClock } = useShipClock();
  const comparison = compareSuggestion(snapshot, suggested);
  const slots = slotsById(snapshot);
  const order = (catapultId: number) =>
    (suggested.lanes.find((lane) => lane.catapultId === catapultId)?.slotIds ?? [])
      .map((id) => slots.get(id)?.sideNumber ?? '?')
      .join(' → ');
  const misses = comparison.missesWindow;
  return (
    <Stack gap="3">
      <HStack gap="3" wrap="wrap" align="stretch">
        <Gain
          label="Last launch"
          testId="suggestion-last-launch"
          now={optionalClock(comparison.lastLaunch.now)}
          suggested={optionalClock(comparison.lastLaunch.suggested)}
          gain={gainWords(comparison.lastLaunch.gainMs)}
        />
        <Gain
          label="Aircraft missing the window"
          testId="suggestion-window"
          now={String(misses.now)}
          suggested={String(misses.suggested)}
          gain={
            misses.suggested < misses.now
              ? `${misses.now - misses.suggested} fewer`
              : misses.suggested > misses.now
                ? `${misses.suggested - misses.now} more`
                : 'no fewer'
          }
        />
      </HStack>
      <Table.Root size="sm" data-testid="suggestion-lanes">
        <Table.Header>
          <Table.Row>
            <Table.ColumnHeader>Catapult</Table.ColumnHeader>
            <Table.ColumnHeader>Now</Table.ColumnHeader>
            <Table.ColumnHeader>Suggested</Table.ColumnHeader>
            <Table.ColumnHeader>What changes</Table.ColumnHeader>
          </Table.Row>
        </Table.Header>
        <Table.Body>
          {comparison.lanes.map((lane) => (
            <Table.Row key={lane.catapultId} data-catapult-number={lane.number}>
              <Table.Cell fontWeight="700">Cat {lane.number}</Table.Cell>
              <Table.Cell textStyle="figure">
                {lane.now.count} aircraft, last {optionalClock(lane.now.lastAt)}
              </Table.Cell>
              <Table.Cell textStyle="figure">
                {lane.suggested.count} aircraft, last {optionalClock(lane.suggested.lastAt)}
              </Table.Cell>
              <Table.Cell>
                <Text>{changeWords(lane)}</Text>
                <Text fontSize="xs" color="fg.muted" textStyle="figure" wordBreak="break-word">
                  {order(lane.catapultId)}
                </Text>
              </Table.Cell>
            </Table.Row>
          ))}
        </Table.Body>
      </Table.Root>
      {comparison.leftInPool.length > 0 && (
        <Text fontSize="sm" data-testid="suggestion-left-in-pool">
          Left in the deck pool (no pilot, or no catapult can take them): {comparison.leftInPool.join(', ')}.
        </Text>
      )}
      <Text fontSize="sm" color="fg.muted">
        Applying replaces every lane's order with the suggestion; aircraft already taxiing keep their places. You can
        drag from there.
      </Text>
    </Stack>
  );
}

/** What the suggested lineup changes on each catapult and what it gains; nothing changes until the handler applies it. */
export function SuggestionDialog({ snapshot, pending, onClose, onApply }: SuggestionDialogProps) {
  const suggestion = useSuggestion(snapshot.cycle.id, snapshot.version, true);
  return (
    <ActionDialog
      open
      size="xl"
      title="Suggested lineup"
      onClose={onClose}
      confirmLabel="Apply suggestion"
      confirmDisabled={!suggestion.data}
      onConfirm={() => suggestion.data && onApply(suggestion.data)}
      pending={pending}
    >
      <QueryView query={suggestion} loadingLabel="Working out the quickest lineup…">
        {(suggested) => (
          <Box>
            {suggested.lanes.every((lane) => lane.slotIds.length === 0) ? (
              <EmptyState title="Nothing to suggest">There are no aircraft to place, or no catapult is up.</EmptyState>
            ) : (
              <SuggestionSummary snapshot={snapshot} suggested={suggested} />
            )}
            {/* Said even when nothing can be placed: the handler learns why the aircraft stays in the deck pool. */}
            {suggested.unassigned.length > 0 && (
              <Text mt="2" fontSize="sm" data-testid="suggestion-unassigned">
                Left out, no pilot assigned:{' '}
                {suggested.unassigned
                  .map((id) => snapshot.slots.find((slot) => slot.id === id)?.sideNumber ?? `#${id}`)
                  .join(', ')}
              </Text>
            )}
          </Box>
        )}
      </QueryView>
    </ActionDialog>
  );
}
