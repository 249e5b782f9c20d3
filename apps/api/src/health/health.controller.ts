import { Controller, Get, HttpStatus, Res } from '@nestjs/common';
import { ApiServiceUnavailableResponse, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { Public } from '../common/decorators/public.decorator.js';
import { ApiDoc } from '../common/openapi/api-doc.decorator.js';
import { HealthService } from './health.service.js';
import { type Health, HealthDto } from './health.view.js';

@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(private readonly health: HealthService) {}

  /** Answered directly rather than thrown, so monitors get this body and not the generic error one. */
  @Public()
  @Get()
  @ApiDoc('Check the API and its database', {
    response: HealthDto,
    description: 'The API and MariaDB answer: {"status":"ok","database":"up"}.',
  })
  @ApiServiceUnavailableResponse({
    description: 'MariaDB does not answer: {"status":"error","database":"down"}.',
    type: HealthDto,
  })
  async check(@Res({ passthrough: true }) response: Response): Promise<Health> {
    if (await this.health.isDatabaseUp()) return { status: 'ok', database: 'up' };
    response.status(HttpStatus.SERVICE_UNAVAILABLE);
    return { status: 'error', database: 'down' };
  }
}
