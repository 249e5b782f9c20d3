import { Module } from '@nestjs/common';
import { AircraftTypesController } from './aircraft-types.controller.js';
import { AircraftTypesService } from './aircraft-types.service.js';

@Module({ controllers: [AircraftTypesController], providers: [AircraftTypesService] })
export class AircraftTypesModule {}
