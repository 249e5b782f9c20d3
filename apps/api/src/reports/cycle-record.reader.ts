import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource, LessThanOrEqual } from 'typeorm';
import { CycleChange } from '../cycle-changes/entities/cycle-change.entity.js';
import { LineupSnapshotService } from '../cycle-changes/lineup-snapshot.service.js';
import type { LineupState } from '../cycle-changes/lineup-state.js';

/** A cycle's state and its change-log rows, in version order, up to the state's version. */
export interface CycleRecordRows {
  state: LineupState;
  rows: CycleChange[];
}

/** Reads what a cycle's report and exports are computed from. */
@Injectable()
export class CycleRecordReader {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly snapshots: LineupSnapshotService,
  ) {}

  /** 404 for a cycle that does not exist. */
  async read(cycleId: number): Promise<CycleRecordRows> {
    const state = await this.snapshots.readState(cycleId);
    // A change row is written in the transaction that bumps the cycle's version, and rows are only ever
    // appended: every change up to the version the state was read at is there, whatever lands meanwhile.
    const rows = await this.dataSource.manager.find(CycleChange, {
      where: { cycleId, version: LessThanOrEqual(state.cycle.version) },
      order: { version: 'ASC' },
    });
    return { state, rows };
  }
}
