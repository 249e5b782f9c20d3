import type { SquadronView } from '@catline/contracts';
import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Param, ParseIntPipe, Patch, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { Roles } from '../common/decorators/roles.decorator.js';
import { CreateSquadronDto } from './dto/create-squadron.dto.js';
import { UpdateSquadronDto } from './dto/update-squadron.dto.js';
import { SquadronsService } from './squadrons.service.js';

@ApiTags('squadrons')
@ApiBearerAuth()
@Controller('squadrons')
export class SquadronsController {
  constructor(private readonly squadrons: SquadronsService) {}

  @Get()
  list(): Promise<SquadronView[]> {
    return this.squadrons.list();
  }

  @Roles('admin')
  @Post()
  create(@Body() body: CreateSquadronDto): Promise<SquadronView> {
    return this.squadrons.create(body);
  }

  @Roles('admin')
  @Patch(':id')
  update(@Param('id', ParseIntPipe) id: number, @Body() body: UpdateSquadronDto): Promise<SquadronView> {
    return this.squadrons.update(id, body);
  }

  @Roles('admin')
  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  remove(@Param('id', ParseIntPipe) id: number): Promise<void> {
    return this.squadrons.remove(id);
  }
}
