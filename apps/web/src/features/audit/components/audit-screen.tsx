import { useState } from 'react';
import { Box, Button, Code, HStack, Input, Stack, Table, Text } from '@chakra-ui/react';
import {
  AUDIT_ACTIONS,
  DEFAULT_SHIP_TIME_ZONE,
  PAGE_SIZE,
  shipClock,
  shipIsoTime,
  shipTimeZone,
  zoneName,
  type AuditAction,
  type AuditEntryView,
} from '@catline/contracts';
import { FormField } from '../../../components/form-field.js';
import { PageHeader } from '../../../components/page-header.js';
import { Pager } from '../../../components/pager.js';
import { EmptyState, QueryView } from '../../../components/query-states.js';
import { SelectInput } from '../../../components/select-field.js';
import { shipLabel } from '../../../components/ship-picker.js';
import { errorMessage } from '../../../lib/api-error.js';
import { useShips } from '../../../lib/queries/ships-query.js';
import { useFileDownload } from '../../../lib/use-file-download.js';
import { type AuditFilter, auditExportPath, useAuditEntries } from '../api/get-audit-entries.js';
import { type AuditDays, auditInstants } from '../audit-range-model.js';
import { TableScroll } from '../../../components/table-scroll.js';

const ACTION_CHOICES = AUDIT_ACTIONS.map((action) => ({ value: action, label: action.replace(/[._]/g, ' ') }));

function Change({ entry }: { entry: AuditEntryView }) {
  const fields = Object.keys({ ...entry.before, ...entry.after });
  if (fields.length === 0) return null;
  return (
    <Stack gap="0.5">
      {fields.map((field) => (
        <Text key={field} fontSize="xs">
          {field}: <Code>{JSON.stringify(entry.before?.[field] ?? null)}</Code> →{' '}
          <Code>{JSON.stringify(entry.after?.[field] ?? null)}</Code>
        </Text>
      ))}
    </Stack>
  );
}

function ExportButton({ filter }: { filter: AuditFilter }) {
  const download = useFileDownload(auditExportPath(filter), 'audit-trail.csv');
  return (
    <Stack gap="1" align="flex-start">
      <Button size="sm" variant="outline" loading={download.isPending} onClick={() => download.mutate()}>
        Export CSV
      </Button>
      {download.isError && (
        <Text role="alert" fontSize="xs" color="nogo.fg">
          {errorMessage(download.error)}
        </Text>
      )}
    </Stack>
  );
}

/**
 * When an entry was made, on its ship's clock with the zone named; an entry of no ship (a fleet-wide
 * change) or of a ship not listed in UTC, named as such.
 */
function useEntryTime(): (entry: AuditEntryView) => string {
  const ships = useShips();
  const zones = new Map(ships.data?.map((ship) => [ship.id, shipTimeZone(ship.profile)]));
  return (entry) => {
    const zone = (entry.shipId !== null && zones.get(entry.shipId)) || DEFAULT_SHIP_TIME_ZONE;
    return `${shipIsoTime(entry.at, zone).slice(0, 10)} ${shipClock(entry.at, zone)}`;
  };
}

/** The filters as the admin sets them: the days are read on the clock of the ship chosen (or the only one). */
interface AuditChoices extends AuditDays {
  action: AuditAction | '';
  actor: string;
  ship: string;
}

