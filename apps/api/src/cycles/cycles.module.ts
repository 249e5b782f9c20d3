import { Module } from '@nestjs/common';
import { CycleChangesModule } from '../cycle-changes/cycle-changes.module.js';
import { MailModule } from '../mail/mail.module.js';
import { CycleClosing } from './cycle-closing.service.js';
import { CycleCommandsService } from './cycle-commands.service.js';
import { LaunchPrerequisitesService } from './launch-prerequisites.service.js';
import { CyclesController } from './cycles.controller.js';
import { CyclesService } from './cycles.service.js';

@Module({
  imports: [CycleChangesModule, MailModule],
  controllers: [CyclesController],
  providers: [CyclesService, CycleClosing, CycleCommandsService, LaunchPrerequisitesService],
  exports: [CyclesService, CycleClosing],
})
export class CyclesModule {}
