import { NativeSelect } from '@chakra-ui/react';
import type { CycleView } from '@catline/contracts';
import { formatShortClock } from '../lib/format.js';

const stateWords = { planning: 'planning', executing: 'launching', closed: 'closed' } as const;

export function CyclePicker({
  cycles,
  value,
  onChange,
}: {
  cycles: CycleView[];
  value: number | undefined;
  onChange: (cycleId: number) => void;
}) {
  return (
    <NativeSelect.Root size="lg" width={{ base: 'full', sm: '16rem' }}>
      <NativeSelect.Field
        aria-label="Cycle on screen"
        value={value ?? ''}
        onChange={(event) => onChange(Number(event.currentTarget.value))}
      >
        {cycles.map((cycle) => (
          <option key={cycle.id} value={cycle.id}>
            Cycle {cycle.number} · {formatShortClock(cycle.plannedLaunchAt)} · {stateWords[cycle.state]}
            {cycle.night ? ' · night' : ''}
          </option>
        ))}
      </NativeSelect.Field>
      <NativeSelect.Indicator />
    </NativeSelect.Root>
  );
}
