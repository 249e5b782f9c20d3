import { Flex, List, Text } from '@chakra-ui/react';
import { useFiguresLive } from '../../../components/live-figures.js';
import type { LineupWarning, WarningKind } from '../lineup-model.js';

const palette: Record<WarningKind, string> = {
  no_go: 'nogo',
  no_pilot: 'caution',
  catapult_down: 'nogo',
  spot_blocked: 'caution',
  missed_window: 'caution',
  catapult_closed: 'caution',
  weight_not_agreed: 'gray',
};

/**
 * The warnings, most serious first, in a short band that scrolls rather than pushing the lanes down;
 * `labelBeside` puts their title to the left, a line less high, where the band shares a row with the figures.
 */
export function LineupWarnings({
  warnings,
  labelBeside = false,
}: {
  warnings: LineupWarning[];
  labelBeside?: boolean;
}) {
  // Not live, the board sits in a disabled fieldset, where axe counts a scroll box as out of the keyboard's
  // reach: then the band shows every warning instead.
  const scrolls = useFiguresLive();
  return (
    <Flex
      as="section"
      direction={labelBeside ? 'row' : 'column'}
      gap={labelBeside ? '2' : '0'}
      minW="0"
      aria-label="Warnings"
      data-testid="lineup-warnings"
      borderWidth="1px"
      rounded="card"
      px="2"
      py="1"
      bg="bg.panel"
    >
      <Text fontSize="xs" color="fg.muted" textTransform="uppercase" fontWeight="600" flexShrink={0}>
        Warnings{warnings.length > 0 && ` (${warnings.length})`}
      </Text>
      {warnings.length === 0 ? (
        <Text fontSize="sm" color="fg.muted">
          None: every aircraft in a lane is go and within the window.
        </Text>
      ) : (
        <List.Root
          gap="0.5"
          maxH={scrolls ? '2.75rem' : undefined}
          overflowY={scrolls ? 'auto' : undefined}
          ps="0"
          listStyleType="none"
          tabIndex={scrolls ? 0 : undefined}
          minW="0"
        >
          {warnings.map((warning) => (
            <List.Item
              key={warning.key}
              data-kind={warning.kind}
              fontSize="sm"
              lineHeight="1.3"
              colorPalette={palette[warning.kind]}
              color="colorPalette.fg"
              borderLeftWidth="3px"
              borderColor="colorPalette.solid"
              ps="2"
            >
              {warning.text}
            </List.Item>
          ))}
        </List.Root>
      )}
    </Flex>
  );
}
