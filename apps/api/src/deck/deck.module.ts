import { Module } from '@nestjs/common';
import { CycleChangesModule } from '../cycle-changes/cycle-changes.module.js';
import { DeckCommandsService } from './deck-commands.service.js';
import { DeckController } from './deck.controller.js';
import { RespotService } from './respot.service.js';

@Module({
  imports: [CycleChangesModule],
  controllers: [DeckController],
  providers: [DeckCommandsService, RespotService],
})
export class DeckModule {}
