import { Box, HStack, Text } from '@chakra-ui/react';
import { CautionIcon } from './icons.js';

export const CAUTION_TEXT =
  "Planning aid only. Launch settings come from the ship's approved launch data and the catapult officer's own checks; the ship's procedures and the service's regulations govern.";

/** Required on every screen that shows a launch figure. */
export function CautionLine() {
  return (
    <Box
      role="note"
      aria-label="Caution"
      data-testid="caution-line"
      bg="caution.subtle"
      color="caution.fg"
      borderWidth="1px"
      borderColor="caution.border"
      rounded="card"
      px="3"
      py="2"
    >
      <HStack gap="2" alignItems="flex-start">
        <Box as="span" fontSize="lg" flexShrink={0} mt="0.5">
          <CautionIcon />
        </Box>
        <Text fontSize="sm" fontWeight="500">
          {CAUTION_TEXT}
        </Text>
      </HStack>
    </Box>
  );
}
