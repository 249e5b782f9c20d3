import { Table } from '@chakra-ui/react';
import type { AircraftTypeView } from '@catline/contracts';
import { formatWhole } from '../../../lib/format.js';
import { useSaveLaunchTable } from '../api/save-launch-table.js';
import { type DraftRow, parseLaunchTable, toDraftRows } from '../launch-data-model.js';
import { RowsEditor, type RowsEditorColumn } from './rows-editor.js';

const columns: RowsEditorColumn<DraftRow>[] = [
  {
    field: 'grossWeightLb',
    header: 'Gross weight (lb)',
    flex: 1,
    inputMode: 'numeric',
    label: (number) => `Row ${number} gross weight`,
  },
  {
    field: 'minLaunchAirspeedKt',
    header: 'Min. launch airspeed (kt)',
    flex: 1,
    inputMode: 'decimal',
    label: (number) => `Row ${number} minimum launch airspeed`,
  },
];

/** The type's minimum launch airspeed by gross weight; the admin edits it, everyone else reads it. */
export function LaunchTableEditor({ type, editable }: { type: AircraftTypeView; editable: boolean }) {
  const save = useSaveLaunchTable();

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

  return (
    <RowsEditor<DraftRow>
      initialRows={toDraftRows(type.launchTable)}
      blankRow={{ grossWeightLb: '', minLaunchAirspeedKt: '' }}
      columns={columns}
      rowName={(number) => `row ${number}`}
      addLabel="Add row"
      saveLabel="Save table"
      save={save}
      submit={(rows) => {
        const parsed = parseLaunchTable(rows);
        if ('problem' in parsed) return parsed.problem;
        save.mutate({ typeId: type.id, rows: parsed.rows });
        return null;
      }}
    />
  );
}
