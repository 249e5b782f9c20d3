import type { CycleLanding, CycleView, LineupCommandResult, Page } from '@catline/contracts';
import {
  Body,
  Controller,
  Get,
  HttpCode,
  HttpStatus,
  Param,
  ParseIntPipe,
  Patch,
  Post,
  Put,
  Query,
} from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Request } from 'express';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { ApiDoc } from '../common/openapi/api-doc.decorator.js';
import { Created } from '../common/openapi/created.decorator.js';
import { CycleLandingDto, CyclePageDto, CycleViewDto } from '../common/openapi/views/cycles.view.js';
import { RecordsPageQueryDto } from '../common/paging/page-query.dto.js';
import { LineupCommandResultDto } from '../common/openapi/views/lineup.view.js';
import { actorOf } from '../cycle-changes/cycle-change.service.js';
import { CycleCommandsService } from './cycle-commands.service.js';
import { CyclesService } from './cycles.service.js';
import { LaunchPrerequisitesService } from './launch-prerequisites.service.js';
import { AddSlotDto } from './dto/add-slot.dto.js';
import { BasisVersionDto } from './dto/basis-version.dto.js';
import { CreateCycleDto } from './dto/create-cycle.dto.js';
import { SetLaunchPrerequisiteDto } from './dto/set-launch-prerequisite.dto.js';
import { StartCycleDto } from './dto/start-cycle.dto.js';
import { UpdateCycleConditionsDto } from './dto/update-cycle-conditions.dto.js';

/** The address of the slot an add-slot command created: the slot of the aircraft it names. */
function addedSlotLocation(result: LineupCommandResult, request: Request): string {
  const { aircraftId } = request.body as AddSlotDto;
  const slot = result.change.patch.slots?.find((added) => added.aircraftId === aircraftId);
  if (!slot) throw new Error(`The change of an added slot holds no slot of aircraft ${aircraftId}`);
  return `/api/cycles/${result.change.cycleId}/lineup/slots/${slot.id}`;
}

@ApiTags('cycles')
@Controller('cycles')
export class CyclesController {
  constructor(
    private readonly cycles: CyclesService,
    private readonly commands: CycleCommandsService,
    private readonly prerequisites: LaunchPrerequisitesService,
  ) {}

  @ApiDoc('List the cycles, a page at a time', { response: CyclePageDto })
  @Get()
  list(@CurrentUser() caller: AuthenticatedUser, @Query() query: RecordsPageQueryDto): Promise<Page<CycleView>> {
    return this.cycles.list(caller, query);
  }

  @ApiDoc('The cycle to open when none is named', {
    response: CycleLandingDto,
    description:
      'A pilot: the cycle holding their slot, launching first, then the next planned. A catapult officer or ' +
      'deck edge operator: the launching cycle, else the next planned one lining up on their catapult. Anyone ' +
      'else: the launching cycle of their ship, else the next planned, else the latest.',
  })
  // Before ':cycleId', which would take 'landing' for an id.
  @Get('landing')
  landing(@CurrentUser() caller: AuthenticatedUser): Promise<CycleLanding> {
    return this.cycles.landing(caller);
  }

  @ApiDoc('Read one cycle', { response: CycleViewDto, refuses: { 404: ['not_found'] } })
  @Get(':cycleId')
  get(@Param('cycleId', ParseIntPipe) cycleId: number): Promise<CycleView> {
    return this.cycles.get(cycleId);
  }

  @ApiDoc('Create a cycle', {
    response: CycleViewDto,
    refuses: {
      400: ['invalid_window'],
      404: ['not_found'],
      409: ['cycle_number_taken', 'night_by_position', 'night_needs_case_iii'],
    },
  })
  @Roles('air_operations')
  @Post()
  @Created((cycle: CycleView) => `/api/cycles/${cycle.id}`)
  create(@CurrentUser() caller: AuthenticatedUser, @Body() body: CreateCycleDto): Promise<CycleView> {
    return this.cycles.create(caller, body);
  }

