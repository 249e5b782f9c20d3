import { useMemo, useState, type ReactNode } from 'react';
import { Box, chakra, HStack, Input, Table, Text } from '@chakra-ui/react';
import { EmptyState } from './query-states.js';
import { TableScroll } from './table-scroll.js';

type Sortable = string | number | boolean | null;

export interface Column<T> {
  key: string;
  header: string;
  cell: (row: T) => ReactNode;
  /** The value the column sorts by; a column without one does not sort. */
  sortValue?: (row: T) => Sortable;
  /** Text the filter box matches; defaults to the sort value. */
  filterText?: (row: T) => string;
  numeric?: boolean;
}

interface DataTableProps<T> {
  caption: string;
  rows: T[];
  columns: Column<T>[];
  rowKey: (row: T) => string | number;
  emptyTitle: string;
  emptyHint?: ReactNode;
  /** The row being worked on elsewhere on the page, highlighted. */
  selectedKey?: string | number;
  initialSort?: { key: string; descending?: boolean };
}

function compare(a: Sortable, b: Sortable): number {
  if (a === b) return 0;
  if (a === null) return 1;
  if (b === null) return -1;
  if (typeof a === 'number' && typeof b === 'number') return a - b;
  return String(a).localeCompare(String(b), 'en', { numeric: true });
}

const SortButton = chakra('button', {
  base: {
    display: 'inline-flex',
    gap: '1',
    alignItems: 'center',
    fontWeight: '700',
    cursor: 'pointer',
    _focusVisible: { outline: '2px solid', outlineColor: 'accent.focusRing' },
  },
});

/** A table that sorts by a column header and filters on text; the header says how it is sorted. */
export function DataTable<T>({
  caption,
  rows,
  columns,
  rowKey,
  emptyTitle,
  emptyHint,
  selectedKey,
  initialSort,
}: DataTableProps<T>) {
  const [filter, setFilter] = useState('');
  const [sort, setSort] = useState(initialSort ?? null);

  const shown = useMemo(() => {
    const needle = filter.trim().toLowerCase();
    const textOf = (row: T) =>
      columns
        .map((column) => column.filterText?.(row) ?? String(column.sortValue?.(row) ?? ''))
        .join(' ')
        .toLowerCase();
    const filtered = needle ? rows.filter((row) => textOf(row).includes(needle)) : rows;
    const column = sort && columns.find((candidate) => candidate.key === sort.key);
    if (!sort || !column?.sortValue) return filtered;
    const direction = sort.descending ? -1 : 1;
    return [...filtered].sort((a, b) => direction * compare(column.sortValue!(a), column.sortValue!(b)));
  }, [rows, columns, filter, sort]);

  if (rows.length === 0) return <EmptyState title={emptyTitle}>{emptyHint}</EmptyState>;

  const toggle = (key: string) =>
    setSort((current) =>
      current?.key === key ? { key, descending: !current.descending } : { key, descending: false },
    );

  return (
    <Box>
      <HStack mb="2" gap="3" wrap="wrap">
        <Input
          size="sm"
          maxW="20rem"
          placeholder="Filter…"
          aria-label={`Filter ${caption.toLowerCase()}`}
          value={filter}
          onChange={(event) => setFilter(event.currentTarget.value)}
        />
        <Text fontSize="sm" color="fg.muted" aria-live="polite">
          {shown.length} of {rows.length}
        </Text>
      </HStack>
      <TableScroll label={caption}>
        <Table.Root size="sm" stickyHeader>
          <Table.Caption srOnly>{caption}</Table.Caption>
          <Table.Header>
            <Table.Row bg="bg.muted">
              {columns.map((column) => {
                const sorted = sort?.key === column.key ? (sort.descending ? 'descending' : 'ascending') : undefined;
                return (
                  <Table.ColumnHeader
                    key={column.key}
                    aria-sort={sorted ?? (column.sortValue ? 'none' : undefined)}
                    textAlign={column.numeric ? 'end' : 'start'}
                    whiteSpace="nowrap"
                  >
                    {column.sortValue ? (
                      <SortButton type="button" onClick={() => toggle(column.key)}>
                        {column.header}
                        <span aria-hidden="true">
                          {sorted === 'ascending' ? '▲' : sorted === 'descending' ? '▼' : '↕'}
                        </span>
                      </SortButton>
                    ) : (
                      column.header
                    )}
                  </Table.ColumnHeader>
                );
              })}
            </Table.Row>
          </Table.Header>
          <Table.Body>
            {shown.map((row) => {
              const key = rowKey(row);
              return (
                <Table.Row
                  key={key}
                  data-selected={key === selectedKey ? '' : undefined}
                  bg={key === selectedKey ? 'accent.subtle' : undefined}
                >
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
              );
            })}
          </Table.Body>
        </Table.Root>
      </TableScroll>
      {shown.length === 0 && (
        <Text mt="2" fontSize="sm" color="fg.muted">
          Nothing matches “{filter}”.
        </Text>
      )}
    </Box>
  );
}
