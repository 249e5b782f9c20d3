import type { CatapultView, ShipView } from '@catline/contracts';
import { Body, Controller, Get, Param, ParseIntPipe, Patch } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { Roles } from '../common/decorators/roles.decorator.js';
import { UpdateCatapultDto } from './dto/update-catapult.dto.js';
import { UpdateShipDto } from './dto/update-ship.dto.js';
import { ShipsService } from './ships.service.js';

@ApiTags('ships')
@ApiBearerAuth()
@Controller('ships')
export class ShipsController {
  constructor(private readonly ships: ShipsService) {}

  @Get()
  list(): Promise<ShipView[]> {
    return this.ships.list();
  }

  @Get(':id')
  get(@Param('id', ParseIntPipe) id: number): Promise<ShipView> {
    return this.ships.get(id);
  }

  @Roles('admin')
  @Patch(':id')
  update(@Param('id', ParseIntPipe) id: number, @Body() body: UpdateShipDto): Promise<ShipView> {
    return this.ships.update(id, body);
  }

  @Roles('admin')
  @Patch(':shipId/catapults/:id')
  updateCatapult(
    @Param('shipId', ParseIntPipe) shipId: number,
    @Param('id', ParseIntPipe) id: number,
    @Body() body: UpdateCatapultDto,
  ): Promise<CatapultView> {
    return this.ships.updateCatapult(shipId, id, body);
  }
}
