import type { ChangeActor } from '@catline/contracts';
import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import { Clock } from '../cycle-changes/clock.js';
import { CycleChangeService } from '../cycle-changes/cycle-change.service.js';
import { dropBackForReverify } from '../cycle-changes/reverify-drop-back.js';
import { Slot } from '../database/entities/slot.entity.js';

/**
 * A change of a type's launch data (its figures, launch table or approved setting tables) moves the
 * setting under every aircraft of the type whose weight is agreed on a launching cycle: as after a new
 * wind, each goes back to "weight agreed" and the crew reads the new setting back.
 */
@Injectable()
export class LaunchDataReverify {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly changes: CycleChangeService,
    private readonly clock: Clock,
  ) {}

  /** Called after the change committed; `what` names it for the cycle's log ("Approved setting tables"). */
  async launchDataChanged(type: { id: number; designation: string }, what: string, actor: ChangeActor): Promise<void> {
    const launching = await this.dataSource.manager
      .createQueryBuilder(Slot, 'slot')
      .innerJoin('slot.aircraft', 'aircraft')
      .innerJoin('slot.cycle', 'cycle')
      .select('DISTINCT slot.cycleId', 'cycleId')
      .where('aircraft.typeId = :typeId', { typeId: type.id })
      .andWhere("cycle.state = 'executing'")
      .getRawMany<{ cycleId: number }>();
    for (const { cycleId } of launching) {
      await this.changes.apply(cycleId, actor, 'launch_data_changed', async (manager, state) => {
        const ofType = state.slots.filter((slot) => slot.aircraft.typeId === type.id).map((slot) => slot.id);
        const dropped = await dropBackForReverify(manager, state, 'launch_data', actor, this.clock.now(), ofType);
        return {
          summary: `${what} of ${type.designation} changed${dropped}`,
          command: { type: 'launch_data_changed', aircraftTypeId: type.id },
          mirrored: true,
        };
      });
    }
  }
}
