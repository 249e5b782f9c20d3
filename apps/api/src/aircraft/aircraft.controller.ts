import type { AircraftView } from '@catline/contracts';
import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Param, ParseIntPipe, Patch, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { Roles } from '../common/decorators/roles.decorator.js';
import { AircraftService } from './aircraft.service.js';
import { CreateAircraftDto } from './dto/create-aircraft.dto.js';
import { UpdateAircraftDto } from './dto/update-aircraft.dto.js';

@ApiTags('aircraft')
@ApiBearerAuth()
@Controller('aircraft')
export class AircraftController {
  constructor(private readonly aircraft: AircraftService) {}

  @Get()
  list(): Promise<AircraftView[]> {
    return this.aircraft.list();
  }

  @Roles('admin')
  @Post()
  create(@Body() body: CreateAircraftDto): Promise<AircraftView> {
    return this.aircraft.create(body);
  }

  @Roles('admin')
  @Patch(':id')
  update(@Param('id', ParseIntPipe) id: number, @Body() body: UpdateAircraftDto): Promise<AircraftView> {
    return this.aircraft.update(id, body);
  }

  @Roles('admin')
  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  remove(@Param('id', ParseIntPipe) id: number): Promise<void> {
    return this.aircraft.remove(id);
  }
}
