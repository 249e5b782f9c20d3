import type { LineupCommandResult, SpareCandidate } from '@catline/contracts';
import { Body, Controller, Get, HttpCode, HttpStatus, Param, ParseIntPipe, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { ApiDoc } from '../common/openapi/api-doc.decorator.js';
import { LineupCommandResultDto, SpareCandidateDto } from '../common/openapi/views/lineup.view.js';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { actorOf } from '../cycle-changes/cycle-change.service.js';
import { AssignPilotDto } from './dto/assign-pilot.dto.js';
import { CallSpareDto } from './dto/call-spare.dto.js';
import { ReturnToPoolDto } from './dto/return-to-pool.dto.js';
import { UpAgainDto } from './dto/up-again.dto.js';
import { PilotAssignmentService } from './pilot-assignment.service.js';
import { ReturnToPoolService } from './return-to-pool.service.js';
import { SparesService } from './spares.service.js';

// Spares, down aircraft, pilots and returns to the deck pool; every command answers 200 with the accepted change.
@ApiTags('lineup')
@Controller('cycles/:cycleId/lineup/slots/:slotId')
export class SparesController {
  constructor(
    private readonly spares: SparesService,
    private readonly pilots: PilotAssignmentService,
    private readonly returns: ReturnToPoolService,
  ) {}

  @ApiDoc('List the spares for a down aircraft', {
    response: [SpareCandidateDto],
    description: 'Held spares, the same type first, then the same mission.',
    refuses: { 404: ['not_found'], 409: ['spare_unavailable'] },
  })
  @Roles('handler')
  @Get('spares')
  candidates(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Param('slotId', ParseIntPipe) slotId: number,
  ): Promise<SpareCandidate[]> {
    return this.spares.candidates(cycleId, slotId);
  }

  @ApiDoc('Call a spare for a down aircraft', {
    response: LineupCommandResultDto,
    description: "The spare joins the deck pool and the down aircraft's pilot moves to it.",
    refuses: { 404: ['not_found'], 409: ['spare_unavailable', 'stale_basis', 'cycle_closed'] },
  })
  @Roles('handler')
  @Post('spare')
  @HttpCode(HttpStatus.OK)
  callSpare(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Param('slotId', ParseIntPipe) slotId: number,
    @Body() body: CallSpareDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.spares.callSpare(cycleId, actorOf(user), slotId, body);
  }

  @ApiDoc('Put a down aircraft up again', {
    response: LineupCommandResultDto,
    refuses: { 404: ['not_found'], 409: ['wrong_step', 'stale_basis', 'cycle_closed'] },
  })
  @Roles('handler')
  @Post('up')
  @HttpCode(HttpStatus.OK)
  upAgain(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Param('slotId', ParseIntPipe) slotId: number,
    @Body() body: UpAgainDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.spares.upAgain(cycleId, actorOf(user), slotId, body);
  }

  @ApiDoc('Assign or move a pilot', {
    response: LineupCommandResultDto,
    refuses: {
      400: ['invalid_pilot'],
      404: ['not_found'],
      409: ['wrong_step', 'no_change', 'pilot_missing', 'stale_basis', 'cycle_closed'],
    },
  })
  @Roles('handler', 'air_operations')
  @Post('pilot')
  @HttpCode(HttpStatus.OK)
  assignPilot(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Param('slotId', ParseIntPipe) slotId: number,
    @Body() body: AssignPilotDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.pilots.assign(cycleId, actorOf(user), slotId, body);
  }

  @ApiDoc('Return a taxiing or on-catapult aircraft to the deck pool', {
    response: LineupCommandResultDto,
    refuses: {
      403: ['not_your_catapult', 'agreement_required'],
      404: ['not_found'],
      409: ['wrong_step', 'no_change', 'stale_basis', 'cycle_closed'],
    },
  })
  @Roles('catapult_officer', 'handler')
  @Post('return')
  @HttpCode(HttpStatus.OK)
  returnToPool(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Param('slotId', ParseIntPipe) slotId: number,
    @Body() body: ReturnToPoolDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.returns.returnToPool(cycleId, user, slotId, body);
  }
}
