import { useState } from 'react';
import { Button, HStack, Input, SimpleGrid, Stack, Text } from '@chakra-ui/react';
import { SUSPEND_REASONS, SUSPEND_REASON_LABELS, type SlotView, type SuspendReasonRequest } from '@catline/contracts';

interface SuspendControlsProps {
  slot: SlotView;
  /** A suspend is possible now (the aircraft is in the readiness steps). */
  possible: boolean;
  pending: boolean;
  onSuspend: () => void;
  onReason: (reason: Omit<SuspendReasonRequest, 'slotVersion'>) => void;
}

/**
 * One tap suspends; the reason follows from quick choices (other with a few words), so stopping a
 * launch never waits for typing. Shared by the Cat station and the pilot's My launch.
 */
export function SuspendControls({ slot, possible, pending, onSuspend, onReason }: SuspendControlsProps) {
  const [other, setOther] = useState<string | null>(null);
  const suspended = slot.status === 'suspended';
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
      {!suspended ? (
        <Button
          h="touch"
          fontSize="xl"
          colorPalette="nogo"
          disabled={!possible || pending}
          loading={pending}
          data-testid="suspend"
          onClick={onSuspend}
        >
          Suspend {slot.sideNumber}
        </Button>
      ) : (
        <>
          <Text fontWeight="700" fontSize="lg" data-testid="suspend-reason-shown">
            {slot.sideNumber} suspended{slot.suspendReason ? `: ${slot.suspendReason}` : ' — why?'}
          </Text>
          <SimpleGrid columns={{ base: 2, md: 3 }} gap="2">
            {SUSPEND_REASONS.map((reason) => (
              <Button
                key={reason}
                h="touch"
                variant={other !== null && reason === 'other' ? 'solid' : 'outline'}
                colorPalette="nogo"
                bg={other !== null && reason === 'other' ? undefined : 'bg.panel'}
                disabled={pending}
                data-testid={`suspend-reason-${reason}`}
                onClick={() => (reason === 'other' ? setOther('') : onReason({ reason }))}
              >
                {SUSPEND_REASON_LABELS[reason]}
              </Button>
            ))}
          </SimpleGrid>
          {other !== null && (
            <HStack gap="2" align="stretch">
              <Input
                aria-label="Other reason"
                placeholder="In a few words"
                value={other}
                onChange={(event) => setOther(event.currentTarget.value)}
                h="touch"
                fontSize="lg"
                bg="bg.panel"
                maxLength={200}
              />
              <Button
                h="touch"
                colorPalette="nogo"
                disabled={pending || other.trim().length === 0}
                data-testid="suspend-reason-other-send"
                onClick={() => {
                  onReason({ reason: 'other', text: other.trim() });
                  setOther(null);
                }}
              >
                Record
              </Button>
            </HStack>
          )}
        </>
      )}
      {!possible && !suspended && (
        <Text fontSize="sm" color="fg.muted">
          Suspend becomes possible once the aircraft is taxiing.
        </Text>
      )}
    </Stack>
  );
}
