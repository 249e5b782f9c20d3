import { useState, type FormEvent } from 'react';
import { Alert, Button, HStack, Input, Stack, Table, Text } from '@chakra-ui/react';
import type { UseMutationResult } from '@tanstack/react-query';
import type { ImportPreview, ImportProblem } from '@catline/contracts';
import { errorMessage } from '../lib/api-error.js';
import type { Column } from './data-table.js';
import { FormField } from './form-field.js';
import { TableScroll } from './table-scroll.js';

interface CsvImportProps<Row extends { row: number }> {
  /** What the file holds, in a few words: "air plan", "launch table". */
  subject: string;
  /** The layout in a sentence; the template carries the exact columns. */
  hint: string;
  template: UseMutationResult<void, Error, void>;
  preview: UseMutationResult<ImportPreview<Row>, Error, File>;
  /** Confirms the previewed upload by its id. */
  confirm: UseMutationResult<unknown, Error, number>;
  columns: Column<Row>[];
  importLabel: (rowCount: number) => string;
  importedMessage: string;
}

const plural = (count: number, noun: string) => `${count} ${noun}${count === 1 ? '' : 's'}`;

function ProblemList({ problems }: { problems: ImportProblem[] }) {
  return (
    <TableScroll label="Problems found in the file" borderColor="nogo.border">
      <Table.Root size="sm" data-testid="import-problems">
        <Table.Caption srOnly>Problems found in the file</Table.Caption>
        <Table.Header>
          <Table.Row bg="nogo.subtle">
            <Table.ColumnHeader textAlign="end">Line</Table.ColumnHeader>
            <Table.ColumnHeader>Column</Table.ColumnHeader>
            <Table.ColumnHeader>Value</Table.ColumnHeader>
            <Table.ColumnHeader>What is wrong</Table.ColumnHeader>
          </Table.Row>
        </Table.Header>
        <Table.Body>
          {problems.map((problem, index) => (
            <Table.Row key={index}>
              <Table.Cell textAlign="end" textStyle="figure">
                {problem.row}
              </Table.Cell>
              <Table.Cell>{problem.column ?? (problem.row === 1 ? 'Header' : 'Whole line')}</Table.Cell>
              <Table.Cell fontFamily="mono">
                {problem.value === null ? '—' : problem.value === '' ? '(empty)' : problem.value}
              </Table.Cell>
              <Table.Cell>{problem.reason}</Table.Cell>
            </Table.Row>
          ))}
        </Table.Body>
      </Table.Root>
    </TableScroll>
  );
}

function RowsRead<Row extends { row: number }>({
  rows,
  columns,
  problemLines,
}: {
  rows: Row[];
  columns: Column<Row>[];
  problemLines: Set<number>;
}) {
  return (
    <TableScroll label="Lines read from the file">
      <Table.Root size="sm" data-testid="import-rows">
        <Table.Caption srOnly>Lines read from the file</Table.Caption>
        <Table.Header>
          <Table.Row bg="bg.muted">
            <Table.ColumnHeader textAlign="end">Line</Table.ColumnHeader>
            {columns.map((column) => (
              <Table.ColumnHeader key={column.key} textAlign={column.numeric ? 'end' : 'start'} whiteSpace="nowrap">
                {column.header}
              </Table.ColumnHeader>
            ))}
          </Table.Row>
        </Table.Header>
        <Table.Body>
          {rows.map((row) => (
            <Table.Row key={row.row} bg={problemLines.has(row.row) ? 'nogo.subtle' : undefined}>
              <Table.Cell textAlign="end" textStyle="figure">
                {row.row}
              </Table.Cell>
              {columns.map((column) => (
                <Table.Cell
                  key={column.key}
                  textAlign={column.numeric ? 'end' : 'start'}
                  textStyle={column.numeric ? 'figure' : undefined}
                >
                  {column.cell(row)}
                </Table.Cell>
              ))}
            </Table.Row>
          ))}
        </Table.Body>
      </Table.Root>
    </TableScroll>
  );
}

/**
 * A CSV import in two steps: the server reads and checks the file and answers what it found; only a
 * file without a problem can then be imported, whole.
 */
