import type { AircraftView, Page } from '@catline/contracts';
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
  Query,
} from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { AircraftService } from './aircraft.service.js';
import { CreateAircraftDto } from './dto/create-aircraft.dto.js';
import { UpdateAircraftDto } from './dto/update-aircraft.dto.js';
import { ApiDoc } from '../common/openapi/api-doc.decorator.js';
import { Created } from '../common/openapi/created.decorator.js';
import { AircraftPageDto, AircraftViewDto } from '../common/openapi/views/fleet.view.js';
import { RecordsPageQueryDto } from '../common/paging/page-query.dto.js';

@ApiTags('aircraft')
@Controller('aircraft')
export class AircraftController {
  constructor(private readonly aircraft: AircraftService) {}

  @ApiDoc('List the aircraft, a page at a time', { response: AircraftPageDto })
  @Get()
  list(@CurrentUser() caller: AuthenticatedUser, @Query() query: RecordsPageQueryDto): Promise<Page<AircraftView>> {
    return this.aircraft.list(caller, query);
  }

  @ApiDoc('Read one aircraft', { response: AircraftViewDto, refuses: { 404: ['aircraft_not_found'] } })
  @Get(':id')
  get(@CurrentUser() caller: AuthenticatedUser, @Param('id', ParseIntPipe) id: number): Promise<AircraftView> {
    return this.aircraft.get(caller, id);
  }

  @ApiDoc('Add an aircraft', {
    response: AircraftViewDto,
    refuses: { 400: ['unknown_reference'], 409: ['side_number_taken'] },
  })
  @Roles('admin')
  @Post()
  @Created((created: AircraftView) => `/api/aircraft/${created.id}`)
  create(@CurrentUser() caller: AuthenticatedUser, @Body() body: CreateAircraftDto): Promise<AircraftView> {
    return this.aircraft.create(caller, body);
  }

  @ApiDoc('Change an aircraft', {
    response: AircraftViewDto,
    refuses: { 400: ['unknown_reference'], 404: ['aircraft_not_found'], 409: ['side_number_taken'] },
  })
  @Roles('admin')
  @Patch(':id')
  update(
    @CurrentUser() caller: AuthenticatedUser,
    @Param('id', ParseIntPipe) id: number,
    @Body() body: UpdateAircraftDto,
  ): Promise<AircraftView> {
    return this.aircraft.update(caller, id, body);
  }

  @ApiDoc('Remove an aircraft', { refuses: { 404: ['aircraft_not_found'], 409: ['aircraft_in_use'] } })
  @Roles('admin')
  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  remove(@CurrentUser() caller: AuthenticatedUser, @Param('id', ParseIntPipe) id: number): Promise<void> {
    return this.aircraft.remove(caller, id);
  }
}
