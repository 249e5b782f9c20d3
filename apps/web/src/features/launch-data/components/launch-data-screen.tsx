import { useState } from 'react';
import { Alert, Box, Button, Heading, SimpleGrid, Stack, Text } from '@chakra-ui/react';
import type { AircraftClass, AircraftTypeView } from '@catline/contracts';
import { CautionLine } from '../../../components/caution-line.js';
import { type Column, DataTable } from '../../../components/data-table.js';
import { FigureStat } from '../../../components/figure-stat.js';
import { PageHeader } from '../../../components/page-header.js';
import { QueryView } from '../../../components/query-states.js';
import { RoleGate } from '../../../components/role-gate.js';
import { SelectInput } from '../../../components/select-field.js';
import { AIRCRAFT_CLASS_LABELS, aircraftClassChoices } from '../../../lib/aircraft-class.js';
import { errorMessage } from '../../../lib/api-error.js';
import { formatPounds, formatWhole } from '../../../lib/format.js';
import { useAircraftTypes } from '../../../lib/queries/aircraft-types-query.js';
import { useHasRole } from '../../../lib/session-store.js';
import { formatTrimBands } from '../launch-data-model.js';
import { useSetAircraftClass } from '../api/set-aircraft-class.js';
import { AircraftTypeForm } from './aircraft-type-form.js';
import { HoldbackElementField } from './holdback-element-field.js';
import { LaunchTableEditor } from './launch-table-editor.js';
import { LaunchTableImport } from './launch-table-import.js';
import { SettingTablesEditor } from './setting-tables-editor.js';
import { StoresCatalogueEditor } from './stores-catalogue-editor.js';

/** The type's class, which picks the departure its pilots are shown; the admin changes it in place. */
function AircraftClassField({ type, editable }: { type: AircraftTypeView; editable: boolean }) {
  const setClass = useSetAircraftClass();
  if (!editable) return <FigureStat label="Class" value={AIRCRAFT_CLASS_LABELS[type.aircraftClass]} size="md" />;
  return (
    <Stack gap="1">
      <Text fontSize="xs" textTransform="uppercase" letterSpacing="wider" color="fg.muted" fontWeight="600">
        Class
      </Text>
      <SelectInput
        value={type.aircraftClass}
        choices={aircraftClassChoices}
        ariaLabel={`Class of ${type.designation}`}
        disabled={setClass.isPending}
        onChange={(value) => setClass.mutate({ typeId: type.id, aircraftClass: value as AircraftClass })}
      />
      {setClass.isError && (
        <Alert.Root status="error" colorPalette="nogo" role="alert">
          <Alert.Indicator />
          <Alert.Title>{errorMessage(setClass.error)}</Alert.Title>
        </Alert.Root>
      )}
    </Stack>
  );
}

