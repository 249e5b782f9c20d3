import { Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { getDataSourceToken } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import { type Environment, runsClustered } from '../config/environment.js';
import { MailModule } from '../mail/mail.module.js';
import { BasisChecks } from './basis-checks.service.js';
import { LineupChangeFeed } from './change-feed.service.js';
import { Clock, SystemClock } from './clock.js';
import { CycleChangeService } from './cycle-change.service.js';
import { CycleClosing } from './cycle-closing.service.js';
import { LineupChangesService } from './lineup-changes.service.js';
import { LineupCommandsService } from './lineup-commands.service.js';
import { LineupSnapshotService } from './lineup-snapshot.service.js';
import { LineupStateCache } from './lineup-state.cache.js';
import { LineupStateLoader } from './lineup-state.js';
import { LineupController } from './lineup.controller.js';
import { ReadinessService } from './readiness.service.js';
import { SuggestionService } from './suggestion.service.js';

@Module({
  imports: [MailModule],
  controllers: [LineupController],
  providers: [
    { provide: Clock, useClass: SystemClock },
    BasisChecks,
    CycleChangeService,
    CycleClosing,
    LineupChangeFeed,
    LineupChangesService,
    LineupCommandsService,
    LineupSnapshotService,
    {
      provide: LineupStateCache,
      inject: [getDataSourceToken(), ConfigService],
      useFactory: (dataSource: DataSource, config: ConfigService<Environment, true>) =>
        new LineupStateCache(dataSource, !runsClustered({ REDIS_URL: config.get('REDIS_URL', { infer: true }) })),
    },
    LineupStateLoader,
    ReadinessService,
    SuggestionService,
  ],
  exports: [Clock, BasisChecks, CycleChangeService, CycleClosing, LineupChangeFeed, LineupChangesService, LineupSnapshotService],
})
export class LineupModule {}
