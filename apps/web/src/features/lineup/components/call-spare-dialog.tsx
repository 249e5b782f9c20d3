import { useState } from 'react';
import { Stack, Text } from '@chakra-ui/react';
import type { LineupSnapshot, SlotView, SpareMatch } from '@catline/contracts';
import { ActionDialog } from '../../../components/action-dialog.js';
import { FormField } from '../../../components/form-field.js';
import { ErrorState, LoadingState } from '../../../components/query-states.js';
import { SelectInput } from '../../../components/select-field.js';
import { useSpareCandidates } from '../api/get-spare-candidates.js';

const MATCH_LABELS: Record<SpareMatch, string> = { type: 'same type', mission: 'same mission', other: 'other' };

interface CallSpareDialogProps {
  snapshot: LineupSnapshot;
  down: SlotView;
  pending: boolean;
  onClose: () => void;
  onConfirm: (spare: SlotView) => void;
}

/** The held spares for a down aircraft, as the server orders them (type, then mission); the first is chosen. */
export function CallSpareDialog({ snapshot, down, pending, onClose, onConfirm }: CallSpareDialogProps) {
  const candidates = useSpareCandidates(snapshot.cycle.id, down.id, snapshot.version);
  const [chosen, setChosen] = useState('');
  const offered = candidates.data ?? [];
  const spareId = chosen || (offered[0] ? String(offered[0].slotId) : '');
  const spare = snapshot.slots.find((slot) => String(slot.id) === spareId);
  return (
    <ActionDialog
      open
      title={`Call a spare for ${down.sideNumber}`}
      onClose={onClose}
      confirmLabel={spare ? `Call ${spare.sideNumber}` : 'Call the spare'}
      onConfirm={() => spare && onConfirm(spare)}
      pending={pending}
      tone="accent"
    >
      <Stack gap="4">
        <Text>
          The spare joins the deck pool and counts in the launch;{' '}
          {down.pilotName ? `${down.pilotName} moves to it.` : `${down.sideNumber} has no pilot to move to it.`}
        </Text>
        {candidates.isPending ? (
          <LoadingState label="Finding the held spares…" />
        ) : candidates.isError ? (
          <ErrorState error={candidates.error} onRetry={() => void candidates.refetch()} />
        ) : (
          <FormField label="Spare" helper={offered.length === 0 ? 'No spare is held for this cycle.' : undefined}>
            <SelectInput
              value={spareId}
              onChange={setChosen}
              choices={offered.map((candidate) => ({
                value: String(candidate.slotId),
                label: `${candidate.sideNumber} · ${candidate.typeDesignation} · ${candidate.mission} (${MATCH_LABELS[candidate.match]})`,
              }))}
            />
          </FormField>
        )}
      </Stack>
    </ActionDialog>
  );
}
