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
import { ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { AircraftTypesService } from './aircraft-types.service.js';
import { CreateAircraftTypeDto } from './dto/create-aircraft-type.dto.js';
import { LaunchTableDto } from './dto/launch-table.dto.js';
import { SettingTablesDto } from './dto/setting-tables.dto.js';
import { StoresCatalogueDto } from './dto/stores-catalogue.dto.js';
import { UpdateAircraftTypeDto } from './dto/update-aircraft-type.dto.js';
import { ApiDoc } from '../common/openapi/api-doc.decorator.js';
import { Created } from '../common/openapi/created.decorator.js';
import { AircraftTypeViewDto } from '../common/openapi/views/fleet.view.js';

@ApiTags('aircraft-types')
@Controller('aircraft-types')
export class AircraftTypesController {
  constructor(private readonly types: AircraftTypesService) {}

  @ApiDoc('List the aircraft types', { response: [AircraftTypeViewDto] })
  @Get()
  list(@CurrentUser() caller: AuthenticatedUser): Promise<AircraftTypeView[]> {
    return this.types.list(caller);
  }

  @ApiDoc('Read one aircraft type', { response: AircraftTypeViewDto, refuses: { 404: ['aircraft_type_not_found'] } })
  @Get(':id')
  get(@CurrentUser() caller: AuthenticatedUser, @Param('id', ParseIntPipe) id: number): Promise<AircraftTypeView> {
    return this.types.get(caller, id);
  }

  @ApiDoc('Add an aircraft type', {
    response: AircraftTypeViewDto,
    refuses: { 400: ['invalid_launch_data', 'ship_required'], 404: ['ship_not_found'], 409: ['designation_taken'] },
  })
  @Roles('admin')
  @Post()
  @Created((created: AircraftTypeView) => `/api/aircraft-types/${created.id}`)
  create(@CurrentUser() caller: AuthenticatedUser, @Body() body: CreateAircraftTypeDto): Promise<AircraftTypeView> {
    return this.types.create(caller, body);
  }

  @ApiDoc('Change an aircraft type', {
    response: AircraftTypeViewDto,
    refuses: { 400: ['invalid_launch_data'], 404: ['aircraft_type_not_found'], 409: ['designation_taken'] },
  })
  @Roles('admin')
  @Patch(':id')
  update(
    @CurrentUser() caller: AuthenticatedUser,
    @Param('id', ParseIntPipe) id: number,
    @Body() body: UpdateAircraftTypeDto,
  ): Promise<AircraftTypeView> {
    return this.types.update(caller, id, body);
  }

  @ApiDoc('Replace the launch table of an aircraft type', {
    response: AircraftTypeViewDto,
    refuses: { 400: ['invalid_launch_data'], 404: ['aircraft_type_not_found'] },
  })
  @Roles('admin')
  @Put(':id/launch-table')
  replaceLaunchTable(
    @CurrentUser() caller: AuthenticatedUser,
    @Param('id', ParseIntPipe) id: number,
    @Body() body: LaunchTableDto,
  ): Promise<AircraftTypeView> {
    return this.types.replaceLaunchTable(caller, id, body.rows);
  }

  @ApiDoc('Replace the stores catalogue of an aircraft type', {
    response: AircraftTypeViewDto,
    description: 'The whole catalogue: what an aircraft of the type can carry, with the weight of one item.',
    refuses: { 400: ['invalid_launch_data'], 404: ['aircraft_type_not_found'] },
  })
  @Roles('admin')
  @Put(':id/stores-catalogue')
  replaceStoresCatalogue(
    @CurrentUser() caller: AuthenticatedUser,
    @Param('id', ParseIntPipe) id: number,
    @Body() body: StoresCatalogueDto,
  ): Promise<AircraftTypeView> {
    return this.types.replaceStoresCatalogue(caller, id, body.items);
  }

  @ApiDoc('Replace the approved setting tables of an aircraft type', {
    response: AircraftTypeViewDto,
    description:
      "Every table of the type: per catapult and configuration, the approved catapult setting by gross weight and the recommended excess wind over deck. The Cat station shows this setting; Catline's energy model only cross-checks it.",
    refuses: { 400: ['invalid_launch_data'], 404: ['aircraft_type_not_found'] },
  })
  @Roles('admin')
  @Put(':id/setting-tables')
  replaceSettingTables(
    @CurrentUser() caller: AuthenticatedUser,
    @Param('id', ParseIntPipe) id: number,
    @Body() body: SettingTablesDto,
  ): Promise<AircraftTypeView> {
    return this.types.replaceSettingTables(caller, id, body.tables);
  }

  @ApiDoc('Remove an aircraft type', {
    refuses: { 404: ['aircraft_type_not_found'], 409: ['aircraft_type_in_use'] },
  })
  @Roles('admin')
  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  remove(@CurrentUser() caller: AuthenticatedUser, @Param('id', ParseIntPipe) id: number): Promise<void> {
    return this.types.remove(caller, id);
  }
}
