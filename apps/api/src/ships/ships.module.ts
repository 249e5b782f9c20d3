import { Module } from '@nestjs/common';
import { CycleChangesModule } from '../cycle-changes/cycle-changes.module.js';
import { ShipsController } from './ships.controller.js';
import { ShipsService } from './ships.service.js';

@Module({ imports: [CycleChangesModule], controllers: [ShipsController], providers: [ShipsService] })
export class ShipsModule {}
