import { useState } from 'react';
import { Badge, Button, Stack, Text } from '@chakra-ui/react';
import { shipDateTime, shipTime, shipTimeZone, type CycleView } from '@catline/contracts';
import { ConnectionBadge } from '../../../components/connection-badge.js';
import { type Column, DataTable } from '../../../components/data-table.js';
import { LiveFigures } from '../../../components/live-figures.js';
import { PageHeader } from '../../../components/page-header.js';
import { Pager } from '../../../components/pager.js';
import { QueryView } from '../../../components/query-states.js';
import { RoleGate } from '../../../components/role-gate.js';
import { errorMessage } from '../../../lib/api-error.js';
import { useLiveCycleList } from '../../../lib/live/use-live-cycle.js';
import { useCycles, useCyclesPage } from '../../../lib/queries/cycles-query.js';
import { useShips } from '../../../lib/queries/ships-query.js';
import { useCreateCycle } from '../api/create-cycle.js';
import { newCycleValues, toCreateRequest } from '../cycle-form-model.js';
import { CycleForm } from './cycle-form.js';
import { CyclePanel } from './cycle-panel.js';

function NewCycle({ onCreated, onCancel }: { onCreated: (cycle: CycleView) => void; onCancel: () => void }) {
  // The next number follows every cycle's, not only the page on screen: the form waits for them all,
  // since it takes its first values once.
  const cycles = useCycles();
  const ships = useShips();
  const create = useCreateCycle();
  // Air operations plan for their own ship, the one the list holds.
  const ship = ships.data?.[0];
  const timeZone = ship ? shipTimeZone(ship.profile) : undefined;
  return (
    <Stack
      gap="3"
      borderWidth="1px"
      rounded="card"
      p={{ base: '3', md: '4' }}
      bg="bg.panel"
      as="section"
      aria-label="New cycle"
    >
      <Text fontWeight="700">New cycle</Text>
      <QueryView query={cycles} loadingLabel="Reading the cycle numbers…">
        {(all) =>
          // The form takes its first values once: it waits for the ship, whose clock the times are typed on.
          ship &&
          timeZone && (
            <CycleForm
              initial={newCycleValues(timeZone, new Date(), Math.max(0, ...all.map((cycle) => cycle.number)) + 1)}
              withNumber
              timeZone={timeZone}
              submitLabel="Create cycle"
              pending={create.isPending}
              serverError={
                create.isError ? errorMessage(create.error) : ships.isError ? errorMessage(ships.error) : null
              }
              onCancel={onCancel}
              onSubmit={(values) => create.mutate(toCreateRequest(values, ship.id, timeZone), { onSuccess: onCreated })}
            />
          )
        }
      </QueryView>
    </Stack>
  );
}

export function CyclesScreen() {
  const [offset, setOffset] = useState(0);
  const cycles = useCyclesPage(offset);
  const live = useLiveCycleList(cycles.dataUpdatedAt);
  const [creating, setCreating] = useState(false);
  const [selectedId, setSelectedId] = useState<number | null>(null);

  const columns: Column<CycleView>[] = [
    {
      key: 'number',
      header: 'Cycle',
      cell: (cycle) => <Text fontWeight="700">{cycle.number}</Text>,
      sortValue: (cycle) => cycle.number,
      numeric: true,
    },
    {
      key: 'state',
      header: 'State',
      cell: (cycle) => (
        <Badge
          colorPalette={cycle.state === 'executing' ? 'go' : 'gray'}
          variant={cycle.state === 'closed' ? 'outline' : 'solid'}
        >
          {cycle.state}
        </Badge>
      ),
      sortValue: (cycle) => cycle.state,
    },
    {
      key: 'planned',
      header: 'Planned launch',
      cell: (cycle) => shipDateTime(cycle.plannedLaunchAt, cycle.timeZone),
      sortValue: (cycle) => Date.parse(cycle.plannedLaunchAt),
      filterText: (cycle) => shipDateTime(cycle.plannedLaunchAt, cycle.timeZone),
    },
    {
      key: 'window',
      header: 'Window',
      cell: (cycle) =>
        `${shipTime(cycle.windowStartAt, cycle.timeZone)}–${shipTime(cycle.windowEndAt, cycle.timeZone)}`,
    },
    { key: 'case', header: 'Case', cell: (cycle) => cycle.weatherCase, sortValue: (cycle) => cycle.weatherCase },
    {
      key: 'light',
      header: 'Day / night',
      cell: (cycle) => (cycle.night ? 'Night' : 'Day'),
      sortValue: (cycle) => (cycle.night ? 'night' : 'day'),
    },
    {
      key: 'aircraft',
      header: 'Aircraft',
      cell: (cycle) => cycle.slotCount,
      sortValue: (cycle) => cycle.slotCount,
      numeric: true,
    },
    {
      key: 'launched',
      header: 'Launched',
      cell: (cycle) => cycle.launchedCount,
      sortValue: (cycle) => cycle.launchedCount,
      numeric: true,
    },
    {
      key: 'open',
      header: 'Details',
      cell: (cycle) => (
        <Button
          size="xs"
          variant={cycle.id === selectedId ? 'solid' : 'outline'}
          onClick={() => setSelectedId(cycle.id)}
          aria-label={`Show cycle ${cycle.number}`}
        >
          Show
        </Button>
      ),
    },
  ];

  return (
    <Stack gap="4">
      <PageHeader title="Cycles" subtitle="Launch events, newest first">
        <ConnectionBadge state={live.connection} />
        <RoleGate roles={['air_operations']}>
          {!creating && (
            <Button size="sm" colorPalette="accent" onClick={() => setCreating(true)}>
              New cycle
            </Button>
          )}
        </RoleGate>
      </PageHeader>
      <QueryView query={cycles} keepsStaleData loadingLabel="Loading cycles…">
        {(page) => {
          const selected = page.items.find((cycle) => cycle.id === selectedId);
          return (
            <LiveFigures freshness={live.freshness}>
              <Stack gap="4">
                {creating && (
                  <NewCycle
                    onCancel={() => setCreating(false)}
                    onCreated={(cycle) => {
                      setCreating(false);
                      setSelectedId(cycle.id);
                    }}
                  />
                )}
                <DataTable
                  caption="Cycles"
                  rows={page.items}
                  columns={columns}
                  rowKey={(cycle) => cycle.id}
                  selectedKey={selectedId ?? undefined}
                  emptyTitle="No cycles yet"
                  emptyHint="Air operations creates the first cycle with “New cycle”."
                />
                <Pager page={page} onOffset={setOffset} />
                {selected && <CyclePanel key={selected.id} cycle={selected} />}
              </Stack>
            </LiveFigures>
          );
        }}
      </QueryView>
    </Stack>
  );
}
