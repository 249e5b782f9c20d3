import type { AircraftTypeView, LaunchTablePreview, Page, UploadView } from '@catline/contracts';
import {
  Controller,
  Get,
  Header,
  HttpCode,
  HttpStatus,
  Param,
  ParseIntPipe,
  Post,
  Query,
  UploadedFile,
} from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { CsvUpload } from './csv-upload.decorator.js';
import type { UploadedCsv } from './csv-upload.js';
import { LAUNCH_TABLE_TEMPLATE } from './launch-table-layout.js';
import { LaunchTableImports } from './launch-table-imports.service.js';
import { ApiDoc } from '../common/openapi/api-doc.decorator.js';
import { AircraftTypeViewDto } from '../common/openapi/views/fleet.view.js';
import { LaunchTablePreviewDto, UploadPageDto } from '../common/openapi/views/imports.view.js';
import { RecordsPageQueryDto } from '../common/paging/page-query.dto.js';

@ApiTags('imports')
@Controller('aircraft-types')
export class LaunchTableController {
  constructor(private readonly imports: LaunchTableImports) {}

  /** The launch table layout: the header line and two example lines (invented figures). */
  @ApiDoc('Download the launch table template', { response: 'csv' })
  @Roles('admin')
  @Get('launch-table/template')
  @Header('Content-Type', 'text/csv; charset=utf-8')
  @Header('Content-Disposition', 'attachment; filename="launch-table-template.csv"')
  template(): string {
    return LAUNCH_TABLE_TEMPLATE;
  }

  @ApiDoc("List an aircraft type's launch table uploads, a page at a time", {
    response: UploadPageDto,
    description: 'Newest first, each with its outcome: accepted, rejected (kept a day) or imported.',
    refuses: { 404: ['target_not_found'] },
  })
  @Roles('admin')
  @Get(':id/launch-table/imports')
  uploads(
    @Param('id', ParseIntPipe) id: number,
    @CurrentUser() user: AuthenticatedUser,
    @Query() query: RecordsPageQueryDto,
  ): Promise<Page<UploadView>> {
    return this.imports.listUploads(id, user, query);
  }

  @ApiDoc('Preview a launch table', {
    response: LaunchTablePreviewDto,
    description: 'Reads the CSV and lists every problem; nothing is imported until the confirm.',
    refuses: {
      400: ['file_missing', 'header_too_wide'],
      404: ['target_not_found'],
      413: ['file_too_large'],
      415: ['not_csv'],
    },
  })
  @Roles('admin')
  @Post(':id/launch-table/preview')
  @HttpCode(HttpStatus.OK)
  @CsvUpload()
  preview(
    @Param('id', ParseIntPipe) id: number,
    @UploadedFile() file: UploadedCsv | undefined,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LaunchTablePreview> {
    return this.imports.preview(id, file, user);
  }

  /** Replaces the type's launch table with the previewed rows, in one transaction. */
  @ApiDoc('Import a previewed launch table', {
    response: AircraftTypeViewDto,
    refuses: {
      400: ['invalid_launch_data'],
      404: ['target_not_found', 'upload_not_found'],
      409: ['upload_not_importable', 'import_out_of_date'],
    },
  })
  @Roles('admin')
  @Post(':id/launch-table/imports/:uploadId/confirm')
  @HttpCode(HttpStatus.OK)
  confirm(
    @Param('id', ParseIntPipe) id: number,
    @Param('uploadId', ParseIntPipe) uploadId: number,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<AircraftTypeView> {
    return this.imports.confirm(id, uploadId, user);
  }
}
