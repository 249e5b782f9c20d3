import { Box, List, Text } from '@chakra-ui/react';
import type { LineupWarning, WarningKind } from '../lineup-model.js';

const palette: Record<WarningKind, string> = {
  no_go: 'nogo',
  catapult_down: 'nogo',
  missed_window: 'caution',
  catapult_closed: 'caution',
  weight_not_agreed: 'gray',
};

export function LineupWarnings({ warnings }: { warnings: LineupWarning[] }) {
  return (
    <Box
      as="section"
      aria-label="Warnings"
      data-testid="lineup-warnings"
      borderWidth="1px"
      rounded="card"
      p="3"
      bg="bg.panel"
    >
      <Text fontWeight="700" mb="1">
        Warnings{' '}
        {warnings.length > 0 && (
          <Text as="span" color="fg.muted">
            ({warnings.length})
          </Text>
        )}
      </Text>
      {warnings.length === 0 ? (
        <Text fontSize="sm" color="fg.muted">
          None: every aircraft in a lane is go and within the window.
        </Text>
      ) : (
        <List.Root gap="1" maxH="9rem" overflowY="auto" ps="0" listStyleType="none">
          {warnings.map((warning) => (
            <List.Item
              key={warning.key}
              data-kind={warning.kind}
              fontSize="sm"
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
    </Box>
  );
}
