import { Module } from '@nestjs/common';
import { CycleChangesModule } from '../cycle-changes/cycle-changes.module.js';
import { LineupModule } from '../lineup/lineup.module.js';
import { CycleCommandsService } from './cycle-commands.service.js';
import { CyclesController } from './cycles.controller.js';
import { CyclesService } from './cycles.service.js';

@Module({
  imports: [CycleChangesModule, LineupModule],
  controllers: [CyclesController],
  providers: [CyclesService, CycleCommandsService],
  exports: [CyclesService],
})
export class CyclesModule {}
