import type { LineupCommandResult, WaiveGateRequest } from '@catline/contracts';
import { Injectable } from '@nestjs/common';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { BasisChecks } from '../cycle-changes/basis-checks.service.js';
import { Clock } from '../cycle-changes/clock.js';
import { CycleChangeService, actorOf } from '../cycle-changes/cycle-change.service.js';
import { slotFigures } from '../cycle-changes/lineup-snapshot.builder.js';
import { LineupException } from '../cycle-changes/lineup.exception.js';
import { slotLaunchGates } from '../cycle-changes/slot-launch-gates.js';
import { updateSlot } from '../cycle-changes/slot-writes.js';

/** The air boss's waivers of soft launch gates, one aircraft and one gate at a time. */
@Injectable()
export class WaiversService {
  constructor(
    private readonly changes: CycleChangeService,
    private readonly basis: BasisChecks,
    private readonly clock: Clock,
  ) {}

  waive(
    cycleId: number,
    user: AuthenticatedUser,
    slotId: number,
    request: WaiveGateRequest,
  ): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actorOf(user), 'gate_waived', async (manager, state) => {
      this.basis.requireOpen(state);
      const slot = await this.basis.seenSlot(manager, state, slotId, request.slotVersion);
      const side = slot.aircraft.sideNumber;
      const figures = slot.status === 'launched' ? null : slotFigures(state, slot);
      const closed =
        figures &&
        slotLaunchGates(state, slot, figures, this.clock.now()).verdict.closed.some(
          ({ gate }) => gate === request.gate,
        );
      if (!closed) {
        throw new LineupException(
          'nothing_to_waive',
          `${side} has no ${request.gate.replaceAll('_', ' ')} to waive now.`,
        );
      }
      const others = (slot.waivers ?? []).filter((waiver) => waiver.gate !== request.gate);
      const waiver = {
        gate: request.gate,
        reason: request.reason,
        byId: user.id,
        byName: user.name,
        at: this.clock.now().toISOString(),
      };
      await updateSlot(manager, slot, { waivers: [...others, waiver] });
      return {
        summary: `${side}: ${request.gate.replaceAll('_', ' ')} waived by the air boss: ${request.reason}`,
        command: { type: 'waive', slotId, ...request },
        mirrored: true,
      };
    });
  }
}
