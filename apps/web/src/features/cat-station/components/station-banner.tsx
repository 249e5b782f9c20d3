import { Box, Text } from '@chakra-ui/react';
import type { StationState, StationStateKind } from '../station-state.js';

/** Stop in the no-go colour, held in the caution colour, ready in the go colour; waiting stays quiet. */
const PALETTES: Record<StationStateKind, string> = {
  cat_down: 'nogo',
  nogo: 'nogo',
  suspended: 'caution',
  reverify: 'caution',
  waiver: 'caution',
  waiting: 'accent',
  go: 'go',
};

/**
 * My catapult's state across the top of the station, big enough to read from the deck edge. A live
 * region, so a screen reader says each change without the crew having to look.
 */
export function StationBanner({ state }: { state: StationState }) {
  const quiet = state.kind === 'waiting';
  return (
    <Box
      role="status"
      aria-live="polite"
      aria-atomic="true"
      data-testid="station-banner"
      data-state={state.kind}
      colorPalette={PALETTES[state.kind]}
      bg={quiet ? 'colorPalette.subtle' : 'colorPalette.solid'}
      color={quiet ? 'colorPalette.fg' : 'colorPalette.contrast'}
      borderWidth="2px"
      borderColor="colorPalette.border"
      rounded="card"
      px="4"
      py="3"
      w="full"
    >
      <Text fontSize={{ base: '3xl', md: '5xl' }} fontWeight="800" lineHeight="1.1" letterSpacing="wide">
        {state.title}
      </Text>
      {state.detail && (
        <Text fontSize={{ base: 'lg', md: '2xl' }} fontWeight="600" lineHeight="1.3">
          {state.detail}
        </Text>
      )}
    </Box>
  );
}
