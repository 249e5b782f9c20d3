import { useState } from 'react';
import { Button, HStack, Input, Stack, Text } from '@chakra-ui/react';
import type { SlotView } from '@catline/contracts';
import { canSuspend } from '../cat-station-model.js';

/** Always on screen: stopping a launch must never be more than one tap and a word away. */
export function SuspendPanel({
  slot,
  pending,
  onSuspend,
}: {
  slot: SlotView | undefined;
  pending: boolean;
  onSuspend: (reason: string) => void;
}) {
  const [reason, setReason] = useState('');
  const [tried, setTried] = useState(false);
  const possible = slot !== undefined && canSuspend(slot);
  const missing = reason.trim().length === 0;
  return (
    <Stack
      as="section"
      aria-label="Suspend"
      gap="2"
      borderWidth="2px"
      borderColor="nogo.border"
      rounded="card"
      p="3"
      bg="nogo.subtle"
    >
      <HStack gap="2" align="stretch" wrap={{ base: 'wrap', md: 'nowrap' }}>
        <Input
          aria-label="Reason to suspend"
          placeholder="Reason to suspend"
          value={reason}
          onChange={(event) => setReason(event.currentTarget.value)}
          h="touch"
          fontSize="lg"
          bg="bg.panel"
          maxLength={200}
          aria-invalid={tried && missing}
        />
        <Button
          h="touch"
          minW="10rem"
          fontSize="xl"
          colorPalette="nogo"
          flexGrow={{ base: 1, md: 0 }}
          disabled={!possible}
          loading={pending}
          data-testid="suspend"
          onClick={() => {
            setTried(true);
            if (missing || !slot) return;
            onSuspend(reason.trim());
            setReason('');
            setTried(false);
          }}
        >
          Suspend
        </Button>
      </HStack>
      {tried && missing && (
        <Text color="nogo.fg" fontWeight="600" role="alert">
          Give a reason, then suspend.
        </Text>
      )}
      {!possible && (
        <Text fontSize="sm" color="fg.muted">
          {slot?.status === 'suspended'
            ? `Suspended: ${slot.suspendReason ?? 'no reason given'}`
            : 'Suspend becomes possible once the aircraft is taxiing.'}
        </Text>
      )}
    </Stack>
  );
}
