import { Box, Text } from '@chakra-ui/react';
import type { SlotView, WeatherCase } from '@catline/contracts';
import { AIRCRAFT_CLASS_LABELS } from '../lib/aircraft-class.js';

interface DepartureNoteProps {
  slot: Pick<SlotView, 'aircraftClass' | 'departure'>;
  weatherCase: WeatherCase;
  /** The pilot reads it as an instruction; the catapult officer only checks it. */
  size?: 'md' | 'lg';
}

/** The ship's departure for the cycle's case and the aircraft's class, named so nobody reads another class's. */
export function DepartureNote({ slot, weatherCase, size = 'lg' }: DepartureNoteProps) {
  return (
    <Box borderWidth="1px" rounded="card" p={{ base: '3', md: '4' }} as="section" aria-label="Departure">
      <Text fontSize="xs" textTransform="uppercase" letterSpacing="wider" color="fg.muted" fontWeight="600">
        Departure · case {weatherCase} · {AIRCRAFT_CLASS_LABELS[slot.aircraftClass]}
      </Text>
      <Text fontSize={size} data-testid="departure-text">
        {slot.departure || '—'}
      </Text>
    </Box>
  );
}
