import type { AirPlanPreview, LineupCommandResult, Page, UploadView } from '@catline/contracts';
import {
  Body,
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
import { BasisVersionDto } from '../cycles/dto/basis-version.dto.js';
import { AIR_PLAN_TEMPLATE } from './air-plan-layout.js';
import { AirPlanImports } from './air-plan-imports.service.js';
import { CsvUpload } from './csv-upload.decorator.js';
import type { UploadedCsv } from './csv-upload.js';
import { ApiDoc } from '../common/openapi/api-doc.decorator.js';
import { LineupCommandResultDto } from '../common/openapi/views/lineup.view.js';
import { AirPlanPreviewDto, UploadPageDto } from '../common/openapi/views/imports.view.js';
import { RecordsPageQueryDto } from '../common/paging/page-query.dto.js';

@ApiTags('imports')
@Controller()
export class AirPlanController {
  constructor(private readonly imports: AirPlanImports) {}

  /** The air plan layout: the header line and one example line. */
  @ApiDoc('Download the air plan template', { response: 'csv' })
  @Roles('air_operations')
  @Get('air-plan/template')
  @Header('Content-Type', 'text/csv; charset=utf-8')
  @Header('Content-Disposition', 'attachment; filename="air-plan-template.csv"')
  template(): string {
    return AIR_PLAN_TEMPLATE;
  }

  @ApiDoc("List a cycle's air plan uploads, a page at a time", {
    response: UploadPageDto,
    description: 'Newest first, each with its outcome: accepted, rejected (kept a day) or imported.',
    refuses: { 404: ['target_not_found'] },
  })
  @Roles('air_operations')
  @Get('cycles/:cycleId/air-plan/imports')
  uploads(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Query() query: RecordsPageQueryDto,
  ): Promise<Page<UploadView>> {
    return this.imports.listUploads(cycleId, query);
  }

  @ApiDoc('Preview an air plan', {
    response: AirPlanPreviewDto,
    description: 'Reads the CSV and lists every problem; nothing is imported until the confirm.',
    refuses: {
      400: ['file_missing', 'header_too_wide'],
      404: ['target_not_found'],
      409: ['cycle_closed'],
      413: ['file_too_large'],
      415: ['not_csv'],
    },
  })
  @Roles('air_operations')
  @Post('cycles/:cycleId/air-plan/preview')
  @HttpCode(HttpStatus.OK)
  @CsvUpload()
  preview(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @UploadedFile() file: UploadedCsv | undefined,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<AirPlanPreview> {
    return this.imports.preview(cycleId, file, user);
  }

  @ApiDoc('Import a previewed air plan', {
    response: LineupCommandResultDto,
    description: 'Adds its sorties to the deck pool in one change.',
    refuses: {
      404: ['target_not_found', 'upload_not_found'],
      409: ['stale_basis', 'cycle_closed', 'upload_not_importable', 'import_out_of_date'],
    },
  })
  @Roles('air_operations')
  @Post('cycles/:cycleId/air-plan/imports/:uploadId/confirm')
  @HttpCode(HttpStatus.OK)
  confirm(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Param('uploadId', ParseIntPipe) uploadId: number,
    @Body() body: BasisVersionDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.imports.confirm(cycleId, uploadId, body.basisVersion, user);
  }
}
