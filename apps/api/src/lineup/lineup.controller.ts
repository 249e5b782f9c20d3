import {
  CATAPULT_ROLES,
  LAUNCH_GATE_CODES,
  type LineupChange,
  type LineupCommandResult,
  type LineupSnapshot,
  type Page,
  type SlotView,
  type SuggestedLineup,
} from '@catline/contracts';
import { Body, Controller, Get, HttpCode, HttpStatus, Param, ParseIntPipe, Post, Query } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
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
import { SuspendReasonDto } from './dto/suspend-reason.dto.js';
import { SuspendSlotDto } from './dto/suspend-slot.dto.js';
import { WeightAckDto } from './dto/weight-ack.dto.js';
import { LineupChangesService } from '../cycle-changes/lineup-changes.service.js';
import { LineupCommandsService } from './lineup-commands.service.js';
import { LineupSnapshotService } from '../cycle-changes/lineup-snapshot.service.js';
import { ReadinessService } from './readiness.service.js';
import { SuggestionService } from './suggestion.service.js';
import { WaiversService } from './waivers.service.js';
import { WaiveGateDto } from './dto/waive-gate.dto.js';
import { ApiDoc } from '../common/openapi/api-doc.decorator.js';
import {
  LineupChangePageDto,
  LineupCommandResultDto,
  LineupSnapshotDto,
  SlotViewDto,
  SuggestedLineupDto,
} from '../common/openapi/views/lineup.view.js';
import { UndoStepDto } from './dto/undo-step.dto.js';

