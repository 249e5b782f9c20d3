import { CATAPULT_ROLES, type LineupCommandResult } from '@catline/contracts';
import { Body, Controller, HttpCode, HttpStatus, Param, ParseIntPipe, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { ApiDoc } from '../common/openapi/api-doc.decorator.js';
import { LineupCommandResultDto } from '../common/openapi/views/lineup.view.js';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { CatapultEventsService } from './catapult-events.service.js';
import { CatapultEventDto } from './dto/catapult-event.dto.js';
import { DownOnCatapultDto } from './dto/down-on-catapult.dto.js';

const EVENT_REFUSALS = {
  403: ['not_your_catapult'],
  404: ['not_found'],
  409: ['stale_basis', 'wrong_step'],
} as const;

// The catapult crew's reports of what went wrong at the shot; every one answers 200 with the accepted change.
@ApiTags('lineup')
@Controller('cycles/:cycleId/lineup/slots/:slotId')
export class CatapultEventsController {
  constructor(private readonly events: CatapultEventsService) {}

  @ApiDoc('Report a hangfire', {
    response: LineupCommandResultDto,
    description: 'The catapult fired and the tensioned aircraft did not go; it is suspended where it stands.',
    refuses: EVENT_REFUSALS,
  })
  @Roles(...CATAPULT_ROLES)
  @Post('hangfire')
  @HttpCode(HttpStatus.OK)
  hangfire(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Param('slotId', ParseIntPipe) slotId: number,
    @Body() body: CatapultEventDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.events.hangfire(cycleId, user, slotId, body);
  }

  @ApiDoc('Report a suspected cold shot', {
    response: LineupCommandResultDto,
    description:
      'On the last aircraft launched from the catapult: the catapult goes down for inspection and an aircraft on it is suspended.',
    refuses: EVENT_REFUSALS,
  })
  @Roles(...CATAPULT_ROLES)
  @Post('cold-shot')
  @HttpCode(HttpStatus.OK)
  coldShot(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Param('slotId', ParseIntPipe) slotId: number,
    @Body() body: CatapultEventDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.events.coldShot(cycleId, user, slotId, body);
  }

  @ApiDoc('Report an aircraft down on the catapult', {
    response: LineupCommandResultDto,
    description: 'The aircraft leaves the catapult: back to the deck pool, or down and out of the cycle.',
    refuses: EVENT_REFUSALS,
  })
  @Roles(...CATAPULT_ROLES)
  @Post('down-on-catapult')
  @HttpCode(HttpStatus.OK)
  downOnCatapult(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Param('slotId', ParseIntPipe) slotId: number,
    @Body() body: DownOnCatapultDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.events.downOnCatapult(cycleId, user, slotId, body);
  }
}
