import type { ReactNode } from 'react';
import { Table, Text } from '@chakra-ui/react';
import { TableScroll } from '../../../components/table-scroll.js';

export interface ReportColumn<T> {
  header: string;
  cell: (row: T) => ReactNode;
  numeric?: boolean;
}

interface ReportTableProps<T> {
  caption: string;
  rows: T[];
  columns: ReportColumn<T>[];
  rowKey: (row: T) => string | number;
  empty: string;
}

/** A plain table of a report section, in the record's own order; says so when the section is empty. */
export function ReportTable<T>({ caption, rows, columns, rowKey, empty }: ReportTableProps<T>) {
  if (rows.length === 0) {
    return (
      <Text fontSize="sm" color="fg.muted" data-testid="report-empty">
        {empty}
      </Text>
    );
  }
  return (
    <TableScroll label={caption} className="report-table">
      <Table.Root size="sm">
        <Table.Caption srOnly>{caption}</Table.Caption>
        <Table.Header>
          <Table.Row bg="bg.muted">
            {columns.map((column) => (
              <Table.ColumnHeader key={column.header} textAlign={column.numeric ? 'end' : 'start'} whiteSpace="nowrap">
                {column.header}
              </Table.ColumnHeader>
            ))}
          </Table.Row>
        </Table.Header>
        <Table.Body>
          {rows.map((row) => (
            <Table.Row key={rowKey(row)}>
              {columns.map((column) => (
                <Table.Cell
                  key={column.header}
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
