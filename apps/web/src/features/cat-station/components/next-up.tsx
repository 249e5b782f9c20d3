import { Box, Flex, Stack, Text } from '@chakra-ui/react';
import type { SlotView } from '@catline/contracts';
import { SlotStatusBadge } from '../../../components/slot-status-badge.js';
import { formatOptionalClock, formatPounds } from '../../../lib/format.js';

export function NextUp({ slots }: { slots: SlotView[] }) {
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
            {slot.pilotWeightAckAt ? 'weight acknowledged' : 'weight not acknowledged'} · projected{' '}
            {formatOptionalClock(slot.projectedLaunchAt)}
          </Text>
        </Box>
      ))}
    </Stack>
  );
}
