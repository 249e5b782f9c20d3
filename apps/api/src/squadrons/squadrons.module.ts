import { Module } from '@nestjs/common';
import { SquadronsController } from './squadrons.controller.js';
import { SquadronsService } from './squadrons.service.js';

@Module({ controllers: [SquadronsController], providers: [SquadronsService] })
export class SquadronsModule {}
