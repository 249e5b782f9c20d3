import { Box, Grid, HStack, Stack, Text } from '@chakra-ui/react';
import type { LineupSnapshot, SuggestedLineup } from '@catline/contracts';
import { ActionDialog } from '../../../components/action-dialog.js';
import { EmptyState, QueryView } from '../../../components/query-states.js';
import { formatOptionalClock } from '../../../lib/format.js';
import { useSuggestion } from '../api/get-suggestion.js';
import { slotsById } from '../lineup-model.js';

interface SuggestionDialogProps {
  snapshot: LineupSnapshot;
  pending: boolean;
  onClose: () => void;
  onApply: (suggestion: SuggestedLineup) => void;
}

type LaneOrder = { catapultId: number; slotIds: number[] }[];

function LineupColumn({
  title,
  lastLaunchAt,
  lanes,
  snapshot,
  testId,
}: {
  title: string;
  lastLaunchAt: string | null;
  lanes: LaneOrder;
  snapshot: LineupSnapshot;
  testId: string;
}) {
  const slots = slotsById(snapshot);
  return (
    <Stack gap="2" data-testid={testId} borderWidth="1px" rounded="card" p="3" minW="0">
      <Text fontWeight="700">{title}</Text>
      <Text fontSize="sm" color="fg.muted">
        Last launch{' '}
        <Text as="span" textStyle="figure" color="fg">
          {formatOptionalClock(lastLaunchAt)}
        </Text>
      </Text>
      {snapshot.lanes.map((lane) => {
        const order = lanes.find((candidate) => candidate.catapultId === lane.catapultId)?.slotIds ?? [];
        return (
          <HStack key={lane.catapultId} align="flex-start" gap="2">
            <Text fontWeight="600" minW="3.5rem">
              Cat {lane.number}
            </Text>
            <Text textStyle="figure" wordBreak="break-word">
              {order.length ? order.map((id) => slots.get(id)?.sideNumber ?? '?').join(' → ') : '—'}
            </Text>
          </HStack>
        );
      })}
    </Stack>
  );
}

/** The suggested lineup beside the current one; nothing changes until the handler applies it. */
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
        {(suggested) =>
          suggested.lanes.every((lane) => lane.slotIds.length === 0) ? (
            <EmptyState title="Nothing to suggest">There are no aircraft to place, or no catapult is up.</EmptyState>
          ) : (
            <Box>
              <Grid templateColumns={{ base: '1fr', md: '1fr 1fr' }} gap="3">
                <LineupColumn
                  title="Now"
                  testId="suggestion-now"
                  lastLaunchAt={snapshot.lastLaunchAt}
                  lanes={snapshot.lanes}
                  snapshot={snapshot}
                />
                <LineupColumn
                  title="Suggested"
                  testId="suggestion-proposed"
                  lastLaunchAt={suggested.lastLaunchAt}
                  lanes={suggested.lanes}
                  snapshot={snapshot}
                />
              </Grid>
              <Text mt="3" fontSize="sm" color="fg.muted">
                Applying replaces every lane's order with the suggestion. You can drag from there.
              </Text>
            </Box>
          )
        }
      </QueryView>
    </ActionDialog>
  );
}
