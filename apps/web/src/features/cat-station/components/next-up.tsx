import { Box, Button, Flex, Stack, Text } from '@chakra-ui/react';
import type { SlotView } from '@catline/contracts';
import { LaunchTiming } from '../../../components/launch-timing.js';
import { SlotStatusBadge } from '../../../components/slot-status-badge.js';
import { formatPounds } from '../../../lib/format.js';
import { useShipClock } from '../../../lib/ship-time.js';

interface NextUpProps {
  slots: SlotView[];
  pending: boolean;
  /** The aircraft right behind the one on the catapult taxis up and waits behind the deflector. */
  onTaxi: (slot: SlotView) => void;
}

export function NextUp({ slots, pending, onTaxi }: NextUpProps) {
  const { optionalClock } = useShipClock();
  return (
    <Stack as="section" aria-label="Next on this catapult" gap="2" data-testid="next-up">
      <Text fontWeight="700">Next on this catapult</Text>
      {slots.length === 0 && <Text color="fg.muted">No one after this aircraft.</Text>}
      {slots.map((slot, index) => (
        <Box key={slot.id} borderWidth="1px" rounded="card" p="2.5" bg="bg.panel">
          <Flex justify="space-between" gap="2" align="center" wrap="wrap">
            <Text fontWeight="700" fontSize="lg">
              {index + 2}. {slot.sideNumber}{' '}
              <Text as="span" fontSize="sm" color="fg.muted" fontWeight="500">
                {slot.typeDesignation} · {slot.squadronCode}
              </Text>
            </Text>
            <SlotStatusBadge status={slot.status} />
          </Flex>
          <Text fontSize="sm" color="fg.muted" textStyle="figure">
            {formatPounds(slot.grossWeightLb)} ·{' '}
            {slot.pilotWeightAckAt ? 'pilot answered the weight' : 'pilot has not answered the weight'} · projected{' '}
            {optionalClock(slot.projectedLaunchAt)}
            {slot.timing && (
              <>
                {' · '}
                <LaunchTiming timing={slot.timing} />
              </>
            )}
          </Text>
          {index === 0 && slot.status === 'planned' && (
            <Button
              mt="2"
              h="touch"
              w="full"
              colorPalette="accent"
              disabled={pending}
              onClick={() => onTaxi(slot)}
              data-testid="taxi-next"
            >
              Taxi {slot.sideNumber} up behind the deflector
            </Button>
          )}
        </Box>
      ))}
    </Stack>
  );
}
