import { NativeSelect } from '@chakra-ui/react';
import { shipTime, type CycleView } from '@catline/contracts';

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
            Cycle {cycle.number} · {shipTime(cycle.plannedLaunchAt, cycle.timeZone)} · {stateWords[cycle.state]}
            {cycle.night ? ' · night' : ''}
          </option>
        ))}
      </NativeSelect.Field>
      <NativeSelect.Indicator />
    </NativeSelect.Root>
  );
}