export function CsvImport<Row extends { row: number }>({
  subject,
  hint,
  template,
  preview,
  confirm,
  columns,
  importLabel,
  importedMessage,
}: CsvImportProps<Row>) {
  const [file, setFile] = useState<File | null>(null);
  const [missing, setMissing] = useState(false);
  // A new input element forgets the chosen file after an import.
  const [inputKey, setInputKey] = useState(0);
  const checked = preview.isSuccess ? preview.data : null;
  const refusal = [template, preview, confirm].find((step) => step.isError)?.error;

  const choose = (chosen: File | null) => {
    setFile(chosen);
    setMissing(false);
    template.reset();
    preview.reset();
    confirm.reset();
  };

  const check = (event: FormEvent) => {
    event.preventDefault();
    confirm.reset();
    if (!file) setMissing(true);
    else preview.mutate(file);
  };

  const importChecked = (uploadId: number) =>
    confirm.mutate(uploadId, {
      onSuccess: () => {
        setFile(null);
        setInputKey((key) => key + 1);
        preview.reset();
      },
    });

  return (
    <Stack gap="3" data-testid="csv-import">
      <Text fontSize="sm" color="fg.muted">
        {hint}
      </Text>
      <form onSubmit={check} noValidate aria-label={`Check a ${subject} file`}>
        <HStack gap="2" align="flex-end" wrap="wrap">
          <Stack flex="1" minW="14rem" maxW="28rem">
            <FormField
              label={`${capitalized(subject)} file (CSV)`}
              error={missing ? 'Choose a CSV file first.' : undefined}
            >
              <Input
                key={inputKey}
                type="file"
                accept=".csv,text/csv"
                py="1.5"
                onChange={(event) => choose(event.currentTarget.files?.[0] ?? null)}
              />
            </FormField>
          </Stack>
          <Button type="submit" variant="outline" loading={preview.isPending} loadingText="Checking…">
            Check file
          </Button>
          <Button variant="ghost" onClick={() => template.mutate()} loading={template.isPending}>
            Download template
          </Button>
        </HStack>
      </form>
      {refusal && (
        <Alert.Root status="error" colorPalette="nogo" role="alert" data-testid="import-refusal">
          <Alert.Indicator />
          <Alert.Title>{errorMessage(refusal)}</Alert.Title>
        </Alert.Root>
      )}
      {confirm.isSuccess && (
        <Alert.Root status="success" colorPalette="go" role="status" data-testid="import-done">
          <Alert.Indicator />
          <Alert.Title>{importedMessage}</Alert.Title>
        </Alert.Root>
      )}
      {checked && (
        <CheckedFile
          checked={checked}
          columns={columns}
          importLabel={importLabel}
          importing={confirm.isPending}
          onImport={importChecked}
        />
      )}
    </Stack>
  );
}

const capitalized = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

interface CheckedFileProps<Row extends { row: number }> {
  checked: ImportPreview<Row>;
  columns: Column<Row>[];
  importLabel: (rowCount: number) => string;
  importing: boolean;
  onImport: (uploadId: number) => void;
}

/** What the server found in the file: its problems first, then the lines it could read. */
function CheckedFile<Row extends { row: number }>({
  checked,
  columns,
  importLabel,
  importing,
  onImport,
}: CheckedFileProps<Row>) {
  const { fileName, rows, problems, problemCount } = checked;
  const importable = checked.result === 'accepted' && problemCount === 0;
  const firstOnly = problemCount > problems.length ? ` (the first ${problems.length} are listed)` : '';
  return (
    <Stack gap="3">
      {importable ? (
        <Text color="go.fg" fontWeight="600" role="status">
          {fileName}: {plural(rows.length, 'line')} read, no problems. Nothing changes until you import it.
        </Text>
      ) : (
        <Text color="nogo.fg" fontWeight="600" role="status">
          {fileName}: {plural(problemCount, 'problem')}
          {firstOnly}. Nothing can be imported until the file is put right and checked again.
        </Text>
      )}
      {problems.length > 0 && <ProblemList problems={problems} />}
      {rows.length > 0 && (
        <RowsRead rows={rows} columns={columns} problemLines={new Set(problems.map((problem) => problem.row))} />
      )}
      {importable && (
        <Button
          colorPalette="accent"
          alignSelf="flex-start"
          loading={importing}
          onClick={() => onImport(checked.uploadId)}
        >
          {importLabel(rows.length)}
        </Button>
      )}
    </Stack>
  );
}
