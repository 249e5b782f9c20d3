import type { ShotCounts } from '@catline/contracts';
import { Controller, Get, Query, type StreamableFile } from '@nestjs/common';
import { ApiBearerAuth, ApiProduces, ApiTags } from '@nestjs/swagger';
import { csvResponse } from './csv-response.js';
import { dayRange } from './day-range.js';
import { ShotCountsQueryDto } from './dto/shot-counts-query.dto.js';
import { ShotCountsService } from './shot-counts.service.js';

// Kept for maintenance; every signed-in role may read them.
@ApiTags('reports')
@ApiBearerAuth()
@Controller('reports')
export class ShotCountsController {
  constructor(private readonly shotCounts: ShotCountsService) {}

  @Get('shot-counts')
  counts(@Query() query: ShotCountsQueryDto): Promise<ShotCounts> {
    return this.shotCounts.counts(dayRange(query.from, query.to));
  }

  @ApiProduces('text/csv')
  @Get('shot-counts.csv')
  async csv(@Query() query: ShotCountsQueryDto): Promise<StreamableFile> {
    return csvResponse(await this.shotCounts.csv(dayRange(query.from, query.to)));
  }
}
