import { Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { getDataSourceToken } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import { type Environment, runsClustered } from '../config/environment.js';
import { BasisChecks } from './basis-checks.service.js';
import { LineupChangeFeed } from './change-feed.service.js';
import { Clock, SystemClock } from './clock.js';
import { CycleChangeService } from './cycle-change.service.js';
import { LineupChangesService } from './lineup-changes.service.js';
import { LineupSnapshotService } from './lineup-snapshot.service.js';
import { LineupStateCache } from './lineup-state.cache.js';
import { LineupStateLoader } from './lineup-state.js';

/**
 * The change pipeline every feature that changes a cycle goes through: lock the cycle, check the
 * basis, apply, bump the version, log the change, publish in version order. It knows no feature;
 * features (lineup, cycles, imports, reports, gateway) import it, never the other way round.
 */
@Module({
  providers: [
    { provide: Clock, useClass: SystemClock },
    BasisChecks,
    CycleChangeService,
    LineupChangeFeed,
    LineupChangesService,
    LineupSnapshotService,
    {
      provide: LineupStateCache,
      inject: [getDataSourceToken(), ConfigService],
      useFactory: (dataSource: DataSource, config: ConfigService<Environment, true>) =>
        new LineupStateCache(dataSource, !runsClustered({ REDIS_URL: config.get('REDIS_URL', { infer: true }) })),
    },
    LineupStateLoader,
  ],
  exports: [
    Clock,
    BasisChecks,
    CycleChangeService,
    LineupChangeFeed,
    LineupChangesService,
    LineupSnapshotService,
    LineupStateLoader,
  ],
})
export class CycleChangesModule {}
