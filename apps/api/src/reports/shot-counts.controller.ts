import type { ShotCounts } from '@catline/contracts';
import { Controller, Get, Query, type StreamableFile } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { csvResponse } from '../common/csv-response.js';
import { dayRange } from './day-range.js';
import { ShotCountsQueryDto } from './dto/shot-counts-query.dto.js';
import { ShotCountsService } from './shot-counts.service.js';
import { ApiDoc } from '../common/openapi/api-doc.decorator.js';
import { ShotCountsDto } from '../common/openapi/views/reports.view.js';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';

// Kept for maintenance; every signed-in role may read them.
@ApiTags('reports')
@Controller('reports')
export class ShotCountsController {
  constructor(private readonly shotCounts: ShotCountsService) {}

  @ApiDoc('Count the launches per airframe and catapult', {
    response: ShotCountsDto,
    refuses: { 400: ['invalid_date_range'] },
  })
  @Get('shot-counts')
  counts(@CurrentUser() caller: AuthenticatedUser, @Query() query: ShotCountsQueryDto): Promise<ShotCounts> {
    return this.shotCounts.counts(caller, dayRange(query.from, query.to));
  }

  @ApiDoc('Download the shot counts as CSV', { response: 'csv', refuses: { 400: ['invalid_date_range'] } })
  @Get('shot-counts.csv')
  async csv(@CurrentUser() caller: AuthenticatedUser, @Query() query: ShotCountsQueryDto): Promise<StreamableFile> {
    return csvResponse(await this.shotCounts.csv(caller, dayRange(query.from, query.to)));
  }
}
