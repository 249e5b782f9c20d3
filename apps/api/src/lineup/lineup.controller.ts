import {
  CATAPULT_ROLES,
  type LineupChange,
  type LineupCommandResult,
  type LineupSnapshot,
  type SuggestedLineup,
} from '@catline/contracts';
import { Body, Controller, Get, HttpCode, HttpStatus, Param, ParseIntPipe, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { actorOf } from '../cycle-changes/cycle-change.service.js';
import { AdvanceSlotDto } from './dto/advance-slot.dto.js';
import { ApplySuggestionDto } from './dto/apply-suggestion.dto.js';
import { ChangesQueryDto } from './dto/changes-query.dto.js';
import { LaunchSlotDto } from './dto/launch-slot.dto.js';
import { MarkDownDto } from './dto/mark-down.dto.js';
import { MoveSlotDto } from './dto/move-slot.dto.js';
import { SetCatapultStatusDto } from './dto/set-catapult-status.dto.js';
import { SuspendSlotDto } from './dto/suspend-slot.dto.js';
import { WeightAckDto } from './dto/weight-ack.dto.js';
import { LineupChangesService } from '../cycle-changes/lineup-changes.service.js';
import { LineupCommandsService } from './lineup-commands.service.js';
import { LineupSnapshotService } from '../cycle-changes/lineup-snapshot.service.js';
import { ReadinessService } from './readiness.service.js';
import { SuggestionService } from './suggestion.service.js';
import { WaiversService } from './waivers.service.js';
import { WaiveGateDto } from './dto/waive-gate.dto.js';

// Every command answers 200 with the accepted change (a repeated launch answers with the original one).
@ApiTags('lineup')
@ApiBearerAuth()
@Controller('cycles/:cycleId/lineup')
export class LineupController {
  constructor(
    private readonly snapshots: LineupSnapshotService,
    private readonly changes: LineupChangesService,
    private readonly suggestions: SuggestionService,
    private readonly commands: LineupCommandsService,
    private readonly readiness: ReadinessService,
    private readonly waivers: WaiversService,
  ) {}

  @Get()
  snapshot(@Param('cycleId', ParseIntPipe) cycleId: number): Promise<LineupSnapshot> {
    return this.snapshots.snapshot(cycleId);
  }

  @Get('changes')
  changesSince(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Query() query: ChangesQueryDto,
  ): Promise<LineupChange[]> {
    return this.changes.since(cycleId, query.since);
  }

  @Roles('handler')
  @Get('suggestion')
  suggestion(@Param('cycleId', ParseIntPipe) cycleId: number): Promise<SuggestedLineup> {
    return this.suggestions.suggest(cycleId);
  }

  @Roles('handler')
  @Post('moves')
  @HttpCode(HttpStatus.OK)
  move(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Body() body: MoveSlotDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.commands.move(cycleId, actorOf(user), body);
  }

  @Roles('handler')
  @Post('suggestion/apply')
  @HttpCode(HttpStatus.OK)
  applySuggestion(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Body() body: ApplySuggestionDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.commands.applySuggestion(cycleId, actorOf(user), body);
  }

  @Roles('handler')
  @Post('slots/:slotId/down')
  @HttpCode(HttpStatus.OK)
  markDown(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Param('slotId', ParseIntPipe) slotId: number,
    @Body() body: MarkDownDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.commands.markDown(cycleId, actorOf(user), slotId, body);
  }

  @Roles('handler')
  @Post('catapults/:catapultId/status')
  @HttpCode(HttpStatus.OK)
  setCatapultStatus(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Param('catapultId', ParseIntPipe) catapultId: number,
    @Body() body: SetCatapultStatusDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.commands.setCatapultStatus(cycleId, actorOf(user), catapultId, body);
  }

  @Roles(...CATAPULT_ROLES)
  @Post('slots/:slotId/advance')
  @HttpCode(HttpStatus.OK)
  advance(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Param('slotId', ParseIntPipe) slotId: number,
    @Body() body: AdvanceSlotDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.readiness.advance(cycleId, user, slotId, body);
  }

  @Roles(...CATAPULT_ROLES)
  @Post('slots/:slotId/suspend')
  @HttpCode(HttpStatus.OK)
  suspend(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Param('slotId', ParseIntPipe) slotId: number,
    @Body() body: SuspendSlotDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.readiness.suspend(cycleId, user, slotId, body);
  }

  @Roles(...CATAPULT_ROLES)
  @Post('slots/:slotId/launch')
  @HttpCode(HttpStatus.OK)
  launch(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Param('slotId', ParseIntPipe) slotId: number,
    @Body() body: LaunchSlotDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.readiness.launch(cycleId, user, slotId, body);
  }

  /** Soft gates only (the DTO refuses a hard one); recorded on the slot and with the launch. */
  @Roles('air_boss')
  @Post('slots/:slotId/waivers')
  @HttpCode(HttpStatus.OK)
  waive(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Param('slotId', ParseIntPipe) slotId: number,
    @Body() body: WaiveGateDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.waivers.waive(cycleId, user, slotId, body);
  }

  @Roles('pilot')
  @Post('slots/:slotId/weight-ack')
  @HttpCode(HttpStatus.OK)
  acknowledgeWeight(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Param('slotId', ParseIntPipe) slotId: number,
    @Body() body: WeightAckDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.readiness.acknowledgeWeight(cycleId, user, slotId, body);
  }
}
