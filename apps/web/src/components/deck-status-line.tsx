import { Badge, HStack, Text } from '@chakra-ui/react';
import type { LaneView } from '@catline/contracts';

/**
 * The air boss's deck status of one catapult: clear to launch, or not clear and why. Not clear is a hard stop
 * (the server refuses the launch), so it is said in words and colour both.
 */
export function DeckStatusLine({ lane, size = 'sm' }: { lane: LaneView; size?: 'sm' | 'lg' }) {
  return (
    <HStack gap="2" minW="0" data-testid="deck-status" data-deck-clear={lane.deckClear} role="status">
      <Badge colorPalette={lane.deckClear ? 'go' : 'nogo'} variant={lane.deckClear ? 'outline' : 'solid'} size={size}>
        {lane.deckClear ? 'Deck clear' : 'Deck not clear'}
      </Badge>
      {lane.deckHoldReason && (
        <Text fontSize={size === 'lg' ? 'md' : 'xs'} color="nogo.fg" fontWeight="600" truncate>
          {lane.deckHoldReason}
        </Text>
      )}
    </HStack>
  );
}
