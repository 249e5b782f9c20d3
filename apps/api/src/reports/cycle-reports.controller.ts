import type { CycleReplay, CycleReport } from '@catline/contracts';
import { Controller, Get, Param, ParseIntPipe, type StreamableFile } from '@nestjs/common';
import { ApiBearerAuth, ApiProduces, ApiTags } from '@nestjs/swagger';
import { csvResponse } from './csv-response.js';
import { CycleReportsService } from './cycle-reports.service.js';

// Every signed-in role reads a cycle's record; nothing here changes it.
@ApiTags('reports')
@ApiBearerAuth()
@Controller('cycles/:id')
export class CycleReportsController {
  constructor(private readonly reports: CycleReportsService) {}

  @Get('report')
  report(@Param('id', ParseIntPipe) id: number): Promise<CycleReport> {
    return this.reports.report(id);
  }

  @Get('replay')
  replay(@Param('id', ParseIntPipe) id: number): Promise<CycleReplay> {
    return this.reports.replay(id);
  }

  @ApiProduces('text/csv')
  @Get('slots.csv')
  async slotsCsv(@Param('id', ParseIntPipe) id: number): Promise<StreamableFile> {
    return csvResponse(await this.reports.slotsCsv(id));
  }

  @ApiProduces('text/csv')
  @Get('changes.csv')
  async changesCsv(@Param('id', ParseIntPipe) id: number): Promise<StreamableFile> {
    return csvResponse(await this.reports.changesCsv(id));
  }
}
