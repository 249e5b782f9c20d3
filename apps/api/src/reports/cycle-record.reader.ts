import { Injectable } from '@nestjs/common';
import { LessThanOrEqual } from 'typeorm';
import { CycleChange } from '../database/entities/cycle-change.entity.js';
import { LineupStateLoader, type LineupState } from '../cycle-changes/lineup-state.js';
import { ReplicaReads } from '../database/replica-reads.js';

/** A cycle's state and its change-log rows, in version order, up to the state's version. */
export interface CycleRecordRows {
  state: LineupState;
  rows: CycleChange[];
}

/** Reads what a cycle's report and exports are computed from, on the replica when there is one. */
@Injectable()
export class CycleRecordReader {
  constructor(
    private readonly replica: ReplicaReads,
    private readonly loader: LineupStateLoader,
  ) {}

  /** 404 for a cycle that does not exist (yet, on a replica that lags). */
  read(cycleId: number): Promise<CycleRecordRows> {
    return this.replica.read(async (manager) => {
      const state = await this.loader.read(manager, cycleId);
      // One transaction sees one moment, and the change row is written in the transaction that bumps the
      // cycle's version: every change up to the state's version is there, whatever lands meanwhile.
      const rows = await manager.find(CycleChange, {
        where: { cycleId, version: LessThanOrEqual(state.cycle.version) },
        order: { version: 'ASC' },
      });
      return { state, rows };
    });
  }
}
