import { Button, Grid, HStack, Stack } from '@chakra-ui/react';
import { Link as RouterLink } from 'react-router-dom';
import type { CycleView } from '@catline/contracts';
import { CautionLine } from '../../../components/caution-line.js';
import { CyclePicker } from '../../../components/cycle-picker.js';
import { PageHeader } from '../../../components/page-header.js';
import { EmptyState, QueryView } from '../../../components/query-states.js';
import { useCycleReport } from '../api/get-cycle-report.js';
import { useReportCycle } from '../hooks/use-report-cycle.js';
import { CsvButton } from './csv-button.js';
import { LaunchTable } from './launch-table.js';
import { LaunchTimelineChart } from './launch-timeline-chart.js';
import { EventsSection, IntervalsSection, ReportSection, ReportSummary, SquadronsSection } from './report-sections.js';
import { ReportsNav } from './reports-nav.js';
import { ShipTimeZone } from '../../../lib/ship-time.js';

function CycleActions({ cycle }: { cycle: CycleView }) {
  return (
    <HStack gap="2" wrap="wrap" align="flex-start" data-testid="report-actions">
      <Button asChild size="sm" colorPalette="accent">
        <RouterLink to={`/reports/replay?cycle=${cycle.id}`}>Replay</RouterLink>
      </Button>
      <Button asChild size="sm" variant="outline">
        <RouterLink to={`/reports/launch-sheet?cycle=${cycle.id}`}>Launch sheet</RouterLink>
      </Button>
      <CsvButton path={`/cycles/${cycle.id}/slots.csv`} label="Slots (CSV)" />
      <CsvButton path={`/cycles/${cycle.id}/changes.csv`} label="Change log (CSV)" />
    </HStack>
  );
}

function CycleReportPanel({ cycle }: { cycle: CycleView }) {
  const report = useCycleReport(cycle.id);
  return (
    <QueryView query={report} loadingLabel={`Reading the record of cycle ${cycle.number}…`}>
      {(data) => (
        <Stack gap="5">
          <ReportSummary report={data} />
          <Grid
            templateColumns={{ base: 'minmax(0, 1fr)', xl: 'minmax(0, 1.1fr) minmax(0, 1fr)' }}
            gap="4"
            alignItems="start"
          >
            <ReportSection title="Timeline per catapult">
              <LaunchTimelineChart report={data} />
            </ReportSection>
            <ReportSection title="Launches">
              <LaunchTable report={data} />
            </ReportSection>
          </Grid>
          <CautionLine />
          <IntervalsSection report={data} />
          <EventsSection report={data} />
          <SquadronsSection report={data} />
        </Stack>
      )}
    </QueryView>
  );
}

/** A cycle's record: planned against actual per catapult, intervals, suspends, down aircraft and spares, waivers, squadrons. */
export function ReportsScreen() {
  const { cycles, cycle, choose } = useReportCycle();
  return (
    <ShipTimeZone zone={cycle?.timeZone}>
      <Stack gap="4">
        <PageHeader title="Reports" subtitle={cycle ? `Cycle ${cycle.number}` : undefined}>
          <ReportsNav />
        </PageHeader>
        <QueryView query={cycles} loadingLabel="Loading cycles…">
          {(list) =>
            cycle ? (
              <Stack gap="4">
                <HStack gap="3" wrap="wrap" justify="space-between" align="flex-start">
                  <CyclePicker cycles={list} value={cycle.id} onChange={choose} />
                  <CycleActions cycle={cycle} />
                </HStack>
                <CycleReportPanel key={cycle.id} cycle={cycle} />
              </Stack>
            ) : (
              <EmptyState title="No cycles yet">
                A report appears here once air operations has created a cycle.
              </EmptyState>
            )
          }
        </QueryView>
      </Stack>
    </ShipTimeZone>
  );
}
