import type { AircraftTypeView, LaunchTablePreview } from '@catline/contracts';
import { Controller, Get, Header, HttpCode, HttpStatus, Param, ParseIntPipe, Post, UploadedFile } from '@nestjs/common';
import { ApiBearerAuth, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { CsvUpload } from './csv-upload.decorator.js';
import type { UploadedCsv } from './csv-upload.js';
import { LAUNCH_TABLE_TEMPLATE } from './launch-table-layout.js';
import { LaunchTableImports } from './launch-table-imports.service.js';

@ApiTags('imports')
@ApiBearerAuth()
@Controller('aircraft-types')
export class LaunchTableController {
  constructor(private readonly imports: LaunchTableImports) {}

  /** The launch table layout: the header line and two example lines (invented figures). */
  @Roles('admin')
  @Get('launch-table/template')
  @ApiProduces('text/csv')
  @Header('Content-Type', 'text/csv; charset=utf-8')
  @Header('Content-Disposition', 'attachment; filename="launch-table-template.csv"')
  template(): string {
    return LAUNCH_TABLE_TEMPLATE;
  }

  @Roles('admin')
  @Post(':id/launch-table/preview')
  @CsvUpload()
  preview(
    @Param('id', ParseIntPipe) id: number,
    @UploadedFile() file: UploadedCsv | undefined,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LaunchTablePreview> {
    return this.imports.preview(id, file, user);
  }

  /** Replaces the type's launch table with the previewed rows, in one transaction. */
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
