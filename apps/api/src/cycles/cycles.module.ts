import { Module } from '@nestjs/common';
import { LineupModule } from '../lineup/lineup.module.js';
import { CycleCommandsService } from './cycle-commands.service.js';
import { CyclesController } from './cycles.controller.js';
import { CyclesService } from './cycles.service.js';

@Module({
  imports: [LineupModule],
  controllers: [CyclesController],
  providers: [CyclesService, CycleCommandsService],
  exports: [CyclesService],
})
export class CyclesModule {}
