import { useEffect, useRef } from 'react';
import { Box, chakra, Text } from '@chakra-ui/react';
import type { LineupChange } from '@catline/contracts';
import { useShipClock } from '../../../lib/ship-time.js';

const StepButton = chakra('button', {
  base: {
    display: 'block',
    width: '100%',
    textAlign: 'start',
    px: '2',
    py: '1',
    rounded: 'card',
    cursor: 'pointer',
    _hover: { bg: 'bg.muted' },
    _focusVisible: { outline: '2px solid', outlineColor: 'accent.focusRing' },
  },
});

/** Every change of the log, each a button to jump to it; the step on show is marked and kept in view. */
export function ChangeLogList({
  changes,
  step,
  onStep,
}: {
  changes: LineupChange[];
  step: number;
  onStep: (step: number) => void;
}) {
  const { clock } = useShipClock();
  const listRef = useRef<HTMLOListElement>(null);
  useEffect(() => {
    const list = listRef.current;
    const current = list?.querySelector<HTMLElement>('[aria-current="step"]');
    // Scroll the list alone; scrollIntoView would move the whole page too.
    if (list && current) list.scrollTop = current.offsetTop - list.clientHeight / 2;
  }, [step]);

  return (
    <Box as="section" aria-label="Change log" borderWidth="1px" rounded="card" bg="bg.panel" minW="0">
      <Text fontWeight="700" px="3" pt="2" pb="1">
        Change log ({changes.length})
      </Text>
      <chakra.ol
        ref={listRef}
        listStyleType="none"
        m="0"
        px="1"
        pb="1"
        maxH={{ base: '16rem', xl: '34rem' }}
        overflowY="auto"
        position="relative"
      >
        {changes.map((change, index) => {
          const current = index + 1 === step;
          return (
            <li key={change.version}>
              <StepButton
                type="button"
                aria-current={current ? 'step' : undefined}
                bg={current ? 'accent.subtle' : undefined}
                onClick={() => onStep(index + 1)}
              >
                <Text fontSize="xs" color="fg.muted" textStyle="figure">
                  {change.version} · {clock(change.at)} · {change.actor.name}
                </Text>
                <Text fontSize="sm" fontWeight={current ? '700' : '400'}>
                  {change.summary}
                </Text>
              </StepButton>
            </li>
          );
        })}
      </chakra.ol>
    </Box>
  );
}
