import type { LineupSnapshot, SlotView } from '@catline/contracts';
import { epochMs } from '@catline/launch-math';
import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { Clock } from './clock.js';
import { buildSnapshot } from './lineup-snapshot.builder.js';
import { LineupStateLoader, type LineupState } from './lineup-state.js';
import { asLaunchDataRefusal, LineupException } from './lineup.exception.js';

@Injectable()
export class LineupSnapshotService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly loader: LineupStateLoader,
    private readonly clock: Clock,
  ) {}

  /** The cycle's state from one consistent read (a repeatable-read transaction sees a single moment). */
  readState(cycleId: number): Promise<LineupState> {
    return this.dataSource.transaction('REPEATABLE READ', (manager) => this.loader.read(manager, cycleId));
  }

  async snapshot(cycleId: number): Promise<LineupSnapshot> {
    const state = await this.readState(cycleId);
    try {
      return buildSnapshot(state, epochMs(this.clock.now().getTime()));
    } catch (error) {
      throw asLaunchDataRefusal(error);
    }
  }

  /** One slot as the lineup shows it: its projected figures depend on the whole cycle. */
  async slot(cycleId: number, slotId: number): Promise<SlotView> {
    const slot = (await this.snapshot(cycleId)).slots.find((candidate) => candidate.id === slotId);
    if (!slot) throw new LineupException('not_found', `Cycle ${cycleId} has no slot ${slotId}.`);
    return slot;
  }
}
