import type { LineupCommandResult, SpareCandidate } from '@catline/contracts';
import { Body, Controller, Get, HttpCode, HttpStatus, Param, ParseIntPipe, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
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
@ApiBearerAuth()
@Controller('cycles/:cycleId/lineup/slots/:slotId')
export class SparesController {
  constructor(
    private readonly spares: SparesService,
    private readonly pilots: PilotAssignmentService,
    private readonly returns: ReturnToPoolService,
  ) {}

  @Roles('handler')
  @Get('spares')
  candidates(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Param('slotId', ParseIntPipe) slotId: number,
  ): Promise<SpareCandidate[]> {
    return this.spares.candidates(cycleId, slotId);
  }

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
