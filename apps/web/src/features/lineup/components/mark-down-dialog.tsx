import { useState } from 'react';
import { Stack, Text } from '@chakra-ui/react';
import { orderSpares, type SlotView } from '@catline/contracts';
import { ActionDialog } from '../../../components/action-dialog.js';
import { FormField } from '../../../components/form-field.js';
import { SelectInput } from '../../../components/select-field.js';

interface MarkDownDialogProps {
  slot: SlotView;
  spares: SlotView[];
  pending: boolean;
  onClose: () => void;
  onConfirm: (spareSlotId: number | undefined) => void;
}

export function MarkDownDialog({ slot, spares, pending, onClose, onConfirm }: MarkDownDialogProps) {
  const [spareId, setSpareId] = useState('');
  // The same order as the server offers a held spare in: type, then mission, then side number.
  const offered = orderSpares(slot, spares, (spare) => spare).map(({ spare }) => spare);
  return (
    <ActionDialog
      open
      title={`Mark ${slot.sideNumber} down`}
      onClose={onClose}
      confirmLabel={`Mark ${slot.sideNumber} down`}
      onConfirm={() => onConfirm(spareId ? Number(spareId) : undefined)}
      pending={pending}
      tone="nogo"
    >
      <Stack gap="4">
        <Text>
          {slot.sideNumber} leaves its lane and will not launch in this cycle. A spare can take its place in the same
          lane and position.
        </Text>
        <FormField
          label="Spare to bring in"
          helper={spares.length === 0 ? 'No spare is waiting in the deck pool.' : undefined}
        >
          <SelectInput
            value={spareId}
            onChange={setSpareId}
            placeholder="No spare"
            choices={offered.map((spare) => ({
              value: String(spare.id),
              label: `${spare.sideNumber} · ${spare.typeDesignation} · ${spare.squadronCode}`,
            }))}
          />
        </FormField>
      </Stack>
    </ActionDialog>
  );
}
