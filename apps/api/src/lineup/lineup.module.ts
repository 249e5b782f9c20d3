import { SlotLoadController } from './slot-load.controller.js';
import { SlotArmStateService } from './slot-arm-state.service.js';
import { SlotLoadService } from './slot-load.service.js';
import { Module } from '@nestjs/common';
import { CycleChangesModule } from '../cycle-changes/cycle-changes.module.js';
import { CyclesModule } from '../cycles/cycles.module.js';
import { CatapultEventsController } from './catapult-events.controller.js';
import { CatapultEventsService } from './catapult-events.service.js';
import { LineupCommandsService } from './lineup-commands.service.js';
import { LineupController } from './lineup.controller.js';
import { PilotAssignmentService } from './pilot-assignment.service.js';
import { ReturnToPoolService } from './return-to-pool.service.js';
import { SparesController } from './spares.controller.js';
import { SparesService } from './spares.service.js';
import { ReadinessService } from './readiness.service.js';
import { SuggestionPool } from './suggestion-pool.js';
import { SuggestionService } from './suggestion.service.js';
import { WaiversService } from './waivers.service.js';

@Module({
  imports: [CycleChangesModule, CyclesModule],
  controllers: [LineupController, SparesController, CatapultEventsController, SlotLoadController],
  providers: [
    LineupCommandsService,
    CatapultEventsService,
    ReadinessService,
    SuggestionPool,
    SuggestionService,
    SparesService,
    PilotAssignmentService,
    ReturnToPoolService,
    WaiversService,
    SlotLoadService,
    SlotArmStateService,
  ],
})
export class LineupModule {}
