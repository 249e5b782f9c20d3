import { Module } from '@nestjs/common';
import { CycleChangesModule } from '../cycle-changes/cycle-changes.module.js';
import { ReplicaReads } from '../database/replica-reads.js';
import { CycleRecordReader } from './cycle-record.reader.js';
import { CycleReportsController } from './cycle-reports.controller.js';
import { CycleReportsService } from './cycle-reports.service.js';
import { ShotCountsController } from './shot-counts.controller.js';
import { ShotCountsService } from './shot-counts.service.js';

@Module({
  imports: [CycleChangesModule],
  controllers: [CycleReportsController, ShotCountsController],
  providers: [ReplicaReads, CycleRecordReader, CycleReportsService, ShotCountsService],
})
export class ReportsModule {}
