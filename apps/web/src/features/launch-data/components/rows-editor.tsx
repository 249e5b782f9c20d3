import { useState } from 'react';
import { Alert, Button, HStack, IconButton, Input, Stack, Text } from '@chakra-ui/react';
import { errorMessage } from '../../../lib/api-error.js';

/** One column of typed cells; `label` names the cell of a row for screen readers and tests. */
export interface RowsEditorColumn<Row> {
  field: keyof Row & string;
  header: string;
  flex: number;
  inputMode: 'text' | 'numeric' | 'decimal';
  label: (rowNumber: number) => string;
}

/** Where the save stands, as a TanStack Query mutation reports it. */
export interface RowsSave {
  isPending: boolean;
  isError: boolean;
  isSuccess: boolean;
  error: unknown;
}

interface RowsEditorProps<Row extends Record<keyof Row, string>> {
  initialRows: Row[];
  blankRow: Row;
  columns: RowsEditorColumn<Row>[];
  rowName: (rowNumber: number) => string;
  addLabel: string;
  saveLabel: string;
  save: RowsSave;
  /** Sends the rows when they read right; else answers the sentence that says what is wrong. */
  submit: (rows: Row[]) => string | null;
}

/** The admin's editor of a table typed in as text rows: add, remove, fix cells, save all at once. */
export function RowsEditor<Row extends Record<keyof Row, string>>(props: RowsEditorProps<Row>) {
  const { blankRow, columns, rowName, addLabel, saveLabel, save, submit } = props;
  const [rows, setRows] = useState<Row[]>(props.initialRows);
  const [problem, setProblem] = useState<string | null>(null);
  const setCell = (index: number, field: keyof Row, value: string) =>
    setRows((current) => current.map((row, at) => (at === index ? { ...row, [field]: value } : row)));

  return (
    <Stack gap="2" maxW="32rem">
      {(problem || save.isError) && (
        <Alert.Root status="error" colorPalette="nogo" role="alert">
          <Alert.Indicator />
          <Alert.Title>{problem ?? errorMessage(save.error)}</Alert.Title>
        </Alert.Root>
      )}
      <HStack gap="2" fontSize="sm" fontWeight="600" color="fg.muted">
        {columns.map((column) => (
          <Text key={column.field} flex={column.flex}>
            {column.header}
          </Text>
        ))}
        <Text w="2.5rem" />
      </HStack>
      {rows.map((row, index) => (
        <HStack key={index} gap="2">
          {columns.map((column) => (
            <Input
              key={column.field}
              flex={column.flex}
              inputMode={column.inputMode}
              aria-label={column.label(index + 1)}
              value={row[column.field]}
              onChange={(event) => setCell(index, column.field, event.currentTarget.value)}
            />
          ))}
          <IconButton
            aria-label={`Remove ${rowName(index + 1)}`}
            variant="ghost"
            colorPalette="nogo"
            onClick={() => setRows((current) => current.filter((_, at) => at !== index))}
          >
            ×
          </IconButton>
        </HStack>
      ))}
      <HStack gap="2">
        <Button size="sm" variant="outline" onClick={() => setRows((current) => [...current, { ...blankRow }])}>
          {addLabel}
        </Button>
        <Button size="sm" colorPalette="accent" onClick={() => setProblem(submit(rows))} loading={save.isPending}>
          {saveLabel}
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
