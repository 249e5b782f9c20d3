import type { CatapultView, ShipView } from '@catline/contracts';
import { Body, Controller, Get, Param, ParseIntPipe, Patch, Put } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { ReplaceDeckLayoutDto } from './dto/deck-layout.dto.js';
import { UpdateCatapultDto } from './dto/update-catapult.dto.js';
import { UpdateShipDto } from './dto/update-ship.dto.js';
import { ShipsService } from './ships.service.js';
import { ApiDoc } from '../common/openapi/api-doc.decorator.js';
import { CatapultViewDto, ShipViewDto } from '../common/openapi/views/fleet.view.js';

@ApiTags('ships')
@Controller('ships')
export class ShipsController {
  constructor(private readonly ships: ShipsService) {}

  @ApiDoc('List the ships', { response: [ShipViewDto] })
  @Get()
  list(@CurrentUser() caller: AuthenticatedUser): Promise<ShipView[]> {
    return this.ships.list(caller);
  }

  @ApiDoc('Read one ship', { response: ShipViewDto, refuses: { 404: ['ship_not_found'] } })
  @Get(':shipId')
  get(@CurrentUser() caller: AuthenticatedUser, @Param('shipId', ParseIntPipe) shipId: number): Promise<ShipView> {
    return this.ships.get(caller, shipId);
  }

  @ApiDoc('Change a ship', {
    response: ShipViewDto,
    description: 'Its pair gap, profile and deck spots.',
    refuses: {
      400: ['invalid_configuration'],
      404: ['ship_not_found'],
      409: ['spot_in_use', 'readiness_step_in_use'],
      422: ['deck_layout_invalid'],
    },
  })
  @Roles('admin')
  @Patch(':shipId')
  update(
    @CurrentUser() caller: AuthenticatedUser,
    @Param('shipId', ParseIntPipe) shipId: number,
    @Body() body: UpdateShipDto,
  ): Promise<ShipView> {
    return this.ships.update(caller, shipId, body);
  }

  @ApiDoc('Replace the deck layout of a ship', {
    response: ShipViewDto,
    description:
      'The whole deck: spots in their areas with the clear-before order and taxi times, elevators, hangar bays ' +
      'and the catapults inside the landing area. Refused whole: 422 lists every rule the layout breaks in ' +
      '`details` ("<where>: <sentence>"); 409 names the aircraft on a position it removes.',
    refuses: { 404: ['ship_not_found'], 409: ['spot_in_use'], 422: ['deck_layout_invalid'] },
  })
  @Roles('admin')
  @Put(':shipId/deck-layout')
  replaceDeckLayout(
    @CurrentUser() caller: AuthenticatedUser,
    @Param('shipId', ParseIntPipe) shipId: number,
    @Body() body: ReplaceDeckLayoutDto,
  ): Promise<ShipView> {
    return this.ships.replaceDeckLayout(caller, shipId, body);
  }

  @ApiDoc('Change a catapult', {
    response: CatapultViewDto,
    refuses: {
      400: ['invalid_configuration'],
      404: ['ship_not_found', 'catapult_not_found'],
      409: ['readiness_step_in_use'],
    },
  })
  @Roles('admin')
  @Patch(':shipId/catapults/:catapultId')
  updateCatapult(
    @CurrentUser() caller: AuthenticatedUser,
    @Param('shipId', ParseIntPipe) shipId: number,
    @Param('catapultId', ParseIntPipe) catapultId: number,
    @Body() body: UpdateCatapultDto,
  ): Promise<CatapultView> {
    return this.ships.updateCatapult(caller, shipId, catapultId, body);
  }
}
