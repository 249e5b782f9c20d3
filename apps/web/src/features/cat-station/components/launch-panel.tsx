import { useState } from 'react';
import { Box, Button, Input, List, Stack, Text } from '@chakra-ui/react';
import type { LaneView, LineupSnapshot, SlotView } from '@catline/contracts';
import { FormField } from '../../../components/form-field.js';
import { launchBlockers } from '../cat-station-model.js';

interface LaunchPanelProps {
  slot: SlotView;
  lane: LaneView;
  snapshot: LineupSnapshot;
  pending: boolean;
  onLaunch: (overrideReason: string | undefined) => void;
}

/** The shot: possible only when every required step is done, and a no-go needs a written reason. */
export function LaunchPanel({ slot, lane, snapshot, pending, onLaunch }: LaunchPanelProps) {
  const [overrideReason, setOverrideReason] = useState('');
  const blockers = launchBlockers(slot, lane, snapshot);
  const noGo = slot.figures !== null && !slot.figures.go;
  const needsReason = noGo && overrideReason.trim().length === 0;
  return (
    <Stack
      as="section"
      aria-label="Launch"
      gap="3"
      borderWidth="2px"
      borderColor={blockers.length === 0 && !needsReason ? 'go.border' : 'border'}
      rounded="card"
      p="3"
    >
      {noGo && (
        <FormField label="Launch despite no-go: your reason" required helper="Recorded with the launch.">
          <Input
            value={overrideReason}
            onChange={(event) => setOverrideReason(event.currentTarget.value)}
            h="tap"
            maxLength={300}
          />
        </FormField>
      )}
      <Button
        h="5rem"
        fontSize="2xl"
        fontWeight="700"
        colorPalette="go"
        disabled={blockers.length > 0 || needsReason || pending}
        loading={pending}
        loadingText="Launching…"
        onClick={() => onLaunch(noGo ? overrideReason.trim() : undefined)}
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
