import { Alert } from '@chakra-ui/react';
import type { CycleView } from '@catline/contracts';
import { useWindAge } from '../lib/wind-age.js';

type WindCycle = Pick<CycleView, 'state' | 'windReadAt' | 'windStaleAt'>;

function StaleWindAlert({ cycle }: { cycle: WindCycle }) {
  const age = useWindAge(cycle.windReadAt, cycle.windStaleAt);
  if (!age.stale) return null;
  return (
    <Alert.Root
      status="warning"
      colorPalette="caution"
      role="status"
      data-testid="stale-wind-notice"
      data-minutes-old={age.minutesOld}
    >
      <Alert.Indicator />
      <Alert.Content>
        <Alert.Title>Wind reading is {age.minutesOld} min old</Alert.Title>
        <Alert.Description>
          The ship takes a reading as current for {age.maxAgeMin} min. Air operations enters a new one; until then each
          launch needs the air boss’s waiver.
        </Alert.Description>
      </Alert.Content>
    </Alert.Root>
  );
}

/**
 * Flags a wind reading older than the ship allows, on every station of a cycle still to launch. It turns on
 * by the clock, while the wind itself sends no message.
 */
export function StaleWindNotice({ cycle }: { cycle: WindCycle | undefined }) {
  if (!cycle || cycle.state === 'closed') return null;
  return <StaleWindAlert cycle={cycle} />;
}
