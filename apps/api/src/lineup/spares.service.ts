import type {
  CallSpareRequest,
  ChangeActor,
  LineupCommandResult,
  SpareCandidate,
  UpAgainRequest,
} from '@catline/contracts';
import { Injectable } from '@nestjs/common';
import { BasisChecks } from '../cycle-changes/basis-checks.service.js';
import { Clock } from '../cycle-changes/clock.js';
import { CycleChangeService } from '../cycle-changes/cycle-change.service.js';
import { isHeldSpare } from '../cycle-changes/lineup-snapshot.builder.js';
import { LineupSnapshotService } from '../cycle-changes/lineup-snapshot.service.js';
import { LineupException } from '../cycle-changes/lineup.exception.js';
import { updateSlot } from '../cycle-changes/slot-writes.js';
import type { Slot } from '../database/entities/slot.entity.js';
import { spareCandidates } from './spare-candidates.js';
import { movePilotToSpare } from './spare-takeover.js';

/** The handler's spares and down aircraft: which spares fit, calling one, and an aircraft up again. */
@Injectable()
export class SparesService {
  constructor(
    private readonly changes: CycleChangeService,
    private readonly basis: BasisChecks,
    private readonly snapshots: LineupSnapshotService,
    private readonly clock: Clock,
  ) {}

  /** The held spares for a down aircraft, in the order they are offered. */
  async candidates(cycleId: number, slotId: number): Promise<SpareCandidate[]> {
    const state = await this.snapshots.readState(cycleId);
    const down = this.basis.slot(state, slotId);
    this.requireWithoutSpare(down);
    return spareCandidates(
      down,
      state.slots.filter((slot) => isHeldSpare(state, slot)),
    );
  }

  /** A held spare joins the cycle (in the deck pool, counted) for a down aircraft, and the pilot moves to it. */
  callSpare(
    cycleId: number,
    actor: ChangeActor,
    slotId: number,
    request: CallSpareRequest,
  ): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actor, 'spare_called', async (manager, state) => {
      this.basis.requireOpen(state);
      const down = this.basis.slot(state, slotId);
      const spare = this.basis.slot(state, request.spareSlotId);
      await this.basis.slotAsSeen(manager, state, down, request.slotVersion);
      await this.basis.slotAsSeen(manager, state, spare, request.spareVersion);
      this.requireWithoutSpare(down);
      if (!isHeldSpare(state, spare)) {
        throw new LineupException(
          'spare_unavailable',
          `${spare.aircraft.sideNumber} is not a spare held aside; only a held spare can be called.`,
        );
      }
      await updateSlot(manager, down, { replacedBySlotId: spare.id });
      const pilot = await movePilotToSpare(manager, down, spare);
      const spareSide = spare.aircraft.sideNumber;
      return {
        summary: `Spare ${spareSide} called for ${down.aircraft.sideNumber}${pilot ? `; ${pilot} moves to ${spareSide}` : ''}`,
        command: { type: 'call_spare', slotId, ...request },
        mirrored: true,
      };
    });
  }

  /** A down aircraft is serviceable again: back to the deck pool, planned, with the reason in the change. */
  upAgain(cycleId: number, actor: ChangeActor, slotId: number, request: UpAgainRequest): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actor, 'aircraft_up', async (manager, state) => {
      this.basis.requireOpen(state);
      const slot = await this.basis.seenSlot(manager, state, slotId, request.slotVersion);
      const side = slot.aircraft.sideNumber;
      if (slot.status !== 'down') {
        throw new LineupException('wrong_step', `${side} is ${slot.status.replaceAll('_', ' ')}, not down.`);
      }
      const now = this.clock.now();
      await updateSlot(manager, slot, {
        status: 'planned',
        downAt: null,
        downCatapultId: null,
        statusAt: now,
        statusBy: actor,
      });
      return {
        summary: `${side} up again, back in the deck pool: ${request.reason}${slot.pilotId === null ? ' (no pilot)' : ''}`,
        command: { type: 'up_again', slotId, ...request },
        mirrored: true,
      };
    });
  }

  private requireWithoutSpare(down: Slot): void {
    const side = down.aircraft.sideNumber;
    if (down.status !== 'down') {
      throw new LineupException('spare_unavailable', `${side} is not down; a spare is called for a down aircraft.`);
    }
    if (down.replacedBySlotId !== null) {
      throw new LineupException('spare_unavailable', `A spare was already called for ${side}.`);
    }
  }
}
