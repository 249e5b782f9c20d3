import type { ImportProblem } from '@catline/contracts';
import { CsvError, parse } from 'csv-parse/sync';

/** The columns of one kind of file, in the order the template writes them. */
export interface CsvLayout<Column extends string> {
  columns: readonly Column[];
  /** More data lines than this are refused whole. */
  maxRows: number;
  /** What one data line stands for, for messages ("aircraft", "table row"). */
  rowNoun: string;
}

/** One data line: its line number in the file and its cells by column. */
export interface CsvRecord<Column extends string> {
  line: number;
  cells: Record<Column, string>;
}

export type CsvTable<Column extends string> =
  { ok: true; records: CsvRecord<Column>[]; problems: ImportProblem[] } | { ok: false; problems: ImportProblem[] };

const fileProblem = (reason: string, row = 1, value: string | null = null): ImportProblem => ({
  row,
  column: null,
  value,
  reason,
});

/**
 * Why the header line is refused before the file is read, or null: a header of many more cells than the
 * layout has (60,000 made-up columns) would otherwise be parsed whole and answered one problem a column.
 */
export function headerWidthProblem<Column extends string>(
  text: string,
  layout: CsvLayout<Column>,
  fileNoun: string,
): string | null {
  const header = text.split('\n', 50).find((line) => !isCommentLine(line)) ?? '';
  const cells = header.split(',').length;
  if (cells <= layout.columns.length * 2) return null;
  return `The header line has ${cells} columns; the ${fileNoun} layout has ${layout.columns.length}: ${layout.columns.join(', ')}. Nothing of the file was read.`;
}

/**
 * A line starting with # is a note, not data: Catline's own templates and exports open with the launch
 * caution written that way, and a file filled in from them comes back with it.
 */
const COMMENT = '#';
const isCommentLine = (line: string) => line.replace(/^\uFEFF/, '').startsWith(COMMENT);

/** A record as csv-parse gives it with `info` on (its typings do not follow that option). */
interface ParsedRecord {
  record: string[];
  info: { lines: number };
}

const lineBreaksIn = (cells: string[]) => cells.reduce((count, cell) => count + (cell.match(/\n/g)?.length ?? 0), 0);

function parseRecords(text: string): { line: number; cells: string[] }[] | ImportProblem {
  try {
    const parsed: ParsedRecord[] = parse(text, {
      bom: true,
      comment: COMMENT,
      comment_no_infix: true,
      info: true,
      trim: true,
      skip_empty_lines: true,
      skip_records_with_empty_values: true,
      relax_column_count: true,
    }) as unknown as ParsedRecord[];
    // `info.lines` is the line a record ends on; a quoted cell may span lines, so count back to its first.
    return parsed.map(({ record, info }) => ({ line: info.lines - lineBreaksIn(record), cells: record }));
  } catch (error) {
    if (!(error instanceof CsvError)) throw error;
    const line = (error as CsvError & { lines?: number }).lines ?? 1;
    const reason =
      error.code === 'CSV_QUOTE_NOT_CLOSED'
        ? 'A quoted cell is never closed: a " opens it but no " ends it.'
        : `This line is not valid CSV (${error.message.replace(/^[^:]*:\s*/, '')}).`;
    return fileProblem(reason, line);
  }
}

function headerProblems<Column extends string>(
  header: string[],
  line: number,
  layout: CsvLayout<Column>,
): ImportProblem[] {
  const known = layout.columns.join(', ');
  const names = header.map((name) => name.toLowerCase());
  const problems: ImportProblem[] = [];
  names.forEach((name, i) => {
    if (!(layout.columns as readonly string[]).includes(name)) {
      const shown = header[i].length > 40 ? `${header[i].slice(0, 40)}…` : header[i];
      problems.push(fileProblem(`Unknown column "${shown}"; the columns are ${known}.`, line, header[i]));
    } else if (names.indexOf(name) !== i) {
      problems.push({
        row: line,
        column: name,
        value: header[i],
        reason: 'This column is named twice in the header line.',
      });
    }
  });
  for (const column of layout.columns) {
    if (!names.includes(column)) {
      problems.push({
        row: line,
        column,
        value: null,
        reason: `The column ${column} is missing from the header line.`,
      });
    }
  }
  return problems;
}

/**
 * Reads CSV text (UTF-8, a byte-order mark and Windows line ends allowed) whose first line names the
 * layout's columns in any order. Problems of the file as a whole stop the reading (ok: false); a data
 * line with the wrong number of cells is reported and left out.
 */
export function readCsvTable<Column extends string>(text: string, layout: CsvLayout<Column>): CsvTable<Column> {
  const records = parseRecords(text);
  if (!Array.isArray(records)) return { ok: false, problems: [records] };
  if (records.length === 0) {
    return {
      ok: false,
      problems: [
        fileProblem(
          `The file is empty: it needs the header line (${layout.columns.join(',')}) and a line per ${layout.rowNoun}.`,
        ),
      ],
    };
  }
  const [header, ...data] = records;
  const problems = headerProblems(header.cells, header.line, layout);
  if (problems.length > 0) return { ok: false, problems };
  if (data.length === 0)
    return { ok: false, problems: [fileProblem(`The file has the header line but no ${layout.rowNoun} under it.`)] };
  if (data.length > layout.maxRows) {
    return {
      ok: false,
      problems: [
        fileProblem(`The file has ${data.length} lines under the header; one upload takes at most ${layout.maxRows}.`),
      ],
    };
  }
  const order = header.cells.map((name) => name.toLowerCase() as Column);
  const read: CsvRecord<Column>[] = [];
  const lineProblems: ImportProblem[] = [];
  for (const { line, cells } of data) {
    if (cells.length !== order.length) {
      lineProblems.push(fileProblem(`This line has ${cells.length} cells; the header line has ${order.length}.`, line));
      continue;
    }
    read.push({
      line,
      cells: Object.fromEntries(order.map((column, i) => [column, cells[i]])) as Record<Column, string>,
    });
  }
  return { ok: true, records: read, problems: lineProblems };
}

/** Problems in file order: by line, then by the column's place in the layout (whole-line problems first). */
export function sortProblems(problems: ImportProblem[], columns: readonly string[]): ImportProblem[] {
  const place = (column: string | null) => (column === null ? -1 : columns.indexOf(column));
  return [...problems].sort((a, b) => a.row - b.row || place(a.column) - place(b.column));
}
