import { useState } from 'react';
import { Box, HStack, Input, SimpleGrid, Stack, Text } from '@chakra-ui/react';
import { useSearchParams } from 'react-router-dom';
import type { AirframeShotCount, CatapultShotCount, ShotCountsQuery } from '@catline/contracts';
import { type Column, DataTable } from '../../../components/data-table.js';
import { FigureStat } from '../../../components/figure-stat.js';
import { FormField } from '../../../components/form-field.js';
import { PageHeader } from '../../../components/page-header.js';
import { QueryView } from '../../../components/query-states.js';
import { formatWhole } from '../../../lib/format.js';
import { shotCountsPath, useShotCounts } from '../api/get-shot-counts.js';
import { CsvButton } from './csv-button.js';
import { ReportSection } from './report-sections.js';
import { ReportTable, type ReportColumn } from './report-table.js';
import { ReportsNav } from './reports-nav.js';

const DAY_MS = 86_400_000;
const utcDay = (ms: number) => new Date(ms).toISOString().slice(0, 10);

/** The range on screen: `?from=&to=` when given, else the last 30 UTC days. */
function useRange(): [ShotCountsQuery, (change: Partial<ShotCountsQuery>) => void] {
  const [params, setParams] = useSearchParams();
  const [today] = useState(() => Date.now());
  const range = {
    from: params.get('from') ?? utcDay(today - 29 * DAY_MS),
    to: params.get('to') ?? utcDay(today),
  };
  const change = (next: Partial<ShotCountsQuery>) =>
    setParams((current) => {
      const merged = new URLSearchParams(current);
      const values = { ...range, ...next };
      merged.set('from', values.from);
      merged.set('to', values.to);
      return merged;
    });
  return [range, change];
}

const airframeColumns: Column<AirframeShotCount>[] = [
  {
    key: 'side',
    header: 'Side',
    cell: (row) => <Text fontWeight="700">{row.sideNumber}</Text>,
    sortValue: (row) => row.sideNumber,
  },
  { key: 'type', header: 'Type', cell: (row) => row.typeDesignation, sortValue: (row) => row.typeDesignation },
  { key: 'squadron', header: 'Squadron', cell: (row) => row.squadronCode, sortValue: (row) => row.squadronCode },
  {
    key: 'launches',
    header: 'Launches in range',
    cell: (row) => formatWhole(row.launches),
    sortValue: (row) => row.launches,
    numeric: true,
  },
  {
    key: 'lifetime',
    header: 'Shots on record',
    cell: (row) => formatWhole(row.lifetimeShots),
    sortValue: (row) => row.lifetimeShots,
    numeric: true,
  },
];

const catapultColumns: ReportColumn<CatapultShotCount>[] = [
  { header: 'Ship', cell: (row) => row.shipName },
  { header: 'Cat', cell: (row) => row.number, numeric: true },
  { header: 'Launches in range', cell: (row) => formatWhole(row.launches), numeric: true },
  { header: 'Shots on record', cell: (row) => formatWhole(row.lifetimeShots), numeric: true },
];

/** Maintenance's view: catapult launches per airframe and per catapult over a range of days. */
export function ShotCountsScreen() {
  const [range, setRange] = useRange();
  const counts = useShotCounts(range);
  return (
    <Stack gap="4">
      <PageHeader title="Reports" subtitle="Shot counts">
        <ReportsNav />
      </PageHeader>
      <HStack gap="3" wrap="wrap" align="flex-end">
        <Box w={{ base: 'full', sm: '13rem' }}>
          <FormField label="From (UTC day)">
            <Input
              type="date"
              size="sm"
              value={range.from}
              max={range.to}
              onChange={(event) => event.currentTarget.value && setRange({ from: event.currentTarget.value })}
            />
          </FormField>
        </Box>
        <Box w={{ base: 'full', sm: '13rem' }}>
          <FormField label="To (UTC day, included)">
            <Input
              type="date"
              size="sm"
              value={range.to}
              min={range.from}
              onChange={(event) => event.currentTarget.value && setRange({ to: event.currentTarget.value })}
            />
          </FormField>
        </Box>
        <CsvButton path={shotCountsPath(range, '.csv')} label="Export CSV" />
      </HStack>
      <QueryView query={counts} loadingLabel="Counting launches…">
        {(data) => (
          <Stack gap="4">
            <SimpleGrid columns={{ base: 2, md: 4 }} gap="3">
              <FigureStat label="Launches in range" value={formatWhole(data.totalLaunches)} />
              <FigureStat label="Airframes launched" value={data.airframes.filter((row) => row.launches > 0).length} />
            </SimpleGrid>
            <ReportSection title="Per catapult">
              <ReportTable
                caption="Shot counts per catapult"
                rows={data.catapults}
                columns={catapultColumns}
                rowKey={(row) => row.catapultId}
                empty="No catapults."
              />
            </ReportSection>
            <ReportSection title="Per airframe">
              <DataTable
                caption="Shot counts per airframe"
                rows={data.airframes}
                columns={airframeColumns}
                rowKey={(row) => row.aircraftId}
                emptyTitle="No aircraft in the fleet"
                initialSort={{ key: 'launches', descending: true }}
              />
            </ReportSection>
          </Stack>
        )}
      </QueryView>
    </Stack>
  );
}
