import { createContext, useContext, type ReactNode } from 'react';
import { chakra, Stack, Text } from '@chakra-ui/react';
import type { Freshness } from '../lib/live/connection-state.js';
import { useShipClock } from '../lib/ship-time.js';

const FreshnessContext = createContext<Freshness>({ live: true });

/** Whether the figures around a component are current: countdowns stop while they are not. */
export const useFiguresLive = () => useContext(FreshnessContext).live;

/**
 * Holds a live screen's figures and the actions that need the server. While they may be stale they are
 * greyed and say when they were last current, and every control inside is disabled (a disabled fieldset),
 * so nobody acts on an old picture.
 */
export function LiveFigures({ freshness, children }: { freshness: Freshness; children: ReactNode }) {
  const { clock } = useShipClock();
  return (
    <FreshnessContext.Provider value={freshness}>
      <Stack gap="2" minW="0" data-testid="live-figures" data-live={String(freshness.live)}>
        {!freshness.live && (
          <Text role="status" fontWeight="700" color="fg.muted" data-testid="not-live">
            Not live — last update {clock(freshness.lastUpdate)}
          </Text>
        )}
        <chakra.fieldset
          disabled={!freshness.live}
          minW="0"
          m="0"
          p="0"
          border="0"
          filter={freshness.live ? undefined : 'grayscale(1)'}
          opacity={freshness.live ? undefined : 0.55}
        >
          {children}
        </chakra.fieldset>
      </Stack>
    </FreshnessContext.Provider>
  );
}
