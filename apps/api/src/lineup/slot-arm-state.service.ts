import type { LineupCommandResult, SetArmStateRequest } from '@catline/contracts';
import { Injectable } from '@nestjs/common';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { BasisChecks } from '../cycle-changes/basis-checks.service.js';
import { Clock } from '../cycle-changes/clock.js';
import { CycleChangeService, actorOf } from '../cycle-changes/cycle-change.service.js';
import { LineupException } from '../cycle-changes/lineup.exception.js';
import { updateSlot } from '../cycle-changes/slot-writes.js';

/**
 * Armed or safe, recorded per aircraft by the deck crew: the handler anywhere on deck, the catapult
 * officer and the deck edge operator only for an aircraft in their catapult's order.
 */
@Injectable()
export class SlotArmStateService {
  constructor(
    private readonly changes: CycleChangeService,
    private readonly basis: BasisChecks,
    private readonly clock: Clock,
  ) {}

  setArmState(
    cycleId: number,
    user: AuthenticatedUser,
    slotId: number,
    request: SetArmStateRequest,
  ): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actorOf(user), 'arm_state_set', async (manager, state) => {
      this.basis.requireOpen(state);
      const slot = this.basis.slot(state, slotId);
      const side = slot.aircraft.sideNumber;
      if (user.role !== 'handler' && (slot.catapultId === null || slot.catapultId !== user.catapultId)) {
        throw new LineupException('not_your_catapult', `${side} is not in your catapult's order.`);
      }
      await this.basis.slotAsSeen(manager, state, slot, request.slotVersion);
      if (slot.status === 'launched' || slot.status === 'scratched') {
        throw new LineupException('wrong_step', `${side} is ${slot.status}; armed or safe is no longer recorded.`);
      }
      if (slot.armState === request.armState) {
        throw new LineupException('no_change', `${side} is already recorded ${request.armState}.`);
      }
      await updateSlot(manager, slot, {
        armState: request.armState,
        armStateAt: this.clock.now(),
        armStateBy: user.name,
      });
      return {
        summary: `${side} recorded ${request.armState}`,
        command: { type: 'set_arm_state', slotId, ...request },
        mirrored: true,
      };
    });
  }
}
