import { Table, Text } from '@chakra-ui/react';
import type { AircraftTypeView } from '@catline/contracts';
import { formatWhole } from '../../../lib/format.js';
import { useSaveStoresCatalogue } from '../api/save-stores-catalogue.js';
import { type DraftStoresItem, parseStoresCatalogue, toDraftStores } from '../stores-catalogue-model.js';
import { RowsEditor, type RowsEditorColumn } from './rows-editor.js';

const columns: RowsEditorColumn<DraftStoresItem>[] = [
  { field: 'name', header: 'Item', flex: 2, inputMode: 'text', label: (number) => `Stores item ${number} name` },
  {
    field: 'weightEachLb',
    header: 'Weight each (lb)',
    flex: 1,
    inputMode: 'numeric',
    label: (number) => `Stores item ${number} weight each`,
  },
];

function StoresCatalogueTable({ type }: { type: AircraftTypeView }) {
  if (type.storesCatalogue.length === 0) return <Text color="fg.muted">No stores in the catalogue.</Text>;
  return (
    <Table.Root size="sm" variant="outline" maxW="28rem" aria-label={`${type.designation} stores catalogue`}>
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeader>Item</Table.ColumnHeader>
          <Table.ColumnHeader textAlign="end">Weight each (lb)</Table.ColumnHeader>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {type.storesCatalogue.map((item) => (
          <Table.Row key={item.name}>
            <Table.Cell>{item.name}</Table.Cell>
            <Table.Cell textAlign="end" textStyle="figure">
              {formatWhole(item.weightEachLb)}
            </Table.Cell>
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}

/** What an aircraft of the type can carry and what one of each weighs; the admin edits it. */
export function StoresCatalogueEditor({ type, editable }: { type: AircraftTypeView; editable: boolean }) {
  const save = useSaveStoresCatalogue();
  if (!editable) return <StoresCatalogueTable type={type} />;

  return (
    <RowsEditor<DraftStoresItem>
      initialRows={toDraftStores(type.storesCatalogue)}
      blankRow={{ name: '', weightEachLb: '' }}
      columns={columns}
      rowName={(number) => `stores item ${number}`}
      addLabel="Add item"
      saveLabel="Save catalogue"
      save={save}
      submit={(drafts) => {
        const parsed = parseStoresCatalogue(drafts);
        if ('problem' in parsed) return parsed.problem;
        save.mutate({ typeId: type.id, items: parsed.items });
        return null;
      }}
    />
  );
}
