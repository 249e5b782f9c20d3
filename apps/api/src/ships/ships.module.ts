import { Module } from '@nestjs/common';
import { ShipsController } from './ships.controller.js';
import { ShipsService } from './ships.service.js';

@Module({ controllers: [ShipsController], providers: [ShipsService] })
export class ShipsModule {}
