import { RETURNABLE_STATUSES, type LineupCommandResult, type ReturnToPoolRequest } from '@catline/contracts';
import { Injectable } from '@nestjs/common';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { BasisChecks } from '../cycle-changes/basis-checks.service.js';
import { Clock } from '../cycle-changes/clock.js';
import { CycleChangeService, actorOf } from '../cycle-changes/cycle-change.service.js';
import { laneSlots } from '../cycle-changes/lineup-snapshot.builder.js';
import { LineupException } from '../cycle-changes/lineup.exception.js';
import { placeSlots, updateSlot } from '../cycle-changes/slot-writes.js';

/**
 * A taxiing or on-catapult aircraft goes back to the deck pool instead of being marked down: by the
 * officer of its catapult, or by the handler who says the officer agreed. It keeps its pilot and the
 * pilot's acknowledgement; the catapult's steps start again when it next comes up.
 */
@Injectable()
export class ReturnToPoolService {
  constructor(
    private readonly changes: CycleChangeService,
    private readonly basis: BasisChecks,
    private readonly clock: Clock,
  ) {}

  returnToPool(
    cycleId: number,
    user: AuthenticatedUser,
    slotId: number,
    request: ReturnToPoolRequest,
  ): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actorOf(user), 'slot_returned', async (manager, state) => {
      this.basis.requireOpen(state);
      const slot = this.basis.slot(state, slotId);
      const side = slot.aircraft.sideNumber;
      if (slot.catapultId === null) throw new LineupException('no_change', `${side} is already in the deck pool.`);
      const catapult = this.basis.catapult(state, slot.catapultId);
      if (user.role === 'catapult_officer' && user.catapultId !== catapult.id) {
        throw new LineupException('not_your_catapult', `${side} is not on your catapult.`);
      }
      if (user.role === 'handler' && request.catapultOfficerAgreed !== true) {
        throw new LineupException(
          'agreement_required',
          `${side} is with cat ${catapult.number}; return it only with its catapult officer's agreement.`,
        );
      }
      await this.basis.slotAsSeen(manager, state, slot, request.slotVersion);
      if (!RETURNABLE_STATUSES.includes(slot.status)) {
        throw new LineupException(
          'wrong_step',
          `${side} is ${slot.status.replaceAll('_', ' ')}; only an aircraft taxiing or on the catapult returns to the pool.`,
        );
      }
      const now = this.clock.now();
      const lane = laneSlots(state, catapult.id).filter((other) => other.id !== slot.id);
      await updateSlot(manager, slot, {
        status: 'planned',
        statusAt: now,
        statusBy: user,
        taxiingAt: null,
        onCatapultAt: null,
        tensionedAt: null,
        catapultWeightAckAt: null,
        // Another catapult's setting differs: the read-back is done there anew.
        settingReadBack: null,
        suspendReason: null,
      });
      await placeSlots(manager, { catapultId: catapult.id, slots: lane }, { catapultId: null, slots: [slot] });
      const agreed = user.role === 'handler' ? " with the catapult officer's agreement" : '';
      return {
        summary: `${side} returned from cat ${catapult.number} to the deck pool${agreed}: ${request.reason}`,
        command: { type: 'return_to_pool', slotId, ...request },
        mirrored: true,
      };
    });
  }
}
