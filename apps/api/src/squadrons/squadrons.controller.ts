import type { SquadronView } from '@catline/contracts';
import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Param, ParseIntPipe, Patch, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { CreateSquadronDto } from './dto/create-squadron.dto.js';
import { UpdateSquadronDto } from './dto/update-squadron.dto.js';
import { SquadronsService } from './squadrons.service.js';
import { ApiDoc } from '../common/openapi/api-doc.decorator.js';
import { Created } from '../common/openapi/created.decorator.js';
import { SquadronViewDto } from '../common/openapi/views/fleet.view.js';

@ApiTags('squadrons')
@Controller('squadrons')
export class SquadronsController {
  constructor(private readonly squadrons: SquadronsService) {}

  @ApiDoc('List the squadrons', { response: [SquadronViewDto] })
  @Get()
  list(@CurrentUser() caller: AuthenticatedUser): Promise<SquadronView[]> {
    return this.squadrons.list(caller);
  }

  @ApiDoc('Read one squadron', { response: SquadronViewDto, refuses: { 404: ['squadron_not_found'] } })
  @Get(':id')
  get(@CurrentUser() caller: AuthenticatedUser, @Param('id', ParseIntPipe) id: number): Promise<SquadronView> {
    return this.squadrons.get(caller, id);
  }

  @ApiDoc('Add a squadron', {
    response: SquadronViewDto,
    refuses: { 400: ['ship_required'], 404: ['ship_not_found'], 409: ['code_taken'] },
  })
  @Roles('admin')
  @Post()
  @Created((created: SquadronView) => `/api/squadrons/${created.id}`)
  create(@CurrentUser() caller: AuthenticatedUser, @Body() body: CreateSquadronDto): Promise<SquadronView> {
    return this.squadrons.create(caller, body);
  }

  @ApiDoc('Change a squadron', {
    response: SquadronViewDto,
    refuses: { 404: ['squadron_not_found'], 409: ['code_taken'] },
  })
  @Roles('admin')
  @Patch(':id')
  update(
    @CurrentUser() caller: AuthenticatedUser,
    @Param('id', ParseIntPipe) id: number,
    @Body() body: UpdateSquadronDto,
  ): Promise<SquadronView> {
    return this.squadrons.update(caller, id, body);
  }

  @ApiDoc('Remove a squadron', { refuses: { 404: ['squadron_not_found'], 409: ['squadron_in_use'] } })
  @Roles('admin')
  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  remove(@CurrentUser() caller: AuthenticatedUser, @Param('id', ParseIntPipe) id: number): Promise<void> {
    return this.squadrons.remove(caller, id);
  }
}
