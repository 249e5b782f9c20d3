import { LAUNCH_CAUTION } from '@catline/contracts';
import { Box, HStack, Text } from '@chakra-ui/react';
import { CautionIcon } from './icons.js';

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
          {LAUNCH_CAUTION}
        </Text>
      </HStack>
    </Box>
  );
}
