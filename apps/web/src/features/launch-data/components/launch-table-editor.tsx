import { useState } from 'react';
import { Alert, Button, HStack, IconButton, Input, Stack, Table, Text } from '@chakra-ui/react';
import type { AircraftTypeView } from '@catline/contracts';
import { errorMessage } from '../../../lib/api-error.js';
import { formatWhole } from '../../../lib/format.js';
import { useSaveLaunchTable } from '../api/save-launch-table.js';
import { type DraftRow, parseLaunchTable, toDraftRows } from '../launch-data-model.js';

/** The type's minimum launch airspeed by gross weight; the admin edits it, everyone else reads it. */
export function LaunchTableEditor({ type, editable }: { type: AircraftTypeView; editable: boolean }) {
  const save = useSaveLaunchTable();
  const [rows, setRows] = useState<DraftRow[]>(() => toDraftRows(type.launchTable));
  const [problem, setProblem] = useState<string | null>(null);
  const setCell = (index: number, field: keyof DraftRow, value: string) =>
    setRows((current) => current.map((row, at) => (at === index ? { ...row, [field]: value } : row)));

  if (!editable) {
    return (
      <Table.Root size="sm" variant="outline" maxW="28rem">
        <Table.Header>
          <Table.Row>
            <Table.ColumnHeader textAlign="end">Gross weight (lb)</Table.ColumnHeader>
            <Table.ColumnHeader textAlign="end">Min. launch airspeed (kt)</Table.ColumnHeader>
          </Table.Row>
        </Table.Header>
        <Table.Body>
          {type.launchTable.map((row) => (
            <Table.Row key={row.grossWeightLb}>
              <Table.Cell textAlign="end" textStyle="figure">
                {formatWhole(row.grossWeightLb)}
              </Table.Cell>
              <Table.Cell textAlign="end" textStyle="figure">
                {row.minLaunchAirspeedKt}
              </Table.Cell>
            </Table.Row>
          ))}
        </Table.Body>
      </Table.Root>
    );
  }

  const submit = () => {
    const parsed = parseLaunchTable(rows);
    if ('problem' in parsed) {
      setProblem(parsed.problem);
      return;
    }
    setProblem(null);
    save.mutate({ typeId: type.id, rows: parsed.rows });
  };

  return (
    <Stack gap="2" maxW="32rem">
      {(problem || save.isError) && (
        <Alert.Root status="error" colorPalette="nogo" role="alert">
          <Alert.Indicator />
          <Alert.Title>{problem ?? errorMessage(save.error)}</Alert.Title>
        </Alert.Root>
      )}
      <HStack gap="2" fontSize="sm" fontWeight="600" color="fg.muted">
        <Text flex="1">Gross weight (lb)</Text>
        <Text flex="1">Min. launch airspeed (kt)</Text>
        <Text w="2.5rem" />
      </HStack>
      {rows.map((row, index) => (
        <HStack key={index} gap="2">
          <Input
            flex="1"
            inputMode="numeric"
            aria-label={`Row ${index + 1} gross weight`}
            value={row.grossWeightLb}
            onChange={(event) => setCell(index, 'grossWeightLb', event.currentTarget.value)}
          />
          <Input
            flex="1"
            inputMode="decimal"
            aria-label={`Row ${index + 1} minimum launch airspeed`}
            value={row.minLaunchAirspeedKt}
            onChange={(event) => setCell(index, 'minLaunchAirspeedKt', event.currentTarget.value)}
          />
          <IconButton
            aria-label={`Remove row ${index + 1}`}
            variant="ghost"
            colorPalette="nogo"
            onClick={() => setRows((current) => current.filter((_, at) => at !== index))}
          >
            ×
          </IconButton>
        </HStack>
      ))}
      <HStack gap="2">
        <Button
          size="sm"
          variant="outline"
          onClick={() => setRows((current) => [...current, { grossWeightLb: '', minLaunchAirspeedKt: '' }])}
        >
          Add row
        </Button>
        <Button size="sm" colorPalette="accent" onClick={submit} loading={save.isPending}>
          Save table
        </Button>
        {save.isSuccess && (
          <Text fontSize="sm" color="go.fg" role="status">
            Saved.
          </Text>
        )}
      </HStack>
    </Stack>
  );
}