// Every command answers 200 with the accepted change (a repeated launch answers with the original one).
@ApiTags('lineup')
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

  @ApiDoc('Read the lineup of a cycle', {
    response: LineupSnapshotDto,
    refuses: { 404: ['not_found'], 422: ['launch_data_invalid'] },
  })
  @Get()
  snapshot(@Param('cycleId', ParseIntPipe) cycleId: number): Promise<LineupSnapshot> {
    return this.snapshots.snapshot(cycleId);
  }

  @ApiDoc('Read one slot of a cycle', {
    response: SlotViewDto,
    description: 'The slot as the lineup shows it, with its place and projected figures.',
    refuses: { 404: ['not_found'], 422: ['launch_data_invalid'] },
  })
  @Get('slots/:slotId')
  slot(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Param('slotId', ParseIntPipe) slotId: number,
  ): Promise<SlotView> {
    return this.snapshots.slot(cycleId, slotId);
  }

  @ApiDoc('Read the changes after a version', {
    response: LineupChangePageDto,
    description:
      'How a client that missed broadcasts catches up, in version order, a page at a time: ' +
      'it reads again from the last version it got until a page holds every change left (`total`).',
    refuses: { 404: ['not_found'] },
  })
  @Get('changes')
  changesSince(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Query() query: ChangesQueryDto,
  ): Promise<Page<LineupChange>> {
    return this.changes.pageSince(cycleId, query.since, query);
  }

  @ApiDoc('Suggest a lineup', {
    response: SuggestedLineupDto,
    description: 'A lineup that launches everyone as early as the catapults allow; nothing is changed.',
    refuses: { 404: ['not_found'], 409: ['cycle_closed'], 422: ['launch_data_invalid'] },
  })
  @Roles('handler')
  @Get('suggestion')
  suggestion(@Param('cycleId', ParseIntPipe) cycleId: number): Promise<SuggestedLineup> {
    return this.suggestions.suggest(cycleId);
  }

  @ApiDoc('Move a slot', {
    response: LineupCommandResultDto,
    description: 'Into a lane at a place, or back to the deck pool.',
    refuses: {
      400: ['invalid_lineup'],
      404: ['not_found'],
      409: ['stale_basis', 'cycle_closed', 'slot_not_movable', 'no_change', 'spare_held', 'pilot_missing'],
    },
  })
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

  @ApiDoc('Apply a suggested lineup', {
    response: LineupCommandResultDto,
    refuses: {
      400: ['invalid_lineup'],
      404: ['not_found'],
      409: ['stale_basis', 'cycle_closed', 'slot_not_movable', 'no_change', 'spare_held', 'pilot_missing'],
    },
  })
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

  @ApiDoc('Mark an aircraft down', {
    response: LineupCommandResultDto,
    description: 'A spare of the cycle may take its place.',
    refuses: {
      404: ['not_found'],
      409: ['stale_basis', 'cycle_closed', 'slot_not_movable', 'spare_unavailable', 'pilot_missing'],
    },
  })
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

  @ApiDoc('Set a catapult up or down', {
    response: LineupCommandResultDto,
    description:
      'Marking it down under an aircraft on it or tensioned is refused with aircraft_on_catapult until asked again with confirm; the aircraft is then suspended.',
    refuses: {
      404: ['not_found'],
      409: ['stale_basis', 'cycle_closed', 'no_change', 'aircraft_on_catapult'],
    },
  })
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

  @ApiDoc('Take the next readiness step', {
    response: LineupCommandResultDto,
    refuses: {
      403: ['not_your_catapult'],
      404: ['not_found'],
      409: [
        'stale_basis',
        'cycle_not_executing',
        'not_current_aircraft',
        'wrong_step',
        'weight_not_agreed',
        'weight_mismatch',
      ],
    },
  })
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

  @ApiDoc('Suspend the aircraft on the catapult', {
    response: LineupCommandResultDto,
    refuses: {
      403: ['not_your_catapult', 'not_your_slot'],
      404: ['not_found'],
      409: ['stale_basis', 'wrong_step'],
    },
  })
  @Roles(...CATAPULT_ROLES, 'pilot', 'air_boss')
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

  @ApiDoc('Give the reason for a suspend', {
    response: LineupCommandResultDto,
    description: 'A quick choice (other with a few words), after the one tap that suspended the aircraft.',
    refuses: {
      403: ['not_your_catapult', 'not_your_slot'],
      404: ['not_found'],
      409: ['stale_basis', 'wrong_step'],
      422: ['reason_required'],
    },
  })
  @Roles(...CATAPULT_ROLES, 'pilot', 'air_boss')
  @Post('slots/:slotId/suspend-reason')
  @HttpCode(HttpStatus.OK)
  giveSuspendReason(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Param('slotId', ParseIntPipe) slotId: number,
    @Body() body: SuspendReasonDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.readiness.giveSuspendReason(cycleId, user, slotId, body);
  }

  @ApiDoc('Undo the last readiness step', {
    response: LineupCommandResultDto,
    description: 'Only by the person who took it, within 10 seconds.',
    refuses: {
      403: ['not_your_catapult', 'not_your_step'],
      404: ['not_found'],
      409: ['stale_basis', 'nothing_to_undo', 'undo_expired'],
    },
  })
  @Roles(...CATAPULT_ROLES)
  @Post('slots/:slotId/undo')
  @HttpCode(HttpStatus.OK)
  undo(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Param('slotId', ParseIntPipe) slotId: number,
    @Body() body: UndoStepDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.readiness.undo(cycleId, user, slotId, body);
  }

  @ApiDoc('Launch the aircraft on the catapult', {
    response: LineupCommandResultDto,
    description: 'A repeat with the same idempotency key answers the original change.',
    refuses: {
      403: ['not_your_catapult'],
      404: ['not_found'],
      // The launch gates refuse with the first one closed.
      409: [
        'stale_basis',
        'not_current_aircraft',
        'wrong_step',
        ...LAUNCH_GATE_CODES,
        'already_launched',
        'idempotency_key_reused',
      ],
    },
  })
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
  @ApiDoc('Waive a launch gate of a slot', {
    response: LineupCommandResultDto,
    description: 'A soft gate only, with a reason; the waiver is kept with the slot and its launch.',
    refuses: {
      404: ['not_found'],
      409: ['stale_basis', 'cycle_closed', 'nothing_to_waive'],
    },
  })
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

  @ApiDoc('Agree or answer the gross weight', {
    response: LineupCommandResultDto,
    description: "The pilot's side of the weight check: the planned figure, or the one the pilot holds.",
    refuses: {
      403: ['not_your_slot'],
      404: ['not_found'],
      409: ['stale_basis', 'cycle_closed', 'wrong_step'],
    },
  })
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
