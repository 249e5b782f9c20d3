import { Badge } from '@chakra-ui/react';
import type { SlotStatus } from '@catline/contracts';

export const SLOT_STATUS_LABELS: Record<SlotStatus, string> = {
  planned: 'Planned',
  taxiing: 'Taxiing',
  on_catapult: 'On catapult',
  weight_agreed: 'Weight agreed',
  tensioned: 'Tensioned',
  launched: 'Launched',
  suspended: 'Suspended',
  down: 'Down',
  scratched: 'Scratched',
};

const palettes: Record<SlotStatus, string> = {
  planned: 'gray',
  taxiing: 'accent',
  on_catapult: 'accent',
  weight_agreed: 'accent',
  tensioned: 'accent',
  launched: 'go',
  suspended: 'caution',
  down: 'nogo',
  scratched: 'gray',
};

export function SlotStatusBadge({ status, size = 'sm' }: { status: SlotStatus; size?: 'sm' | 'md' | 'lg' }) {
  const strong = status === 'tensioned' || status === 'launched' || status === 'down';
  return (
    <Badge size={size} colorPalette={palettes[status]} variant={strong ? 'solid' : 'surface'} data-testid="slot-status">
      {SLOT_STATUS_LABELS[status]}
    </Badge>
  );
}
