import { Alert } from '@chakra-ui/react';
import type { CycleView } from '@catline/contracts';

/**
 * Says plainly that the cycle on screen is closed: it can close under a person's eyes (its last launch,
 * or air operations), and its lineup then no longer changes.
 */
export function ClosedCycleNotice({ cycle }: { cycle: Pick<CycleView, 'number' | 'state'> | undefined }) {
  if (cycle?.state !== 'closed') return null;
  return (
    <Alert.Root status="info" role="status" data-testid="closed-cycle-notice">
      <Alert.Indicator />
      <Alert.Content>
        <Alert.Title>This cycle is closed</Alert.Title>
        <Alert.Description>
          Cycle {cycle.number} launches nothing more; choose another cycle to follow a launch.
        </Alert.Description>
      </Alert.Content>
    </Alert.Root>
  );
}
