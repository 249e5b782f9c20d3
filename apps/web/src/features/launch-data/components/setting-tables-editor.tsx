import { Table, Text } from '@chakra-ui/react';
import type { AircraftTypeView } from '@catline/contracts';
import { formatKnots, formatWhole } from '../../../lib/format.js';
import { useSaveSettingTables } from '../api/save-setting-tables.js';
import { type DraftSettingRow, parseSettingTables, toDraftSettingRows } from '../setting-tables-model.js';
import { RowsEditor, type RowsEditorColumn } from './rows-editor.js';

const columns: RowsEditorColumn<DraftSettingRow>[] = [
  { field: 'catapultNumber', header: 'Cat', flex: 1, inputMode: 'numeric', label: (n) => `Setting row ${n} catapult` },
  {
    field: 'configuration',
    header: 'Configuration',
    flex: 2,
    inputMode: 'text',
    label: (n) => `Setting row ${n} configuration`,
  },
  {
    field: 'recommendedExcessKt',
    header: 'Excess (kt)',
    flex: 1,
    inputMode: 'decimal',
    label: (n) => `Setting row ${n} recommended excess`,
  },
  {
    field: 'upToLb',
    header: 'Up to (lb)',
    flex: 2,
    inputMode: 'numeric',
    label: (n) => `Setting row ${n} up to weight`,
  },
  { field: 'setting', header: 'Setting', flex: 1, inputMode: 'numeric', label: (n) => `Setting row ${n} setting` },
];

function SettingTablesTable({ type }: { type: AircraftTypeView }) {
  if (type.settingTables.length === 0)
    return <Text color="fg.muted">No approved settings: no aircraft of the type may be launched.</Text>;
  return (
    <Table.Root size="sm" variant="outline" maxW="36rem" aria-label={`${type.designation} approved settings`}>
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeader>Cat</Table.ColumnHeader>
          <Table.ColumnHeader>Configuration</Table.ColumnHeader>
          <Table.ColumnHeader textAlign="end">Recommended excess</Table.ColumnHeader>
          <Table.ColumnHeader textAlign="end">Up to (lb)</Table.ColumnHeader>
          <Table.ColumnHeader textAlign="end">Setting</Table.ColumnHeader>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {type.settingTables.flatMap((table) =>
          table.rows.map((row) => (
            <Table.Row key={`${table.catapultNumber}-${table.configuration}-${row.upToLb}`}>
              <Table.Cell>{table.catapultNumber}</Table.Cell>
              <Table.Cell>{table.configuration}</Table.Cell>
              <Table.Cell textAlign="end" textStyle="figure">
                {formatKnots(table.recommendedExcessKt)}
              </Table.Cell>
              <Table.Cell textAlign="end" textStyle="figure">
                {formatWhole(row.upToLb)}
              </Table.Cell>
              <Table.Cell textAlign="end" textStyle="figure">
                {row.setting}
              </Table.Cell>
            </Table.Row>
          )),
        )}
      </Table.Body>
    </Table.Root>
  );
}

/**
 * The ship's approved catapult settings for the type, one row per weight of each catapult and
 * configuration (clean, or with stores); the admin edits them.
 */
export function SettingTablesEditor({ type, editable }: { type: AircraftTypeView; editable: boolean }) {
  const save = useSaveSettingTables();
  if (!editable) return <SettingTablesTable type={type} />;

  return (
    <RowsEditor<DraftSettingRow>
      initialRows={toDraftSettingRows(type.settingTables)}
      blankRow={{ catapultNumber: '', configuration: 'clean', recommendedExcessKt: '', upToLb: '', setting: '' }}
      columns={columns}
      rowName={(number) => `setting row ${number}`}
      addLabel="Add row"
      saveLabel="Save approved settings"
      save={save}
      submit={(drafts) => {
        const parsed = parseSettingTables(drafts);
        if ('problem' in parsed) return parsed.problem;
        save.mutate({ typeId: type.id, tables: parsed.tables });
        return null;
      }}
    />
  );
}
