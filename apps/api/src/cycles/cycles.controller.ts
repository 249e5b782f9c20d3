import type { CycleView, LineupCommandResult } from '@catline/contracts';
import { Body, Controller, Get, HttpCode, HttpStatus, Param, ParseIntPipe, Patch, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { actorOf } from '../cycle-changes/cycle-change.service.js';
import { CycleCommandsService } from './cycle-commands.service.js';
import { CyclesService } from './cycles.service.js';
import { AddSlotDto } from './dto/add-slot.dto.js';
import { BasisVersionDto } from './dto/basis-version.dto.js';
import { CreateCycleDto } from './dto/create-cycle.dto.js';
import { UpdateCycleConditionsDto } from './dto/update-cycle-conditions.dto.js';

@ApiTags('cycles')
@ApiBearerAuth()
@Controller('cycles')
export class CyclesController {
  constructor(
    private readonly cycles: CyclesService,
    private readonly commands: CycleCommandsService,
  ) {}

  @Get()
  list(): Promise<CycleView[]> {
    return this.cycles.list();
  }

  @Get(':id')
  get(@Param('id', ParseIntPipe) id: number): Promise<CycleView> {
    return this.cycles.get(id);
  }

  @Roles('air_operations')
  @Post()
  create(@Body() body: CreateCycleDto): Promise<CycleView> {
    return this.cycles.create(body);
  }

  @Roles('air_operations')
  @Patch(':id/conditions')
  updateConditions(
    @Param('id', ParseIntPipe) id: number,
    @Body() body: UpdateCycleConditionsDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.commands.updateConditions(id, actorOf(user), body);
  }

  @Roles('air_operations')
  @Post(':id/start')
  @HttpCode(HttpStatus.OK)
  start(
    @Param('id', ParseIntPipe) id: number,
    @Body() body: BasisVersionDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.commands.start(id, actorOf(user), body.basisVersion);
  }

  @Roles('air_operations')
  @Post(':id/close')
  @HttpCode(HttpStatus.OK)
  close(
    @Param('id', ParseIntPipe) id: number,
    @Body() body: BasisVersionDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.commands.close(id, actorOf(user), body.basisVersion);
  }

  @Roles('air_operations')
  @Post(':id/slots')
  @HttpCode(HttpStatus.OK)
  addSlot(
    @Param('id', ParseIntPipe) id: number,
    @Body() body: AddSlotDto,
    @CurrentUser() user: AuthenticatedUser,
  ): Promise<LineupCommandResult> {
    return this.commands.addSlot(id, actorOf(user), body);
  }
}
