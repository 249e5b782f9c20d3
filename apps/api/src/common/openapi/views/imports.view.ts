import {
  type AirPlanPreview,
  type AirPlanRow,
  type ImportProblem,
  type LaunchTableImportRow,
  type LaunchTablePreview,
  UPLOAD_RESULTS,
  type UploadResult,
  type UploadView,
} from '@catline/contracts';
import { ApiProperty, ApiSchema } from '@nestjs/swagger';
import { EnumProperty, IdProperty, InstantProperty, IntProperty } from './fields.js';
import { PageDto } from './paging.view.js';

type PreviewResult = Exclude<UploadResult, 'imported'>;
const PREVIEW_RESULTS = UPLOAD_RESULTS.filter((result) => result !== 'imported');

@ApiSchema({ name: 'ImportProblem', description: 'One thing wrong with an uploaded file, by line and column.' })
export class ImportProblemDto implements ImportProblem {
  @IntProperty({ minimum: 1, description: 'Line of the file, 1 for the header line.' })
  row: number;

  @ApiProperty({ type: String, nullable: true, description: "The column's header name; null for a whole line." })
  column: string | null;

  @ApiProperty({ type: String, nullable: true, description: 'The cell as written; null when there is none.' })
  value: string | null;

  @ApiProperty({ description: 'What is wrong and what would be right.' })
  reason: string;
}

@ApiSchema({ name: 'AirPlanRow', description: 'One sortie of an air plan, matched against the fleet and people.' })
export class AirPlanRowDto implements AirPlanRow {
  @IntProperty({ minimum: 1, description: 'Line of the file.' })
  row: number;

  @ApiProperty()
  sideNumber: string;

  @ApiProperty({ type: String, nullable: true })
  pilotEmail: string | null;

  @ApiProperty()
  mission: string;

  @IntProperty({ minimum: 0 })
  fuelLb: number;

  @ApiProperty()
  stores: string;

  @IntProperty({ minimum: 0 })
  grossWeightLb: number;

  @ApiProperty()
  tanker: boolean;

  @ApiProperty()
  earlyWarning: boolean;

  @ApiProperty()
  spare: boolean;

  @ApiProperty({ type: String, nullable: true })
  typeDesignation: string | null;

  @ApiProperty({ type: String, nullable: true })
  squadronCode: string | null;

  @ApiProperty({ type: String, nullable: true })
  pilotName: string | null;
}

@ApiSchema({ name: 'LaunchTableImportRow' })
export class LaunchTableImportRowDto implements LaunchTableImportRow {
  @IntProperty({ minimum: 1, description: 'Line of the file.' })
  row: number;

  @IntProperty({ minimum: 0 })
  grossWeightLb: number;

  @ApiProperty({ description: 'Knots.' })
  minLaunchAirspeedKt: number;
}

/** What every preview answers besides its rows. */
class ImportPreviewFields {
  @IdProperty({ description: 'Confirm the upload by this id when there is no problem.' })
  uploadId: number;

  @ApiProperty()
  fileName: string;

  @EnumProperty(PREVIEW_RESULTS, 'PreviewResult')
  result: PreviewResult;

  @ApiProperty({ type: [ImportProblemDto], description: 'The first problems in file order.' })
  problems: ImportProblem[];

  @IntProperty({ minimum: 0, description: 'How many problems the file has in all.' })
  problemCount: number;
}

@ApiSchema({ name: 'AirPlanPreview' })
export class AirPlanPreviewDto extends ImportPreviewFields implements AirPlanPreview {
  @ApiProperty({ type: [AirPlanRowDto] })
  rows: AirPlanRow[];
}

@ApiSchema({ name: 'LaunchTablePreview' })
export class LaunchTablePreviewDto extends ImportPreviewFields implements LaunchTablePreview {
  @ApiProperty({ type: [LaunchTableImportRowDto] })
  rows: LaunchTableImportRow[];
}

@ApiSchema({ name: 'Upload', description: 'One uploaded file as kept: who sent it, when, and what came of it.' })
export class UploadViewDto implements UploadView {
  @IdProperty()
  id: number;

  @ApiProperty({ description: "As the sender's computer named it." })
  fileName: string;

  @IntProperty({ minimum: 0 })
  sizeBytes: number;

  @InstantProperty()
  uploadedAt: string;

  @IdProperty()
  uploadedById: number;

  @EnumProperty(UPLOAD_RESULTS, 'UploadResult')
  result: UploadResult;

  @IntProperty({ minimum: 0, description: 'Every problem the preview found.' })
  problemCount: number;

  @InstantProperty({ nullable: true })
  importedAt: string | null;
}

export const UploadPageDto = PageDto(UploadViewDto, 'Upload', 'One page of the uploads of one target, newest first.');
