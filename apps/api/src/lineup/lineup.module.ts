import { Module } from '@nestjs/common';
import { CycleChangesModule } from '../cycle-changes/cycle-changes.module.js';
import { CyclesModule } from '../cycles/cycles.module.js';
import { LineupCommandsService } from './lineup-commands.service.js';
import { LineupController } from './lineup.controller.js';
import { ReadinessService } from './readiness.service.js';
import { SuggestionPool } from './suggestion-pool.js';
import { SuggestionService } from './suggestion.service.js';
import { WaiversService } from './waivers.service.js';

@Module({
  imports: [CycleChangesModule, CyclesModule],
  controllers: [LineupController],
  providers: [LineupCommandsService, ReadinessService, SuggestionPool, SuggestionService, WaiversService],
})
export class LineupModule {}
