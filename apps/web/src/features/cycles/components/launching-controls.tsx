import { useState } from 'react';
import { Button, HStack, Stack, Text } from '@chakra-ui/react';
import type { CycleView } from '@catline/contracts';
import type { Notice } from '../../../components/refusal-notice.js';
import { refusalNotice } from '../../../components/refusal-notice.js';
import { ApiRequestError, errorMessage } from '../../../lib/api-error.js';
import { useEndCycleStep } from '../api/end-cycle-step.js';
import { useStartCycle } from '../api/start-cycle.js';
import { startBlockedBy } from '../launch-prerequisites-model.js';

/**
 * The air boss's start and stop of launching. The start waits for every launch prerequisite to be ticked,
 * and says which are not. Starting outside the launch window is first refused with a warning; the air
 * boss reads it and starts anyway with a second, deliberate press.
 */
export function LaunchingControls({ cycle, onRefused }: { cycle: CycleView; onRefused: (notice: Notice) => void }) {
  const start = useStartCycle(cycle.id);
  const stop = useEndCycleStep(cycle.id, 'stop');
  const [warning, setWarning] = useState<string | null>(null);

  const send = (confirmOutsideWindow: boolean) =>
    start.mutate(
      { basisVersion: cycle.version, confirmOutsideWindow },
      {
        onSuccess: () => setWarning(null),
        onError: (error) => {
          if (error instanceof ApiRequestError && error.code === 'outside_window') setWarning(errorMessage(error));
          else onRefused(refusalNotice(error, 'Starting'));
        },
      },
    );

  if (cycle.state === 'executing') {
    return (
      <Button
        size="lg"
        colorPalette="nogo"
        variant="outline"
        loading={stop.isPending}
        onClick={() => stop.mutate(cycle.version, { onError: (error) => onRefused(refusalNotice(error, 'Stopping')) })}
      >
        Stop launching
      </Button>
    );
  }
  if (cycle.state !== 'planning') return null;
  if (warning) {
    return (
      <Stack gap="2" role="alert" maxW="md">
        <Text fontWeight="700">Outside the launch window</Text>
        <Text>{warning}</Text>
        <HStack gap="2" wrap="wrap">
          <Button size="lg" colorPalette="go" loading={start.isPending} onClick={() => send(true)}>
            Start anyway
          </Button>
          <Button size="lg" variant="outline" onClick={() => setWarning(null)}>
            Do not start
          </Button>
        </HStack>
      </Stack>
    );
  }
  const blockedBy = startBlockedBy(cycle);
  const reasonId = `start-blocked-${cycle.id}`;
  return (
    <Stack gap="1" maxW="md">
      <Button
        size="lg"
        colorPalette="go"
        loading={start.isPending}
        disabled={blockedBy !== null}
        aria-describedby={blockedBy ? reasonId : undefined}
        onClick={() => send(false)}
      >
        Start launching
      </Button>
      {blockedBy && (
        <Text id={reasonId} fontSize="sm">
          {blockedBy}
        </Text>
      )}
    </Stack>
  );
}