  @ApiDoc('Change the conditions of a cycle', {
    response: LineupCommandResultDto,
    description: 'Every launch figure of the lineup is computed again under the new conditions.',
    refuses: {
      400: ['invalid_window', 'invalid_wind_reading'],
      404: ['not_found'],
      409: ['stale_basis', 'cycle_closed', 'no_change', 'night_by_position', 'night_needs_case_iii'],
    },
  })
  @Roles('air_operations')
  @Patch(':cycleId/conditions')
  updateConditions(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Body() body: UpdateCycleConditionsDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.commands.updateConditions(cycleId, actorOf(user), body);
  }

  @ApiDoc('Start launching a cycle', {
    response: LineupCommandResultDto,
    description:
      'By the air boss, once every launch prerequisite of the ship is ticked. One cycle per ship launches at a ' +
      'time; outside the launch window the start is refused with outside_window until asked again with ' +
      'confirmOutsideWindow.',
    refuses: {
      404: ['not_found'],
      409: ['stale_basis', 'wrong_state', 'prerequisites_not_ticked', 'ship_already_launching', 'outside_window'],
    },
  })
  @Roles('air_boss')
  @Post(':cycleId/start')
  @HttpCode(HttpStatus.OK)
  start(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Body() body: StartCycleDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.commands.start(cycleId, actorOf(user), body);
  }

  @ApiDoc('Tick or untick a launch prerequisite of a cycle', {
    response: LineupCommandResultDto,
    description:
      'By the air boss, before launching starts: the prerequisite `number` (from 1) of the ship profile’s ' +
      'list is ticked (done) or the tick is taken back; who and when are recorded.',
    refuses: { 404: ['not_found'], 409: ['stale_basis', 'cycle_closed', 'wrong_state', 'no_change'] },
  })
  @Roles('air_boss')
  @Put(':cycleId/prerequisites/:number')
  setPrerequisite(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Param('number', ParseIntPipe) number: number,
    @Body() body: SetLaunchPrerequisiteDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.prerequisites.set(cycleId, actorOf(user), number, body);
  }

  @ApiDoc('Stop launching a cycle', {
    response: LineupCommandResultDto,
    description: 'By the air boss: the cycle goes back to planning, and another cycle of the ship may start.',
    refuses: { 404: ['not_found'], 409: ['stale_basis', 'wrong_state'] },
  })
  @Roles('air_boss')
  @Post(':cycleId/stop')
  @HttpCode(HttpStatus.OK)
  stop(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Body() body: BasisVersionDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.commands.stop(cycleId, actorOf(user), body.basisVersion);
  }

  @ApiDoc('Close a cycle', {
    response: LineupCommandResultDto,
    description: 'Aircraft not launched are scratched and the squadrons are mailed their summaries.',
    refuses: { 404: ['not_found'], 409: ['stale_basis', 'wrong_state'] },
  })
  @Roles('air_operations')
  @Post(':cycleId/close')
  @HttpCode(HttpStatus.OK)
  close(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Body() body: BasisVersionDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.commands.close(cycleId, actorOf(user), body.basisVersion);
  }

  @ApiDoc('Add an aircraft to a cycle', {
    response: LineupCommandResultDto,
    description: 'The aircraft joins the deck pool of the cycle; `Location` names its slot.',
    refuses: {
      400: ['invalid_pilot'],
      404: ['not_found'],
      409: [
        'stale_basis',
        'cycle_closed',
        'aircraft_already_in_cycle',
        'aircraft_unserviceable',
        'pilot_already_assigned',
      ],
    },
  })
  @Roles('air_operations')
  @Post(':cycleId/slots')
  @Created(addedSlotLocation)
  addSlot(
    @Param('cycleId', ParseIntPipe) cycleId: number,
    @Body() body: AddSlotDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.commands.addSlot(cycleId, actorOf(user), body);
  }
}
