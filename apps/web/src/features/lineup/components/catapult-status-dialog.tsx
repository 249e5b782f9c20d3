import { useState } from 'react';
import { Input, Stack, Text } from '@chakra-ui/react';
import type { LaneView } from '@catline/contracts';
import { ActionDialog } from '../../../components/action-dialog.js';
import { FormField } from '../../../components/form-field.js';

interface CatapultStatusDialogProps {
  lane: LaneView;
  /** The server's sentence naming the aircraft on the catapult: the next confirm marks it down anyway. */
  warning?: string;
  pending: boolean;
  onClose: () => void;
  onConfirm: (reason: string | undefined) => void;
}

export function CatapultStatusDialog({ lane, warning, pending, onClose, onConfirm }: CatapultStatusDialogProps) {
  const goingDown = lane.status === 'up';
  const [reason, setReason] = useState('');
  const [touched, setTouched] = useState(false);
  const missingReason = goingDown && reason.trim().length === 0;
  return (
    <ActionDialog
      open
      title={goingDown ? `Mark cat ${lane.number} down` : `Bring cat ${lane.number} back up`}
      onClose={onClose}
      confirmLabel={
        warning ? 'Mark down and suspend' : goingDown ? `Cat ${lane.number} is down` : `Cat ${lane.number} is up`
      }
      onConfirm={() => {
        setTouched(true);
        if (!missingReason) onConfirm(reason.trim() || undefined);
      }}
      pending={pending}
      tone={goingDown ? 'nogo' : 'accent'}
    >
      <Stack gap="4">
        <Text>
          {goingDown
            ? 'Its aircraft stay in the lane but are no-go until it is back up. Move them to another catapult if it will be long.'
            : 'Its aircraft become available to launch again.'}
        </Text>
        {warning && (
          <Text role="alert" fontWeight="700" data-testid="catapult-down-warning">
            {warning}
          </Text>
        )}
        {goingDown && (
          <FormField
            label="Reason"
            required
            error={touched && missingReason ? 'Say why the catapult is down.' : undefined}
          >
            <Input
              value={reason}
              onChange={(event) => setReason(event.currentTarget.value)}
              placeholder="e.g. shuttle fault"
              maxLength={200}
            />
          </FormField>
        )}
      </Stack>
    </ActionDialog>
  );
}
