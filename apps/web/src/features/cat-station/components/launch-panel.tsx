import { Box, Button, List, Stack, Text } from '@chakra-ui/react';
import type { ReadinessStep, SlotView } from '@catline/contracts';
import { launchBlockers } from '../cat-station-model.js';

interface LaunchPanelProps {
  slot: SlotView;
  steps: readonly ReadinessStep[];
  pending: boolean;
  onLaunch: () => void;
}

/** The shot: offered only when every readiness step is done and every launch gate is open or waived. */
export function LaunchPanel({ slot, steps, pending, onLaunch }: LaunchPanelProps) {
  const blockers = launchBlockers(slot, steps);
  return (
    <Stack
      as="section"
      aria-label="Launch"
      gap="3"
      borderWidth="2px"
      borderColor={blockers.length === 0 ? 'go.border' : 'border'}
      rounded="card"
      p="3"
    >
      <Button
        h="5rem"
        fontSize="2xl"
        fontWeight="700"
        colorPalette="go"
        disabled={blockers.length > 0 || pending}
        loading={pending}
        loadingText="Launching…"
        onClick={onLaunch}
        data-testid="launch"
      >
        Launch {slot.sideNumber}
      </Button>
      {blockers.length > 0 && (
        <Box fontSize="sm" color="fg.muted" data-testid="launch-blockers">
          <Text fontWeight="600">Not yet:</Text>
          <List.Root ps="4">
            {blockers.map((blocker) => (
              <List.Item key={blocker}>{blocker}</List.Item>
            ))}
          </List.Root>
        </Box>
      )}
    </Stack>
  );
}
