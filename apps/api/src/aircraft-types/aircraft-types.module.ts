import { Module } from '@nestjs/common';
import { CycleChangesModule } from '../cycle-changes/cycle-changes.module.js';
import { AircraftTypesController } from './aircraft-types.controller.js';
import { AircraftTypesService } from './aircraft-types.service.js';
import { LaunchDataReverify } from './launch-data-reverify.service.js';

@Module({
  imports: [CycleChangesModule],
  controllers: [AircraftTypesController],
  providers: [AircraftTypesService, LaunchDataReverify],
  exports: [LaunchDataReverify],
})
export class AircraftTypesModule {}
