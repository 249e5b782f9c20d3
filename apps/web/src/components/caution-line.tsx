import { LAUNCH_CAUTION } from '@catline/contracts';
import { Box, HStack, Text } from '@chakra-ui/react';
import { useThemeState } from '../theme/theme-mode.js';
import { CautionIcon } from './icons.js';

/**
 * Required on every screen that shows a launch figure. `compact` fits it into a screen's header band
 * (the lineup board's), still in full and still in the caution colours; `pinned` keeps it at the foot
 * of the window while the page scrolls, for the tablet stations. By night it is always the small one: in full
 * and in the night scheme's caution colours, but not the brightest block on a dimmed screen.
 */
export function CautionLine({
  compact: compactByDay = false,
  pinned = false,
}: {
  compact?: boolean;
  pinned?: boolean;
}) {
  const night = useThemeState().mode === 'night';
  const compact = compactByDay || night;
  return (
    <Box
      {...(pinned && { position: 'sticky', bottom: '0', zIndex: 'sticky', boxShadow: 'md' })}
      role="note"
      aria-label="Caution"
      data-testid="caution-line"
      data-compact={compact}
      bg="caution.subtle"
      color="caution.fg"
      borderWidth="1px"
      borderColor="caution.border"
      rounded="card"
      px={compact ? '2' : '3'}
      py={compact ? '1' : '2'}
    >
      <HStack gap="2" alignItems={compact ? 'center' : 'flex-start'}>
        <Box as="span" fontSize={compact ? 'md' : 'lg'} flexShrink={0} mt={compact ? undefined : '0.5'}>
          <CautionIcon />
        </Box>
        <Text fontSize={compact ? 'xs' : 'sm'} fontWeight="500" lineHeight={compact ? '1.35' : undefined}>
          {LAUNCH_CAUTION}
        </Text>
      </HStack>
    </Box>
  );
}
