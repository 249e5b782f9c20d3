import { useState } from 'react';
import { Stack, Text } from '@chakra-ui/react';
import type { LineupSnapshot, SlotView } from '@catline/contracts';
import { ActionDialog } from '../../../components/action-dialog.js';
import { FormField } from '../../../components/form-field.js';
import { ErrorState, LoadingState } from '../../../components/query-states.js';
import { SelectInput } from '../../../components/select-field.js';
import { usePilots } from '../api/get-pilots.js';

interface AssignPilotDialogProps {
  snapshot: LineupSnapshot;
  slot: SlotView;
  pending: boolean;
  onClose: () => void;
  onConfirm: (pilotId: number | null) => void;
}

/** Who flies the aircraft; a pilot who already flies another aircraft of the cycle moves from it. */
export function AssignPilotDialog({ snapshot, slot, pending, onClose, onConfirm }: AssignPilotDialogProps) {
  const pilots = usePilots();
  const [chosen, setChosen] = useState(slot.pilotId === null ? '' : String(slot.pilotId));
  const flies = new Map(
    snapshot.slots
      .filter((other) => other.id !== slot.id && other.pilotId !== null && other.status !== 'scratched')
      .map((other) => [other.pilotId, other.sideNumber]),
  );
  return (
    <ActionDialog
      open
      title={`Pilot of ${slot.sideNumber}`}
      onClose={onClose}
      confirmLabel="Save pilot"
      onConfirm={() => onConfirm(chosen ? Number(chosen) : null)}
      pending={pending}
      tone="accent"
    >
      <Stack gap="4">
        <Text>Without a pilot an aircraft stays in the deck pool: it cannot join a catapult.</Text>
        {pilots.isPending ? (
          <LoadingState label="Finding the pilots…" />
        ) : pilots.isError ? (
          <ErrorState error={pilots.error} onRetry={() => void pilots.refetch()} />
        ) : (
          <FormField label="Pilot">
            <SelectInput
              value={chosen}
              onChange={setChosen}
              placeholder="No pilot"
              choices={pilots.data.map((pilot) => ({
                value: String(pilot.id),
                label: flies.has(pilot.id) ? `${pilot.name} (moves from ${flies.get(pilot.id)})` : pilot.name,
              }))}
            />
          </FormField>
        )}
      </Stack>
    </ActionDialog>
  );
}
