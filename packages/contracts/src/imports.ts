import type { LaunchTableRow } from './fleet.js';

/** One thing wrong with an uploaded file, pointed at the line and column a spreadsheet shows. */
export interface ImportProblem {
  /** Line of the file, 1 for the header line. */
  row: number;
  /** The column's header name; null when the whole line or file is concerned. */
  column: string | null;
  /** The cell as written; null when there is none. */
  value: string | null;
  /** A sentence saying what is wrong and what would be right. */
  reason: string;
}

/** `accepted`: the preview found no problem and awaits its confirm; `imported`: confirmed. */
export const UPLOAD_RESULTS = ['accepted', 'rejected', 'imported'] as const;
export type UploadResult = (typeof UPLOAD_RESULTS)[number];

/** One file as kept after its preview: who sent it, when, and what came of it. */
export interface UploadView {
  id: number;
  fileName: string;
  sizeBytes: number;
  uploadedAt: string;
  uploadedById: number;
  result: UploadResult;
  /** Every problem the preview found (only the first ones are kept with it). */
  problemCount: number;
  importedAt: string | null;
}

/** What a preview answers; confirm the upload by its id when `problems` is empty. */
export interface ImportPreview<Row> {
  uploadId: number;
  fileName: string;
  result: Exclude<UploadResult, 'imported'>;
  /** Every line whose cells could be read, in file order (a line may still have a problem in `problems`). */
  rows: Row[];
  /** The first MAX_IMPORT_PROBLEMS problems in file order, each cell value cut to MAX_PROBLEM_VALUE_CHARS. */
  problems: ImportProblem[];
  /** How many problems the file has in all. */
  problemCount: number;
}

/** Problems an import preview answers and keeps; `problemCount` says how many there are in all. */
export const MAX_IMPORT_PROBLEMS = 100;
/** Characters of a cell a problem repeats; a longer one ends in `…`. */
export const MAX_PROBLEM_VALUE_CHARS = 100;

/** One sortie of an air plan, as read from its CSV line and matched against the fleet and people. */
export interface AirPlanRow {
  /** Line of the file. */
  row: number;
  sideNumber: string;
  /** Null when the line names no pilot yet. */
  pilotEmail: string | null;
  mission: string;
  fuelLb: number;
  stores: string;
  grossWeightLb: number;
  tanker: boolean;
  earlyWarning: boolean;
  spare: boolean;
  /** Filled from the fleet and people when the side number and e-mail are known; null otherwise. */
  typeDesignation: string | null;
  squadronCode: string | null;
  pilotName: string | null;
}

export type AirPlanPreview = ImportPreview<AirPlanRow>;

export interface LaunchTableImportRow extends LaunchTableRow {
  /** Line of the file. */
  row: number;
}

export type LaunchTablePreview = ImportPreview<LaunchTableImportRow>;
