import { useState } from 'react';
import { Button, HStack, Stack, Text } from '@chakra-ui/react';
import type { DownOnCatapultOutcome, SlotView } from '@catline/contracts';
import { canGoDownOnCatapult, canReportHangfire } from '../cat-station-model.js';

interface CatapultEventsProps {
  /** The aircraft on the catapult; undefined when none. */
  current: SlotView | undefined;
  /** The aircraft launched last from this catapult; undefined before the first shot. */
  lastLaunched: SlotView | undefined;
  catapultNumber: number;
  pending: boolean;
  onHangfire: (slot: SlotView) => void;
  onDownOnCatapult: (slot: SlotView, outcome: DownOnCatapultOutcome) => void;
  onColdShot: (slot: SlotView) => void;
}

type Asking = 'down' | 'cold_shot' | null;

/**
 * What goes wrong at the shot, each one tap away (a hangfire) or one tap and a choice (down on the
 * catapult, a suspected cold shot, which takes the catapult down).
 */
export function CatapultEvents({
  current,
  lastLaunched,
  catapultNumber,
  pending,
  onHangfire,
  onDownOnCatapult,
  onColdShot,
}: CatapultEventsProps) {
  const [asking, setAsking] = useState<Asking>(null);
  const hangfire = current !== undefined && canReportHangfire(current);
  const down = current !== undefined && canGoDownOnCatapult(current);
  if (!hangfire && !down && !lastLaunched) return null;
  const done = () => setAsking(null);
  return (
    <Stack as="section" aria-label="Events at the catapult" gap="2" data-testid="catapult-events">
      <Text fontWeight="700">Events at the catapult</Text>
      {hangfire && (
        <Button
          h="touch"
          colorPalette="nogo"
          disabled={pending}
          onClick={() => onHangfire(current)}
          data-testid="hangfire"
        >
          Hangfire: {current.sideNumber} did not go
        </Button>
      )}
      {down &&
        (asking === 'down' ? (
          <Stack gap="2" borderWidth="2px" borderColor="nogo.border" rounded="card" p="2.5">
            <Text fontWeight="600">{current.sideNumber} unserviceable on the catapult:</Text>
            <HStack gap="2" wrap="wrap">
              <Button
                h="touch"
                flex="1"
                colorPalette="caution"
                disabled={pending}
                onClick={() => {
                  onDownOnCatapult(current, 'pool');
                  done();
                }}
                data-testid="down-on-catapult-pool"
              >
                Back to the deck pool
              </Button>
              <Button
                h="touch"
                flex="1"
                colorPalette="nogo"
                disabled={pending}
                onClick={() => {
                  onDownOnCatapult(current, 'down');
                  done();
                }}
                data-testid="down-on-catapult-down"
              >
                Down, out of the cycle
              </Button>
              <Button h="touch" flex="1" variant="outline" onClick={done}>
                Cancel
              </Button>
            </HStack>
          </Stack>
        ) : (
          <Button
            h="touch"
            variant="outline"
            colorPalette="nogo"
            disabled={pending}
            onClick={() => setAsking('down')}
            data-testid="down-on-catapult"
          >
            {current.sideNumber} down on the catapult…
          </Button>
        ))}
      {lastLaunched &&
        (asking === 'cold_shot' ? (
          <Stack gap="2" borderWidth="2px" borderColor="nogo.border" rounded="card" p="2.5">
            <Text fontWeight="600">
              Report a suspected cold shot on {lastLaunched.sideNumber}? Cat {catapultNumber} goes down for inspection.
            </Text>
            <HStack gap="2" wrap="wrap">
              <Button
                h="touch"
                flex="1"
                colorPalette="nogo"
                disabled={pending}
                onClick={() => {
                  onColdShot(lastLaunched);
                  done();
                }}
                data-testid="cold-shot-confirm"
              >
                Report, cat {catapultNumber} down
              </Button>
              <Button h="touch" flex="1" variant="outline" onClick={done}>
                Cancel
              </Button>
            </HStack>
          </Stack>
        ) : (
          <Button
            h="touch"
            variant="outline"
            colorPalette="nogo"
            disabled={pending}
            onClick={() => setAsking('cold_shot')}
            data-testid="cold-shot"
          >
            Suspected cold shot: {lastLaunched.sideNumber}…
          </Button>
        ))}
    </Stack>
  );
}
