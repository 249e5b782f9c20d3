import { Button, HStack } from '@chakra-ui/react';
import { ARM_STATE_ACTION_LABELS, ARM_STATES, type ArmState, type SlotView } from '@catline/contracts';

/** The crew records the aircraft on the catapult armed or safe; the state in force shows solid and waits. */
export function ArmStateButtons({
  slot,
  pending,
  onRecord,
}: {
  slot: SlotView;
  pending: boolean;
  onRecord: (state: ArmState) => void;
}) {
  return (
    <HStack gap="2" role="group" aria-label={`Armed or safe: ${slot.sideNumber}`}>
      {ARM_STATES.map((state) => (
        <Button
          key={state}
          h="touch"
          flex="1"
          colorPalette="caution"
          variant={slot.armState === state ? 'solid' : 'outline'}
          aria-pressed={slot.armState === state}
          disabled={pending || slot.armState === state}
          onClick={() => onRecord(state)}
        >
          {ARM_STATE_ACTION_LABELS[state]}
        </Button>
      ))}
    </HStack>
  );
}
