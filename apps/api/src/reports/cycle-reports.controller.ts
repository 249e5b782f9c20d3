import type { CycleReplay, CycleReport } from '@catline/contracts';
import { Controller, Get, Param, ParseIntPipe, type StreamableFile } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { csvResponse } from '../common/csv-response.js';
import { CycleReportsService } from './cycle-reports.service.js';
import { ApiDoc } from '../common/openapi/api-doc.decorator.js';
import { CycleReplayDto, CycleReportDto } from '../common/openapi/views/reports.view.js';

// Every signed-in role reads a cycle's record; nothing here changes it.
@ApiTags('reports')
@Controller('cycles/:cycleId')
export class CycleReportsController {
  constructor(private readonly reports: CycleReportsService) {}

  @ApiDoc('Read the record of a cycle', { response: CycleReportDto, refuses: { 404: ['not_found'] } })
  @Get('report')
  report(@Param('cycleId', ParseIntPipe) cycleId: number): Promise<CycleReport> {
    return this.reports.report(cycleId);
  }

  @ApiDoc('Read the history of a cycle', {
    response: CycleReplayDto,
    description: 'The lineup at version 0 and every change after it, to step through.',
    refuses: { 404: ['not_found'], 422: ['launch_data_invalid'] },
  })
  @Get('replay')
  replay(@Param('cycleId', ParseIntPipe) cycleId: number): Promise<CycleReplay> {
    return this.reports.replay(cycleId);
  }

  @ApiDoc('Download the aircraft of a cycle as CSV', { response: 'csv', refuses: { 404: ['not_found'] } })
  @Get('slots.csv')
  async slotsCsv(@Param('cycleId', ParseIntPipe) cycleId: number): Promise<StreamableFile> {
    return csvResponse(await this.reports.slotsCsv(cycleId));
  }

  @ApiDoc('Download the change log of a cycle as CSV', { response: 'csv', refuses: { 404: ['not_found'] } })
  @Get('changes.csv')
  async changesCsv(@Param('cycleId', ParseIntPipe) cycleId: number): Promise<StreamableFile> {
    return csvResponse(await this.reports.changesCsv(cycleId));
  }
}
