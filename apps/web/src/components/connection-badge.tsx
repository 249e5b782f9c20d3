import { Box, HStack, Text } from '@chakra-ui/react';
import type { ConnectionState } from '../lib/live/connection-state.js';
import { useShipClock } from '../lib/ship-time.js';

const looks = {
  connecting: { palette: 'gray', label: () => 'Connecting…' },
  live: { palette: 'go', label: () => 'Live' },
  reconnecting: { palette: 'caution', label: () => 'Reconnecting…' },
  offline: { palette: 'nogo', label: (since: string) => `Offline since ${since}` },
} as const;

/** Shown on every live screen: whether what is on screen is still being kept up to date. */
export function ConnectionBadge({ state }: { state: ConnectionState }) {
  const { clock } = useShipClock();
  const look = looks[state.kind];
  const label = look.label(clock('since' in state ? state.since : new Date()));
  return (
    <HStack
      role="status"
      aria-live="polite"
      data-testid="connection-state"
      data-state={state.kind}
      gap="2"
      px="2.5"
      py="1"
      rounded="full"
      borderWidth="1px"
      colorPalette={look.palette}
      borderColor="colorPalette.border"
      bg="colorPalette.subtle"
      color="colorPalette.fg"
      flexShrink={0}
    >
      <Box w="2.5" h="2.5" rounded="full" bg="colorPalette.solid" borderWidth="1px" borderColor="colorPalette.fg" />
      <Text fontSize="sm" fontWeight="600" whiteSpace="nowrap">
        {label}
      </Text>
    </HStack>
  );
}
