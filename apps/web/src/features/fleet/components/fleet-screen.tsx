import { useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { Badge, Box, Button, HStack, Stack, Tabs, Text } from '@chakra-ui/react';
import type { AircraftView, SquadronView } from '@catline/contracts';
import { ActionDialog } from '../../../components/action-dialog.js';
import { type Column, DataTable } from '../../../components/data-table.js';
import { PageHeader } from '../../../components/page-header.js';
import { Pager } from '../../../components/pager.js';
import { QueryView } from '../../../components/query-states.js';
import { NoticeBanner, refusalNotice, useNotice } from '../../../components/refusal-notice.js';
import { RoleGate } from '../../../components/role-gate.js';
import { ofShip, ShipPicker } from '../../../components/ship-picker.js';
import { useAircraft, useAircraftPage } from '../../../lib/queries/aircraft-query.js';
import { useAircraftTypes } from '../../../lib/queries/aircraft-types-query.js';
import { useShips } from '../../../lib/queries/ships-query.js';
import { ShipTimeZoneForm } from './ship-time-zone-form.js';
import { useSquadrons } from '../../../lib/queries/squadrons-query.js';
import { useHasRole } from '../../../lib/session-store.js';
import { useDeleteAircraft } from '../api/delete-aircraft.js';
import { useDeleteSquadron } from '../api/delete-squadron.js';
import { useUpdateAircraft } from '../api/update-aircraft.js';
import { AircraftForm } from './aircraft-form.js';
import { DeckLayoutEditor } from './deck-layout-editor.js';
import { ReadinessStepsEditor } from './readiness-steps-editor.js';
import { SquadronForm } from './squadron-form.js';

type Doomed = { kind: 'aircraft'; row: AircraftView } | { kind: 'squadron'; row: SquadronView } | null;

/**
 * The ship whose profile the admin's tabs edit and new rows go to: `?ship=` when it names a listed ship
 * (a fleet admin's choice, kept over a reload), else the first listed, which for a ship's admin is their own.
 */
function useFleetShip() {
  const ships = useShips();
  const [params, setParams] = useSearchParams();
  const listed = ships.data ?? [];
  const ship = listed.find((candidate) => String(candidate.id) === params.get('ship')) ?? listed[0];
  const choose = (shipId: number) =>
    setParams((current) => {
      const next = new URLSearchParams(current);
      next.set('ship', String(shipId));
      return next;
    });
  return { ships, choice: { ships: listed, ship, choose } };
}

export function FleetScreen() {
  const admin = useHasRole('admin');
  const aircraft = useAircraft();
  const [aircraftOffset, setAircraftOffset] = useState(0);
  const aircraftPage = useAircraftPage(aircraftOffset);
  const squadrons = useSquadrons();
  const types = useAircraftTypes();
  const { ships, choice } = useFleetShip();
  const ship = choice.ship;
  const updateAircraft = useUpdateAircraft();
  const deleteAircraft = useDeleteAircraft();
  const deleteSquadron = useDeleteSquadron();
  const { notice, show, dismiss } = useNotice();
  const [doomed, setDoomed] = useState<Doomed>(null);

  const aircraftColumns: Column<AircraftView>[] = [
    {
      key: 'side',
      header: 'Side number',
      cell: (row) => <Text fontWeight="700">{row.sideNumber}</Text>,
      sortValue: (row) => row.sideNumber,
    },
    { key: 'type', header: 'Type', cell: (row) => row.typeDesignation, sortValue: (row) => row.typeDesignation },
    { key: 'squadron', header: 'Squadron', cell: (row) => row.squadronCode, sortValue: (row) => row.squadronCode },
    { key: 'spot', header: 'Parked at', cell: (row) => row.parkedSpot, sortValue: (row) => row.parkedSpot },
    {
      key: 'serviceable',
      header: 'State',
      cell: (row) => (
        <Badge colorPalette={row.serviceable ? 'go' : 'nogo'}>
          {row.serviceable ? 'Serviceable' : 'Not serviceable'}
        </Badge>
      ),
      sortValue: (row) => (row.serviceable ? 'serviceable' : 'not serviceable'),
    },
    {
      key: 'shots',
      header: 'Catapult shots',
      cell: (row) => row.catapultShots,
      sortValue: (row) => row.catapultShots,
      numeric: true,
    },
    ...(admin
      ? [
          {
            key: 'actions',
            header: 'Actions',
            cell: (row: AircraftView) => (
              <HStack gap="1">
                <Button
                  size="xs"
                  variant="outline"
                  onClick={() =>
                    updateAircraft.mutate(
                      { id: row.id, serviceable: !row.serviceable },
                      { onError: (error) => show(refusalNotice(error, 'The change')) },
                    )
                  }
                >
                  {row.serviceable ? 'Mark unserviceable' : 'Mark serviceable'}
                </Button>
                <Button
                  size="xs"
                  variant="ghost"
                  colorPalette="nogo"
                  onClick={() => setDoomed({ kind: 'aircraft', row })}
                >
                  Remove
                </Button>
              </HStack>
            ),
          },
        ]
      : []),
  ];

  const squadronColumns: Column<SquadronView>[] = [
    {
      key: 'code',
      header: 'Code',
      cell: (row) => <Text fontWeight="700">{row.code}</Text>,
      sortValue: (row) => row.code,
    },
    { key: 'name', header: 'Name', cell: (row) => row.name, sortValue: (row) => row.name },
    { key: 'email', header: 'Report e-mail', cell: (row) => row.email, sortValue: (row) => row.email },
    {
      key: 'aircraft',
      header: 'Aircraft',
      cell: (row) => aircraft.data?.filter((candidate) => candidate.squadronId === row.id).length ?? '—',
      sortValue: (row) => aircraft.data?.filter((candidate) => candidate.squadronId === row.id).length ?? 0,
      numeric: true,
    },
    ...(admin
      ? [
          {
            key: 'actions',
            header: 'Actions',
            cell: (row: SquadronView) => (
              <Button
                size="xs"
                variant="ghost"
                colorPalette="nogo"
                onClick={() => setDoomed({ kind: 'squadron', row })}
              >
                Remove
              </Button>
            ),
          },
        ]
      : []),
  ];

  const remove = () => {
    if (!doomed) return;
    const options = {
      onSettled: () => setDoomed(null),
      onError: (error: unknown) => show(refusalNotice(error, 'Removing')),
    };
    if (doomed.kind === 'aircraft') deleteAircraft.mutate(doomed.row.id, options);
    else deleteSquadron.mutate(doomed.row.id, options);
  };

  return (
    <Stack gap="4">
      <PageHeader
        title="Fleet"
        subtitle={admin ? 'Aircraft, squadrons, the deck layout and the readiness steps' : 'Aircraft and squadrons'}
      />
      {notice && <NoticeBanner notice={notice} onDismiss={dismiss} />}
      {admin && (
        <Box w={{ base: 'full', sm: '20rem' }}>
          <ShipPicker choice={choice} label="Ship" />
        </Box>
      )}
      <Tabs.Root defaultValue="aircraft" variant="line">
        <Tabs.List>
          <Tabs.Trigger value="aircraft">Aircraft</Tabs.Trigger>
          <Tabs.Trigger value="squadrons">Squadrons</Tabs.Trigger>
          {admin && <Tabs.Trigger value="deck-layout">Deck layout</Tabs.Trigger>}
          {admin && <Tabs.Trigger value="readiness-steps">Readiness steps</Tabs.Trigger>}
        </Tabs.List>
        <Tabs.Content value="aircraft">
          <Stack gap="4">
            <QueryView query={aircraftPage} loadingLabel="Loading aircraft…">
              {(page) => (
                <Stack gap="2">
                  <DataTable
                    caption="Aircraft"
                    rows={page.items}
                    columns={aircraftColumns}
                    rowKey={(row) => row.id}
                    emptyTitle="No aircraft yet"
                    emptyHint="The admin adds aircraft below."
                    initialSort={{ key: 'side' }}
                  />
                  <Pager page={page} onOffset={setAircraftOffset} />
                </Stack>
              )}
            </QueryView>
            <RoleGate roles={['admin']}>
              <Stack gap="2" borderWidth="1px" rounded="card" p="3">
                <Text fontWeight="700">Add an aircraft</Text>
                <AircraftForm
                  key={ship?.id}
                  types={ofShip(types.data ?? [], ship)}
                  squadrons={ofShip(squadrons.data ?? [], ship)}
                  spots={ship?.deckSpots ?? []}
                />
              </Stack>
            </RoleGate>
          </Stack>
        </Tabs.Content>
        <Tabs.Content value="squadrons">
          <Stack gap="4">
            <QueryView query={squadrons} loadingLabel="Loading squadrons…">
              {(rows) => (
                <DataTable
                  caption="Squadrons"
                  rows={rows}
                  columns={squadronColumns}
                  rowKey={(row) => row.id}
                  emptyTitle="No squadrons yet"
                  initialSort={{ key: 'code' }}
                />
              )}
            </QueryView>
            <RoleGate roles={['admin']}>
              <Stack gap="2" borderWidth="1px" rounded="card" p="3">
                <Text fontWeight="700">Add a squadron</Text>
                <SquadronForm key={ship?.id} shipId={ship?.id} />
              </Stack>
            </RoleGate>
          </Stack>
        </Tabs.Content>
        {admin && (
          <Tabs.Content value="deck-layout">
            <QueryView query={ships} loadingLabel="Loading the ship…">
              {() =>
                ship ? (
                  <Stack gap="4">
                    <ShipTimeZoneForm key={ship.id} ship={ship} />
                    <DeckLayoutEditor key={ship.id} ship={ship} />
                  </Stack>
                ) : (
                  <Text>No ship yet.</Text>
                )
              }
            </QueryView>
          </Tabs.Content>
        )}
        {admin && (
          <Tabs.Content value="readiness-steps">
            <QueryView query={ships} loadingLabel="Loading the ship…">
              {() => (ship ? <ReadinessStepsEditor key={ship.id} ship={ship} /> : <Text>No ship yet.</Text>)}
            </QueryView>
          </Tabs.Content>
        )}
      </Tabs.Root>
      {doomed && (
        <ActionDialog
          open
          title={doomed.kind === 'aircraft' ? `Remove ${doomed.row.sideNumber}?` : `Remove ${doomed.row.code}?`}
          onClose={() => setDoomed(null)}
          confirmLabel="Remove"
          tone="nogo"
          pending={deleteAircraft.isPending || deleteSquadron.isPending}
          onConfirm={remove}
        >
          <Text>The server refuses if past cycles or people still refer to it.</Text>
        </ActionDialog>
      )}
    </Stack>
  );
}
