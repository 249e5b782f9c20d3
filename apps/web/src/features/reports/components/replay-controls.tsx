import { useEffect } from 'react';
import { Box, Button, HStack, Stack, Text } from '@chakra-ui/react';
import { ROLE_LABELS, type LineupChange } from '@catline/contracts';
import { useShipClock } from '../../../lib/ship-time.js';
import { CHANGE_KIND_LABELS, stepForKey } from '../replay-model.js';

interface ReplayControlsProps {
  step: number;
  changes: LineupChange[];
  onStep: (step: number) => void;
}

const isTyping = (target: EventTarget | null) =>
  target instanceof HTMLElement &&
  (target.isContentEditable || ['INPUT', 'SELECT', 'TEXTAREA'].includes(target.tagName));

/** The slider, first/previous/next/last, and the arrow keys anywhere on the page. */
export function ReplayControls({ step, changes, onStep }: ReplayControlsProps) {
  const { clock } = useShipClock();
  const last = changes.length;
  const change = step === 0 ? null : changes[step - 1];

  useEffect(() => {
    const onKey = (event: KeyboardEvent) => {
      // The slider and form fields handle their own keys.
      if (event.altKey || event.ctrlKey || event.metaKey || isTyping(event.target)) return;
      const target = stepForKey(event.key, step, last);
      if (target === null) return;
      event.preventDefault();
      onStep(target);
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [step, last, onStep]);

  const described = change
    ? `Change ${step} of ${last}: ${change.summary}`
    : `Start: the cycle as created, before change 1 of ${last}`;
  return (
    <Stack gap="2" borderWidth="1px" rounded="card" p="3" bg="bg.panel" data-testid="replay-controls">
      <HStack gap="2" wrap="wrap">
        <Button size="sm" variant="outline" onClick={() => onStep(0)} disabled={step === 0}>
          First
        </Button>
        <Button size="sm" variant="outline" onClick={() => onStep(step - 1)} disabled={step === 0}>
          Previous
        </Button>
        <Box flex="1" minW="10rem">
          <input
            type="range"
            min={0}
            max={last}
            value={step}
            onChange={(event) => onStep(Number(event.currentTarget.value))}
            aria-label="Step through the change log"
            aria-valuetext={described}
            style={{ width: '100%', accentColor: 'var(--chakra-colors-accent-solid)' }}
          />
        </Box>
        <Button size="sm" variant="outline" onClick={() => onStep(step + 1)} disabled={step === last}>
          Next
        </Button>
        <Button size="sm" variant="outline" onClick={() => onStep(last)} disabled={step === last}>
          Last
        </Button>
      </HStack>
      <Box aria-live="polite" data-testid="replay-change">
        <Text fontWeight="700">
          {change
            ? `Change ${change.version} of ${last} · ${CHANGE_KIND_LABELS[change.kind]}`
            : `Start · change 0 of ${last}`}
        </Text>
        <Text fontSize="sm">{change ? change.summary : 'The cycle as created: no aircraft yet.'}</Text>
        {change && (
          <Text fontSize="sm" color="fg.muted">
            {clock(change.at)} · {change.actor.name} ({ROLE_LABELS[change.actor.role]})
          </Text>
        )}
      </Box>
      <Text fontSize="xs" color="fg.muted">
        Keys: ← → one change, Page Up / Page Down ten, Home / End the first and last.
      </Text>
    </Stack>
  );
}
