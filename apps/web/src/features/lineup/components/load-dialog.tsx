import { useState } from 'react';
import { Alert, Box, Input, Stack, Table, Text } from '@chakra-ui/react';
import type { AircraftTypeView, SetLoadRequest, SlotView } from '@catline/contracts';
import { ActionDialog } from '../../../components/action-dialog.js';
import { CautionLine } from '../../../components/caution-line.js';
import { FormField } from '../../../components/form-field.js';
import { weightSum } from '../../../components/gross-weight-parts.js';
import { ErrorState, LoadingState } from '../../../components/query-states.js';
import { formatPounds, formatWhole } from '../../../lib/format.js';
import { useAircraftTypes } from '../../../lib/queries/aircraft-types-query.js';
import { type DraftStoresRow, draftStoresRows, parseLoad, previewWeight } from '../load-model.js';

interface LoadDialogProps {
  slot: SlotView;
  pending: boolean;
  onClose: () => void;
  onConfirm: (load: Omit<SetLoadRequest, 'slotVersion'>) => void;
}

/** The planned weight this load gives, with its parts; or why it cannot be built. */
function WeightPreview({ type, fuel, rows }: { type: AircraftTypeView; fuel: string; rows: DraftStoresRow[] }) {
  if (type.operatingWeightLb === null) {
    return (
      <Text color="caution.fg">
        {type.designation} has no operating weight in the launch data yet, so no weight can be built for it.
      </Text>
    );
  }
  const parsed = parseLoad(fuel, rows);
  if ('problem' in parsed) return null;
  const build = previewWeight(type.operatingWeightLb, parsed.load, rows);
  return (
    <Box data-testid="load-weight-preview">
      <Text fontWeight="700" textStyle="figure">
        Planned weight {formatPounds(build.grossWeight)}
      </Text>
      <Text fontSize="sm" color="fg.muted" textStyle="figure">
        = {weightSum(build.operatingWeight, build.fuel, build.storesWeight)} lb
      </Text>
    </Box>
  );
}

function LoadForm({ slot, type, pending, onClose, onConfirm }: LoadDialogProps & { type: AircraftTypeView }) {
  const [fuel, setFuel] = useState(String(slot.fuelLb));
  const [rows, setRows] = useState(() => draftStoresRows(type.storesCatalogue, slot.storesList));
  const [problem, setProblem] = useState<string | null>(null);
  const setCount = (index: number, count: string) =>
    setRows((current) => current.map((row, at) => (at === index ? { ...row, count } : row)));

  return (
    <ActionDialog
      open
      size="lg"
      title={`Fuel and stores of ${slot.sideNumber}`}
      onClose={onClose}
      confirmLabel="Save fuel and stores"
      onConfirm={() => {
        const parsed = parseLoad(fuel, rows);
        setProblem('problem' in parsed ? parsed.problem : null);
        if ('load' in parsed) onConfirm(parsed.load);
      }}
      pending={pending}
    >
      <Stack gap="4">
        <Text>
          The planned weight becomes the {type.designation}&apos;s operating weight with crew plus fuel plus stores;
          once the weight was agreed, the catapult crew verifies it again.
        </Text>
        {problem && (
          <Alert.Root status="error" colorPalette="nogo" role="alert">
            <Alert.Indicator />
            <Alert.Title>{problem}</Alert.Title>
          </Alert.Root>
        )}
        <FormField label="Fuel on board (lb)" required>
          <Input inputMode="numeric" value={fuel} onChange={(event) => setFuel(event.currentTarget.value)} />
        </FormField>
        {rows.length === 0 ? (
          <Text color="fg.muted">The {type.designation} has no stores in its catalogue: it flies clean.</Text>
        ) : (
          <Table.Root size="sm" variant="outline" aria-label="Stores">
            <Table.Header>
              <Table.Row>
                <Table.ColumnHeader>Item</Table.ColumnHeader>
                <Table.ColumnHeader textAlign="end">Weight each (lb)</Table.ColumnHeader>
                <Table.ColumnHeader>Count</Table.ColumnHeader>
              </Table.Row>
            </Table.Header>
            <Table.Body>
              {rows.map((row, index) => (
                <Table.Row key={row.name}>
                  <Table.Cell>
                    {row.name}
                    {!row.inCatalogue && (
                      <Text as="span" color="nogo.fg" fontSize="sm">
                        {' '}
                        (no longer in the catalogue: set 0)
                      </Text>
                    )}
                  </Table.Cell>
                  <Table.Cell textAlign="end" textStyle="figure">
                    {formatWhole(row.weightEachLb)}
                  </Table.Cell>
                  <Table.Cell>
                    <Input
                      size="sm"
                      w="5rem"
                      inputMode="numeric"
                      aria-label={`Count of ${row.name}`}
                      value={row.count}
                      onChange={(event) => setCount(index, event.currentTarget.value)}
                    />
                  </Table.Cell>
                </Table.Row>
              ))}
            </Table.Body>
          </Table.Root>
        )}
        <WeightPreview type={type} fuel={fuel} rows={rows} />
        <CautionLine compact />
      </Stack>
    </ActionDialog>
  );
}

/** Fuel on board and the stores from the type's catalogue; the server builds the planned weight from them. */
export function LoadDialog(props: LoadDialogProps) {
  const types = useAircraftTypes();
  const type = types.data?.find((candidate) => candidate.id === props.slot.typeId);
  if (type) return <LoadForm {...props} type={type} />;
  return (
    <ActionDialog
      open
      title={`Fuel and stores of ${props.slot.sideNumber}`}
      onClose={props.onClose}
      confirmLabel="Save fuel and stores"
      confirmDisabled
      onConfirm={() => undefined}
    >
      {types.isPending ? (
        <LoadingState label="Finding the stores catalogue…" />
      ) : types.isError ? (
        <ErrorState error={types.error} onRetry={() => void types.refetch()} />
      ) : (
        <Text>The type of {props.slot.sideNumber} is not in the launch data.</Text>
      )}
    </ActionDialog>
  );
}
