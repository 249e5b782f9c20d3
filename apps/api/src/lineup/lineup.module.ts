import { Module } from '@nestjs/common';
import { CycleChangesModule } from '../cycle-changes/cycle-changes.module.js';
import { MailModule } from '../mail/mail.module.js';
import { CycleClosing } from './cycle-closing.service.js';
import { LineupCommandsService } from './lineup-commands.service.js';
import { LineupController } from './lineup.controller.js';
import { ReadinessService } from './readiness.service.js';
import { SuggestionService } from './suggestion.service.js';

@Module({
  imports: [CycleChangesModule, MailModule],
  controllers: [LineupController],
  providers: [CycleClosing, LineupCommandsService, ReadinessService, SuggestionService],
  exports: [CycleClosing],
})
export class LineupModule {}
