import { Module } from '@nestjs/common';
import { AircraftTypesModule } from '../aircraft-types/aircraft-types.module.js';
import { CycleChangesModule } from '../cycle-changes/cycle-changes.module.js';
import { AirPlanController } from './air-plan.controller.js';
import { AirPlanImports } from './air-plan-imports.service.js';
import { LaunchTableController } from './launch-table.controller.js';
import { LaunchTableImports } from './launch-table-imports.service.js';
import { UploadsService } from './uploads.service.js';

@Module({
  imports: [AircraftTypesModule, CycleChangesModule],
  controllers: [AirPlanController, LaunchTableController],
  providers: [AirPlanImports, LaunchTableImports, UploadsService],
})
export class ImportsModule {}
