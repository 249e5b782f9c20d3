import { Badge, HStack, Text } from '@chakra-ui/react';
import type { LaunchFigures, SlotView } from '@catline/contracts';
import { marginTone } from '../lib/figure-tones.js';
import { formatSignedKnots } from '../lib/format.js';
import { slotGoVerdict, type GoVerdict } from '../lib/launch-verdict.js';

const BADGES: Record<GoVerdict, { palette: string; label: string }> = {
  go: { palette: 'go', label: 'GO' },
  nogo: { palette: 'nogo', label: 'NO-GO' },
  // Held only by a soft gate: the air boss may still waive it, so it is no refusal.
  waiver: { palette: 'caution', label: 'WAIVER NEEDED' },
};

export function GoBadge({ verdict, size = 'sm' }: { verdict: GoVerdict; size?: 'sm' | 'md' | 'lg' }) {
  const { palette, label } = BADGES[verdict];
  return (
    <Badge size={size} colorPalette={palette} variant="solid" fontWeight="700" data-verdict={verdict}>
      {label}
    </Badge>
  );
}

/** A slot's launch margin beside its go/no-go, as the lineup cards show it. */
export function MarginGo({ slot }: { slot: Pick<SlotView, 'status' | 'gates'> & { figures: LaunchFigures } }) {
  const verdict = slotGoVerdict(slot);
  const tone = marginTone(slot.figures.marginKt, slot.figures.excessWindOverDeckKt);
  return (
    <HStack gap="1.5">
      <Text textStyle="figure" color={tone ? `${tone}.fg` : 'fg'} title="Launch margin">
        {formatSignedKnots(slot.figures.marginKt)}
      </Text>
      <GoBadge verdict={verdict} />
    </HStack>
  );
}
