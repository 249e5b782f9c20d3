import type { SlotStatus } from '@catline/contracts';
import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import type { ChangeDraft } from '../cycle-changes/cycle-change.service.js';
import { isInPool } from '../cycle-changes/lineup-snapshot.builder.js';
import type { LineupState } from '../cycle-changes/lineup-state.js';
import { updateSlot } from '../cycle-changes/slot-writes.js';
import { MailOutbox } from '../mail/mail-outbox.service.js';
import { composeCycleSummary } from './cycle-summary.js';
import { readCycleSummary } from './cycle-summary.reader.js';
import { Cycle } from '../database/entities/cycle.entity.js';

const FINISHED: readonly SlotStatus[] = ['launched', 'down', 'scratched'];

/** Closing a cycle: whatever has not launched is scratched and leaves the lineup. */
@Injectable()
export class CycleClosing {
  constructor(private readonly outbox: MailOutbox) {}

  async close(manager: EntityManager, state: LineupState): Promise<number> {
    await manager.update(Cycle, { id: state.cycle.id }, { state: 'closed' });
    const unlaunched = state.slots.filter((slot) => !FINISHED.includes(slot.status));
    for (const slot of unlaunched) {
      await updateSlot(manager, slot, { status: 'scratched', catapultId: null, position: null });
    }
    // In the closing transaction: the squadrons' summaries exist exactly when the cycle is closed.
    await this.queueSummaries(manager, state.cycle);
    return unlaunched.length;
  }

  /** One summary per squadron with aircraft in the cycle, to the squadron's address. */
  private async queueSummaries(manager: EntityManager, cycle: Cycle): Promise<void> {
    const summary = await readCycleSummary(manager, cycle);
    if (!summary) return;
    for (const squadron of summary.squadrons) {
      const mail = composeCycleSummary(summary.input, squadron);
      await this.outbox.enqueue(manager, {
        kind: 'cycle_summary',
        to: squadron.email,
        ...mail,
        dedupeKey: `cycle-summary:${cycle.id}:${squadron.id}`,
      });
    }
  }

  /** The follow-up of a launch: the cycle closes when nothing but unused spares is left to launch. */
  async closeWhenAllLaunched(manager: EntityManager, state: LineupState): Promise<ChangeDraft | null> {
    const waiting = state.slots.filter((slot) => !FINISHED.includes(slot.status) && !(slot.spare && isInPool(slot)));
    if (state.cycle.state !== 'executing' || waiting.length > 0) return null;
    const scratched = await this.close(manager, state);
    const spares = scratched === 0 ? '' : `; ${scratched} unused spare${scratched === 1 ? '' : 's'} scratched`;
    return {
      summary: `Cycle ${state.cycle.number} closed: last aircraft off${spares}`,
      command: { type: 'close', reason: 'last_launch' },
    };
  }
}
