import { Badge } from '@chakra-ui/react';
import type { SlotStatus } from '@catline/contracts';

export const SLOT_STATUS_LABELS: Record<SlotStatus, string> = {
  planned: 'Planned',
  taxiing: 'Taxiing',
  on_catapult: 'On catapult',
  weight_agreed: 'Weight agreed',
  setting_set: 'Setting read back',
  deflector_up: 'Deflector up',
  tensioned: 'Tensioned',
  run_up: 'Full power',
  checks_clear: 'Checks clear',
  pilot_ready: 'Pilot ready',
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
  setting_set: 'accent',
  deflector_up: 'accent',
  tensioned: 'accent',
  run_up: 'accent',
  checks_clear: 'accent',
  pilot_ready: 'accent',
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
