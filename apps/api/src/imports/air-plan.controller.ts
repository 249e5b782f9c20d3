import type { AirPlanPreview, LineupCommandResult } from '@catline/contracts';
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
  UploadedFile,
} from '@nestjs/common';
import { ApiBearerAuth, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { BasisVersionDto } from '../cycles/dto/basis-version.dto.js';
import { AIR_PLAN_TEMPLATE } from './air-plan-layout.js';
import { AirPlanImports } from './air-plan-imports.service.js';
import { CsvUpload } from './csv-upload.decorator.js';
import type { UploadedCsv } from './csv-upload.js';

@ApiTags('imports')
@ApiBearerAuth()
@Controller()
export class AirPlanController {
  constructor(private readonly imports: AirPlanImports) {}

  /** The air plan layout: the header line and one example line. */
  @Roles('air_operations')
  @Get('air-plan/template')
  @ApiProduces('text/csv')
  @Header('Content-Type', 'text/csv; charset=utf-8')
  @Header('Content-Disposition', 'attachment; filename="air-plan-template.csv"')
  template(): string {
    return AIR_PLAN_TEMPLATE;
  }

  @Roles('air_operations')
  @Post('cycles/:id/air-plan/preview')
  @CsvUpload()
  preview(
    @Param('id', ParseIntPipe) id: number,
    @UploadedFile() file: UploadedCsv | undefined,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<AirPlanPreview> {
    return this.imports.preview(id, file, user);
  }

  @Roles('air_operations')
  @Post('cycles/:id/air-plan/imports/:uploadId/confirm')
  @HttpCode(HttpStatus.OK)
  confirm(
    @Param('id', ParseIntPipe) id: number,
    @Param('uploadId', ParseIntPipe) uploadId: number,
    @Body() body: BasisVersionDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.imports.confirm(id, uploadId, body.basisVersion, user);
  }
}
