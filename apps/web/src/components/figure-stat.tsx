import type { ReactNode } from 'react';
import { Box, Text } from '@chakra-ui/react';

/** One labelled launch figure, large enough to read at arm's length. */
export function FigureStat({
  label,
  value,
  tone,
  size = 'lg',
}: {
  label: string;
  value: ReactNode;
  tone?: 'go' | 'nogo' | 'caution';
  size?: 'md' | 'lg' | 'xl';
}) {
  return (
    <Box minW="0">
      <Text fontSize="xs" textTransform="uppercase" letterSpacing="wider" color="fg.muted" fontWeight="600">
        {label}
      </Text>
      <Text
        fontSize={{ md: 'md', lg: 'xl', xl: '3xl' }[size]}
        textStyle="figure"
        color={tone ? `${tone}.fg` : 'fg'}
        lineHeight="1.2"
        wordBreak="break-word"
      >
        {value}
      </Text>
    </Box>
  );
}
