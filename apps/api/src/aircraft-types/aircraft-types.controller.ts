import type { AircraftTypeView } from '@catline/contracts';
import {
  Body,
  Controller,
  Delete,
  Get,
  HttpCode,
  HttpStatus,
  Param,
  ParseIntPipe,
  Patch,
  Post,
  Put,
} from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { Roles } from '../common/decorators/roles.decorator.js';
import { AircraftTypesService } from './aircraft-types.service.js';
import { CreateAircraftTypeDto } from './dto/create-aircraft-type.dto.js';
import { LaunchTableDto } from './dto/launch-table.dto.js';
import { UpdateAircraftTypeDto } from './dto/update-aircraft-type.dto.js';

@ApiTags('aircraft-types')
@ApiBearerAuth()
@Controller('aircraft-types')
export class AircraftTypesController {
  constructor(private readonly types: AircraftTypesService) {}

  @Get()
  list(): Promise<AircraftTypeView[]> {
    return this.types.list();
  }

  @Get(':id')
  get(@Param('id', ParseIntPipe) id: number): Promise<AircraftTypeView> {
    return this.types.get(id);
  }

  @Roles('admin')
  @Post()
  create(@Body() body: CreateAircraftTypeDto): Promise<AircraftTypeView> {
    return this.types.create(body);
  }

  @Roles('admin')
  @Patch(':id')
  update(@Param('id', ParseIntPipe) id: number, @Body() body: UpdateAircraftTypeDto): Promise<AircraftTypeView> {
    return this.types.update(id, body);
  }

  @Roles('admin')
  @Put(':id/launch-table')
  replaceLaunchTable(@Param('id', ParseIntPipe) id: number, @Body() body: LaunchTableDto): Promise<AircraftTypeView> {
    return this.types.replaceLaunchTable(id, body.rows);
  }

  @Roles('admin')
  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  remove(@Param('id', ParseIntPipe) id: number): Promise<void> {
    return this.types.remove(id);
  }
}
