import { Badge, HStack, Text } from '@chakra-ui/react';
import type { LaunchFigures } from '@catline/contracts';
import { formatSignedKnots } from '../lib/format.js';

export function GoBadge({ go, size = 'sm' }: { go: boolean; size?: 'sm' | 'md' | 'lg' }) {
  return (
    <Badge size={size} colorPalette={go ? 'go' : 'nogo'} variant="solid" fontWeight="700">
      {go ? 'GO' : 'NO-GO'}
    </Badge>
  );
}

/** A slot's launch margin beside its go/no-go, as the lineup cards show it. */
export function MarginGo({ figures }: { figures: Pick<LaunchFigures, 'go' | 'marginKt'> }) {
  return (
    <HStack gap="1.5">
      <Text textStyle="figure" color={figures.go ? 'go.fg' : 'nogo.fg'} title="Launch margin">
        {formatSignedKnots(figures.marginKt)}
      </Text>
      <GoBadge go={figures.go} />
    </HStack>
  );
}