/** The admin's record of who changed what: newest first, a page at a time, filtered by action, person, ship and days. */
export function AuditScreen() {
  const [choices, setChoices] = useState<AuditChoices>({ action: '', actor: '', ship: '', from: '', to: '' });
  const [offset, setOffset] = useState(0);
  const limit = PAGE_SIZE.default;
  const ships = useShips().data ?? [];
  const dayShip = ships.find((ship) => String(ship.id) === choices.ship) ?? (ships.length === 1 ? ships[0] : undefined);
  const zone = dayShip ? shipTimeZone(dayShip.profile) : DEFAULT_SHIP_TIME_ZONE;
  const range = auditInstants(choices, zone);
  const filter: AuditFilter = {
    action: choices.action,
    actor: choices.actor,
    ship: choices.ship,
    ...('instants' in range ? range.instants : {}),
  };
  // While the range cannot be asked, the last list stays on screen under the range's problem.
  const entries = useAuditEntries({ ...filter, limit, offset }, !('problem' in range));
  const entryTime = useEntryTime();
  const change = (next: Partial<AuditChoices>) => {
    setChoices((current) => ({ ...current, ...next }));
    setOffset(0);
  };
  const zoneNote = `On the ship's clock (${zoneName(zone)})${dayShip ? '' : ': choose a ship for its own'}.`;

  return (
    <Stack gap="4">
      <PageHeader title="Audit" subtitle="Who changed what, and every sign-in" />
      <HStack gap="3" wrap="wrap" align="flex-end">
        <Box w={{ base: 'full', sm: '16rem' }}>
          <FormField label="Action">
            <SelectInput
              value={choices.action}
              choices={ACTION_CHOICES}
              placeholder="Every action"
              onChange={(value) => change({ action: value as AuditAction | '' })}
            />
          </FormField>
        </Box>
        <Box w={{ base: 'full', sm: '18rem' }}>
          <FormField label="Person (e-mail)">
            <Input
              size="sm"
              type="email"
              value={choices.actor}
              onChange={(event) => change({ actor: event.currentTarget.value })}
            />
          </FormField>
        </Box>
        {ships.length > 1 && (
          <Box w={{ base: 'full', sm: '16rem' }}>
            <FormField label="Ship">
              <SelectInput
                value={choices.ship}
                choices={ships.map((ship) => ({ value: String(ship.id), label: shipLabel(ship) }))}
                placeholder="Every ship"
                onChange={(value) => change({ ship: value })}
              />
            </FormField>
          </Box>
        )}
        <Box w={{ base: 'full', sm: '11rem' }}>
          <FormField label="From day" helper={zoneNote}>
            <Input
              size="sm"
              type="date"
              value={choices.from}
              onChange={(event) => change({ from: event.currentTarget.value })}
            />
          </FormField>
        </Box>
        <Box w={{ base: 'full', sm: '11rem' }}>
          <FormField label="To day (included)" error={'problem' in range ? range.problem : undefined}>
            <Input
              size="sm"
              type="date"
              value={choices.to}
              onChange={(event) => change({ to: event.currentTarget.value })}
            />
          </FormField>
        </Box>
        {'instants' in range && <ExportButton filter={filter} />}
      </HStack>
      <QueryView query={entries} loadingLabel="Reading the audit trail…">
        {(page) =>
          page.items.length === 0 ? (
            <EmptyState title="No entries match." />
          ) : (
            <Stack gap="3">
              <TableScroll label="Audit trail">
                <Table.Root size="sm">
                  <Table.Caption srOnly>Audit trail</Table.Caption>
                  <Table.Header>
                    <Table.Row bg="bg.muted">
                      <Table.ColumnHeader>When (ship's time)</Table.ColumnHeader>
                      <Table.ColumnHeader>Who</Table.ColumnHeader>
                      <Table.ColumnHeader>Action</Table.ColumnHeader>
                      <Table.ColumnHeader>What</Table.ColumnHeader>
                      <Table.ColumnHeader>Change</Table.ColumnHeader>
                    </Table.Row>
                  </Table.Header>
                  <Table.Body>
                    {page.items.map((entry) => (
                      <Table.Row key={entry.id} data-testid="audit-entry">
                        <Table.Cell whiteSpace="nowrap" textStyle="figure">
                          {entryTime(entry)}
                        </Table.Cell>
                        <Table.Cell>
                          {entry.actorEmail ?? 'system'}
                          {entry.clientAddress && (
                            <Text fontSize="xs" color="fg.muted">
                              from {entry.clientAddress}
                            </Text>
                          )}
                        </Table.Cell>
                        <Table.Cell whiteSpace="nowrap">{entry.action}</Table.Cell>
                        <Table.Cell>{entry.summary}</Table.Cell>
                        <Table.Cell>
                          <Change entry={entry} />
                        </Table.Cell>
                      </Table.Row>
                    ))}
                  </Table.Body>
                </Table.Root>
              </TableScroll>
              <Pager page={page} onOffset={setOffset} labels={{ previous: 'Newer', next: 'Older' }} />
            </Stack>
          )
        }
      </QueryView>
    </Stack>
  );
}
