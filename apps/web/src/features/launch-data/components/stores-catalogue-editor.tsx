import { useState } from 'react';
import { Alert, Button, HStack, IconButton, Input, Stack, Table, Text } from '@chakra-ui/react';
import type { AircraftTypeView } from '@catline/contracts';
import { errorMessage } from '../../../lib/api-error.js';
import { formatWhole } from '../../../lib/format.js';
import { useSaveStoresCatalogue } from '../api/save-stores-catalogue.js';
import { type DraftStoresItem, parseStoresCatalogue, toDraftStores } from '../stores-catalogue-model.js';

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
  const [drafts, setDrafts] = useState<DraftStoresItem[]>(() => toDraftStores(type.storesCatalogue));
  const [problem, setProblem] = useState<string | null>(null);
  const setCell = (index: number, field: keyof DraftStoresItem, value: string) =>
    setDrafts((current) => current.map((draft, at) => (at === index ? { ...draft, [field]: value } : draft)));

  if (!editable) return <StoresCatalogueTable type={type} />;

  const submit = () => {
    const parsed = parseStoresCatalogue(drafts);
    if ('problem' in parsed) {
      setProblem(parsed.problem);
      return;
    }
    setProblem(null);
    save.mutate({ typeId: type.id, items: parsed.items });
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
        <Text flex="2">Item</Text>
        <Text flex="1">Weight each (lb)</Text>
        <Text w="2.5rem" />
      </HStack>
      {drafts.map((draft, index) => (
        <HStack key={index} gap="2">
          <Input
            flex="2"
            aria-label={`Stores item ${index + 1} name`}
            value={draft.name}
            onChange={(event) => setCell(index, 'name', event.currentTarget.value)}
          />
          <Input
            flex="1"
            inputMode="numeric"
            aria-label={`Stores item ${index + 1} weight each`}
            value={draft.weightEachLb}
            onChange={(event) => setCell(index, 'weightEachLb', event.currentTarget.value)}
          />
          <IconButton
            aria-label={`Remove stores item ${index + 1}`}
            variant="ghost"
            colorPalette="nogo"
            onClick={() => setDrafts((current) => current.filter((_, at) => at !== index))}
          >
            ×
          </IconButton>
        </HStack>
      ))}
      <HStack gap="2">
        <Button
          size="sm"
          variant="outline"
          onClick={() => setDrafts((current) => [...current, { name: '', weightEachLb: '' }])}
        >
          Add item
        </Button>
        <Button size="sm" colorPalette="accent" onClick={submit} loading={save.isPending}>
          Save catalogue
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
