import {
  type AirPlanRow,
  FUEL_LB,
  GROSS_WEIGHT_LB,
  type ImportProblem,
  MISSION_MAX_LENGTH,
  SIDE_NUMBER_MAX_LENGTH,
  STORES_MAX_LENGTH,
} from '@catline/contracts';
import { toCsv } from '../common/csv.js';
import { type Cell, flag, isProblem, optionalEmail, text, wholeNumber } from './cell-parsers.js';
import { type CsvLayout, type CsvRecord, readCsvTable, sortProblems } from './csv-table.js';

// Our air plan layout: one line per sortie of the cycle. README.md in this folder documents it.

export const AIR_PLAN_COLUMNS = [
  'side_number',
  'pilot_email',
  'mission',
  'fuel_lb',
  'stores',
  'gross_weight_lb',
  'tanker',
  'early_warning',
  'spare',
] as const;
export type AirPlanColumn = (typeof AIR_PLAN_COLUMNS)[number];

export const AIR_PLAN_LAYOUT: CsvLayout<AirPlanColumn> = {
  columns: AIR_PLAN_COLUMNS,
  maxRows: 200,
  rowNoun: 'aircraft',
};

/** The template's header and one example line (an invented sortie of the demo fleet). */
export const AIR_PLAN_TEMPLATE = toCsv(AIR_PLAN_COLUMNS, [
  ['C21', 'pilot@catline.example', 'Strike training', 11_500, '4 practice bombs', 45_400, 'no', 'no', 'no'],
]);

/** An air plan line as read, before the side number and e-mail are matched. */
export type AirPlanLine = Omit<AirPlanRow, 'typeDesignation' | 'squadronCode' | 'pilotName'>;

type Parsers = { [Column in AirPlanColumn]: (raw: string) => Cell<unknown> };

const PARSERS: Parsers = {
  side_number: (raw) => text(raw, { required: true, maxLength: SIDE_NUMBER_MAX_LENGTH, what: 'A side number' }),
  pilot_email: optionalEmail,
  mission: (raw) => text(raw, { required: true, maxLength: MISSION_MAX_LENGTH, what: 'A mission' }),
  fuel_lb: (raw) => wholeNumber(raw, { ...FUEL_LB, unit: 'lb' }),
  stores: (raw) => text(raw, { required: false, maxLength: STORES_MAX_LENGTH, what: 'Stores' }),
  gross_weight_lb: (raw) => wholeNumber(raw, { ...GROSS_WEIGHT_LB, unit: 'lb' }),
  tanker: flag,
  early_warning: flag,
  spare: flag,
};

/** Reads each cell of one line; the line when every cell is right, its problems otherwise. */
export function readAirPlanLine(
  record: CsvRecord<AirPlanColumn>,
): { line: AirPlanLine } | { problems: ImportProblem[] } {
  const values: Partial<Record<AirPlanColumn, unknown>> = {};
  const problems: ImportProblem[] = [];
  for (const column of AIR_PLAN_COLUMNS) {
    const raw = record.cells[column];
    const cell = PARSERS[column](raw);
    if (isProblem(cell)) problems.push({ row: record.line, column, value: raw, reason: cell.reason });
    else values[column] = cell.value;
  }
  if (problems.length > 0) return { problems };
  return {
    line: {
      row: record.line,
      sideNumber: values.side_number as string,
      pilotEmail: values.pilot_email as string | null,
      mission: values.mission as string,
      fuelLb: values.fuel_lb as number,
      stores: values.stores as string,
      grossWeightLb: values.gross_weight_lb as number,
      tanker: values.tanker as boolean,
      earlyWarning: values.early_warning as boolean,
      spare: values.spare as boolean,
    },
  };
}

/** The lines of an air plan file whose cells are right, and the problems of the rest. */
export function readAirPlan(text: string): { lines: AirPlanLine[]; problems: ImportProblem[] } {
  const table = readCsvTable(text, AIR_PLAN_LAYOUT);
  if (!table.ok) return { lines: [], problems: table.problems };
  const lines: AirPlanLine[] = [];
  const problems = [...table.problems];
  for (const record of table.records) {
    const read = readAirPlanLine(record);
    if ('line' in read) lines.push(read.line);
    else problems.push(...read.problems);
  }
  return { lines, problems: sortProblems(problems, AIR_PLAN_COLUMNS) };
}
