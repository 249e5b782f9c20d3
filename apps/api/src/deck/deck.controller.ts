import type { LineupCommandResult } from '@catline/contracts';
import { Body, Controller, HttpCode, HttpStatus, Param, ParseIntPipe, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { actorOf } from '../cycle-changes/cycle-change.service.js';
import { ApiDoc } from '../common/openapi/api-doc.decorator.js';
import { LineupCommandResultDto } from '../common/openapi/views/lineup.view.js';
import { DeckCommandsService } from './deck-commands.service.js';
import { SetDeckStatusDto } from './dto/set-deck-status.dto.js';
import { SetLandingAreaDto } from './dto/set-landing-area.dto.js';
import { TowAircraftDto } from './dto/tow-aircraft.dto.js';
import { BuildRespotDto, RespotTowDoneDto } from './dto/respot.dto.js';
import { RespotService } from './respot.service.js';

// Each command answers 200 with the accepted change, like the lineup's; the lineup snapshot carries
// every aircraft's position and the landing area.
@ApiTags('deck')
@Controller('cycles/:cycleId/deck')
export class DeckController {
  constructor(
    private readonly commands: DeckCommandsService,
    private readonly respots: RespotService,
  ) {}

  @ApiDoc('Tow an aircraft to another position', {
    response: LineupCommandResultDto,
    description: 'To a free deck spot or elevator, or a hangar bay; refused when the way is blocked.',
    refuses: {
      400: ['unknown_position'],
      404: ['not_found'],
      409: ['stale_basis', 'cycle_closed', 'slot_not_movable', 'no_change', 'position_occupied', 'path_blocked'],
    },
  })
  @Roles('handler')
  @Post('tows')
  @HttpCode(HttpStatus.OK)
  tow(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Body() body: TowAircraftDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.commands.tow(cycleId, actorOf(user), body);
  }

  @ApiDoc('Set the landing area', {
    response: LineupCommandResultDto,
    description: 'Clear, recovering or fouled (with a reason); the catapults inside it pause unless clear.',
    refuses: { 404: ['not_found'], 409: ['stale_basis', 'cycle_closed', 'no_change'] },
  })
  @Roles('air_boss', 'handler')
  @Post('landing-area')
  @HttpCode(HttpStatus.OK)
  setLandingArea(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Body() body: SetLandingAreaDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.commands.setLandingArea(cycleId, actorOf(user), body);
  }

  @ApiDoc("Set a catapult's deck status", {
    response: LineupCommandResultDto,
    description: 'By the air boss: clear to launch, or not clear with a reason; a catapult not clear launches nothing.',
    refuses: { 404: ['not_found'], 409: ['stale_basis', 'cycle_closed', 'no_change'] },
  })
  @Roles('air_boss')
  @Post('catapult-status')
  @HttpCode(HttpStatus.OK)
  setDeckStatus(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Body() body: SetDeckStatusDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.commands.setDeckStatus(cycleId, actorOf(user), body);
  }

  @ApiDoc('Build the respot for the recovery', {
    response: LineupCommandResultDto,
    description:
      'After the last launch: target positions for aircraft on deck or below, and where the airborne ones land; answers with the tows in order.',
    refuses: {
      400: ['unknown_position', 'invalid_respot'],
      404: ['not_found'],
      409: ['stale_basis', 'launches_pending', 'slot_not_movable', 'position_occupied', 'path_blocked'],
    },
  })
  @Roles('handler')
  @Post('respot')
  @HttpCode(HttpStatus.OK)
  buildRespot(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Body() body: BuildRespotDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.respots.build(cycleId, actorOf(user), body);
  }

  @ApiDoc('Tick off a tow of the respot', {
    response: LineupCommandResultDto,
    description: 'The next tow in order: the aircraft is towed to its target.',
    refuses: {
      404: ['not_found'],
      409: [
        'stale_basis',
        'no_change',
        'respot_out_of_order',
        'respot_out_of_date',
        'position_occupied',
        'path_blocked',
      ],
    },
  })
  @Roles('handler')
  @Post('respot/tows/:step')
  @HttpCode(HttpStatus.OK)
  respotTowDone(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Param('step', ParseIntPipe) step: number,
    @Body() body: RespotTowDoneDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.respots.towDone(cycleId, actorOf(user), step, body);
  }
}