function TypeDetail({ type, editable }: { type: AircraftTypeView; editable: boolean }) {
  return (
    <Stack
      gap="3"
      borderWidth="1px"
      rounded="card"
      p={{ base: '3', md: '4' }}
      bg="bg.panel"
      as="section"
      aria-label={`${type.designation} launch data`}
      data-testid="type-detail"
    >
      <Heading as="h2" size="lg">
        {type.designation} · {type.name}
      </Heading>
      <SimpleGrid columns={{ base: 2, md: 3, lg: 6 }} gap="3">
        <AircraftClassField type={type} editable={editable} />
        <FigureStat label="Max gross weight" value={formatPounds(type.maxGrossWeightLb)} size="md" />
        <FigureStat
          label="Operating weight"
          value={type.operatingWeightLb === null ? 'Not entered' : formatPounds(type.operatingWeightLb)}
          size="md"
        />
        <FigureStat label="Crosswind limit" value={`${type.crosswindLimitKt} kt`} size="md" />
        <FigureStat label="Thrust" value={`${formatWhole(type.thrustLbf)} lbf`} size="md" />
        <FigureStat label="Required excess" value={`${type.requiredExcessKt} kt`} size="md" />
        <FigureStat
          label="Max end speed"
          value={type.maxEndSpeedKt === null ? 'Not entered: no launch' : `${type.maxEndSpeedKt} kt`}
          size="md"
        />
        <FigureStat
          label="Afterburner from"
          value={type.afterburnerFromLb === null ? 'Never' : formatPounds(type.afterburnerFromLb)}
          size="md"
        />
        <HoldbackElementField key={type.holdbackElement} type={type} editable={editable} />
      </SimpleGrid>
      <Box>
        <Text fontSize="xs" textTransform="uppercase" letterSpacing="wider" color="fg.muted" fontWeight="600">
          Take-off trim
        </Text>
        <Text>{formatTrimBands(type.trimBands)}</Text>
      </Box>
      <Box as="section" aria-label="Launch table">
        <Text fontWeight="700" mb="2">
          Launch table
        </Text>
        <LaunchTableEditor key={`${type.id}-${JSON.stringify(type.launchTable)}`} type={type} editable={editable} />
      </Box>
      <Box as="section" aria-label="Approved catapult settings">
        <Text fontWeight="700" mb="2">
          Approved catapult settings
        </Text>
        <SettingTablesEditor key={`${type.id}-${JSON.stringify(type.settingTables)}`} type={type} editable={editable} />
      </Box>
      <Box as="section" aria-label="Stores catalogue">
        <Text fontWeight="700" mb="2">
          Stores catalogue
        </Text>
        <StoresCatalogueEditor
          key={`${type.id}-${JSON.stringify(type.storesCatalogue)}`}
          type={type}
          editable={editable}
        />
      </Box>
      {editable && (
        <Stack gap="2" as="section" aria-label="Import a launch table">
          <Text fontWeight="700">Import a launch table</Text>
          <LaunchTableImport key={type.id} type={type} />
        </Stack>
      )}
    </Stack>
  );
}

export function LaunchDataScreen() {
  const types = useAircraftTypes();
  const admin = useHasRole('admin');
  const [selectedId, setSelectedId] = useState<number | null>(null);

  const columns: Column<AircraftTypeView>[] = [
    {
      key: 'designation',
      header: 'Designation',
      cell: (type) => <Text fontWeight="700">{type.designation}</Text>,
      sortValue: (type) => type.designation,
    },
    { key: 'name', header: 'Name', cell: (type) => type.name, sortValue: (type) => type.name },
    {
      key: 'class',
      header: 'Class',
      cell: (type) => AIRCRAFT_CLASS_LABELS[type.aircraftClass],
      sortValue: (type) => type.aircraftClass,
    },
    {
      key: 'max',
      header: 'Max gross (lb)',
      cell: (type) => formatWhole(type.maxGrossWeightLb),
      sortValue: (type) => type.maxGrossWeightLb,
      numeric: true,
    },
    {
      key: 'crosswind',
      header: 'Crosswind limit (kt)',
      cell: (type) => type.crosswindLimitKt,
      sortValue: (type) => type.crosswindLimitKt,
      numeric: true,
    },
    {
      key: 'rows',
      header: 'Table rows',
      cell: (type) => type.launchTable.length,
      sortValue: (type) => type.launchTable.length,
      numeric: true,
    },
    {
      key: 'show',
      header: 'Details',
      cell: (type) => (
        <Button
          size="xs"
          variant={type.id === selectedId ? 'solid' : 'outline'}
          onClick={() => setSelectedId(type.id)}
          aria-label={`Show ${type.designation}`}
        >
          Show
        </Button>
      ),
    },
  ];

  return (
    <Stack gap="4">
      <PageHeader title="Launch data" subtitle="Aircraft types and their launch tables" />
      <CautionLine />
      <QueryView query={types} loadingLabel="Loading launch data…">
        {(list) => {
          const selected = list.find((type) => type.id === selectedId);
          return (
            <Stack gap="4">
              <DataTable
                caption="Aircraft types"
                rows={list}
                columns={columns}
                rowKey={(type) => type.id}
                selectedKey={selectedId ?? undefined}
                emptyTitle="No aircraft types yet"
                emptyHint="The admin adds types below."
                initialSort={{ key: 'designation' }}
              />
              {selected && <TypeDetail type={selected} editable={admin} />}
            </Stack>
          );
        }}
      </QueryView>
      <RoleGate roles={['admin']}>
        <Stack gap="2" borderWidth="1px" rounded="card" p="3">
          <Text fontWeight="700">Add an aircraft type</Text>
          <AircraftTypeForm onCreated={setSelectedId} />
        </Stack>
      </RoleGate>
    </Stack>
  );
}
