import type {
  AdvanceSlotRequest,
  LaunchRecord,
  LaunchSlotRequest,
  LineupCommandResult,
  SlotStatus,
  SuspendSlotRequest,
  WeightAckRequest,
} from '@catline/contracts';
import { afterburnerRequired, pounds, takeOffTrim } from '@catline/launch-math';
import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { Aircraft } from '../database/entities/aircraft.entity.js';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { isDuplicateKey } from '../common/errors/database-errors.js';
import { Catapult } from '../database/entities/catapult.entity.js';
import { BasisChecks } from '../cycle-changes/basis-checks.service.js';
import { Clock } from '../cycle-changes/clock.js';
import { CycleChangeService, actorOf } from '../cycle-changes/cycle-change.service.js';
import { CycleClosing } from '../cycles/cycle-closing.service.js';
import type { Slot } from '../database/entities/slot.entity.js';
import { LineupChangesService } from '../cycle-changes/lineup-changes.service.js';
import { aircraftProfile } from '../cycle-changes/launch-math.adapter.js';
import { laneSlots, slotFigures } from '../cycle-changes/lineup-snapshot.builder.js';
import { recordShot } from '../cycle-changes/launch-record.js';
import { slotLaunchGates, waiverNote } from '../cycle-changes/slot-launch-gates.js';
import type { LineupState } from '../cycle-changes/lineup-state.js';
import { LineupException } from '../cycle-changes/lineup.exception.js';
import { advance, launchRefusal, suspend, type Transition } from './readiness-machine.js';
import { type SlotValues, updateSlot } from '../cycle-changes/slot-writes.js';

const ACKNOWLEDGEABLE: readonly SlotStatus[] = ['planned', 'taxiing', 'on_catapult', 'suspended'];

const STEP_SUMMARY: Partial<Record<SlotStatus, string>> = {
  taxiing: 'taxiing to',
  on_catapult: 'on',
  weight_agreed: 'weight agreed on',
  tensioned: 'tensioned on',
};

const lb = (weight: number) => `${weight.toLocaleString('en-US')} lb`;

function allowed(transition: Transition): SlotStatus {
  if (!transition.ok) throw new LineupException(transition.refusal.code, transition.refusal.message);
  return transition.status;
}

/** The catapult officer's readiness steps, suspend and launch, and the pilot's weight acknowledgement. */
@Injectable()
export class ReadinessService {
  constructor(
    private readonly changes: CycleChangeService,
    private readonly basis: BasisChecks,
    private readonly log: LineupChangesService,
    private readonly closing: CycleClosing,
    private readonly clock: Clock,
  ) {}

  advance(
    cycleId: number,
    user: AuthenticatedUser,
    slotId: number,
    request: AdvanceSlotRequest,
  ): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actorOf(user), 'slot_advanced', async (manager, state) => {
      const slot = this.basis.slot(state, slotId);
      const catapult = this.ownCatapult(state, user, slot);
      await this.basis.slotAsSeen(manager, state, slot, request.slotVersion);
      const side = slot.aircraft.sideNumber;
      if (state.cycle.state !== 'executing') {
        throw new LineupException(
          'cycle_not_executing',
          `Cycle ${state.cycle.number} is ${state.cycle.state}; readiness steps start once it is executing.`,
        );
      }
      const current = laneSlots(state, catapult.id).find((other) => other.status !== 'launched');
      if (current && current.id !== slot.id) {
        throw new LineupException(
          'not_current_aircraft',
          `${side} is not next on cat ${catapult.number}; ${current.aircraft.sideNumber} is.`,
        );
      }
      const status = allowed(advance(side, slot.status, request.to));
      const now = this.clock.now();
      const values: SlotValues = { status, statusAt: now, statusBy: user };
      if (status === 'taxiing') values.taxiingAt = now;
      if (status === 'on_catapult')
        Object.assign(values, { onCatapultAt: now, suspendReason: null, catapultWeightAckAt: null });
      // Tension is taken on the setting read back for the figures as they are now: any re-verify is done.
      if (status === 'tensioned') Object.assign(values, { tensionedAt: now, reverifyCause: null });
      if (status === 'weight_agreed') {
        if (!this.pilotAgreed(slot)) {
          throw new LineupException(
            'weight_not_agreed',
            `The pilot of ${side} has not acknowledged the gross weight of ${lb(slot.grossWeightLb)} yet.`,
          );
        }
        values.catapultWeightAckAt = now;
      }
      await updateSlot(manager, slot, values);
      const step = request.to === 'resume' ? 'resumed on' : STEP_SUMMARY[status];
      return {
        summary: `${side} ${step} cat ${catapult.number}`,
        command: { type: 'advance', slotId, ...request },
        mirrored: true,
      };
    });
  }

  suspend(
    cycleId: number,
    user: AuthenticatedUser,
    slotId: number,
    request: SuspendSlotRequest,
  ): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actorOf(user), 'slot_suspended', async (manager, state) => {
      const slot = this.basis.slot(state, slotId);
      const catapult = this.ownCatapult(state, user, slot);
      await this.basis.slotAsSeen(manager, state, slot, request.slotVersion);
      const status = allowed(suspend(slot.aircraft.sideNumber, slot.status));
      const now = this.clock.now();
      await updateSlot(manager, slot, {
        status,
        suspendedAt: now,
        suspendReason: request.reason,
        statusAt: now,
        statusBy: user,
      });
      return {
        summary: `${slot.aircraft.sideNumber} suspended on cat ${catapult.number}: ${request.reason}`,
        command: { type: 'suspend', slotId, ...request },
        mirrored: true,
      };
    });
  }

  launch(
    cycleId: number,
    user: AuthenticatedUser,
    slotId: number,
    request: LaunchSlotRequest,
  ): Promise<LineupCommandResult> {
    return this.changes.apply(
      cycleId,
      actorOf(user),
      'slot_launched',
      async (manager, state) => {
        const slot = this.basis.slot(state, slotId);
        const catapult = this.ownCatapult(state, user, slot);
        const side = slot.aircraft.sideNumber;
        if (slot.status === 'launched') {
          const original =
            slot.launchIdempotencyKey === request.idempotencyKey
              ? await this.log.launchResult(manager, cycleId, slotId)
              : null;
          if (original) return { repeatOf: original };
          throw new LineupException(
            'already_launched',
            `${side} was launched at ${slot.launchedAt?.toISOString()}; this is a different launch request.`,
          );
        }
        await this.basis.slotAsSeen(manager, state, slot, request.slotVersion);
        const figures = slotFigures(state, slot);
        const gates = figures ? slotLaunchGates(state, slot, figures) : null;
        const refusal = launchRefusal({
          side,
          status: slot.status,
          gates: gates?.views ?? [],
          refusals: gates?.verdict.refusals ?? ['outside_launch_table'],
        });
        if (refusal) throw new LineupException(refusal.code, refusal.message);
        const waived = waiverNote(slot, gates?.verdict.waivedGates ?? []);
        const now = this.clock.now();
        const profile = aircraftProfile(slot.aircraft.type);
        const record = figures
          ? recordShot({
              cycle: state.cycle,
              slot,
              catapult,
              figures,
              trimDeg: takeOffTrim(profile, pounds(slot.grossWeightLb)),
              afterburnerRequired: afterburnerRequired(profile, pounds(slot.grossWeightLb)),
              waiver: waived,
              firedBy: actorOf(user),
              at: now,
            })
          : null;
        await this.recordLaunch(manager, slot, user, request.idempotencyKey, waived, record, now);
        await manager.increment(Aircraft, { id: slot.aircraftId }, 'catapultShots', 1);
        await manager.increment(Catapult, { id: catapult.id }, 'shotCount', 1);
        return {
          summary: `${side} launched from cat ${catapult.number}${waived ? ` under waiver: ${waived}` : ''}`,
          command: { type: 'launch', slotId, ...request, ...(waived ? { waived } : {}) },
        };
      },
      { kind: 'cycle_closed', step: (manager, state) => this.closing.closeWhenAllLaunched(manager, state) },
    );
  }

  acknowledgeWeight(
    cycleId: number,
    user: AuthenticatedUser,
    slotId: number,
    request: WeightAckRequest,
  ): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actorOf(user), 'weight_acknowledged', async (manager, state) => {
      this.basis.requireOpen(state);
      const slot = this.basis.slot(state, slotId);
      const side = slot.aircraft.sideNumber;
      if (slot.pilotId !== user.id)
        throw new LineupException('not_your_slot', `${side} is not your aircraft in cycle ${state.cycle.number}.`);
      await this.basis.slotAsSeen(manager, state, slot, request.slotVersion);
      if (!ACKNOWLEDGEABLE.includes(slot.status)) {
        throw new LineupException(
          'wrong_step',
          `${side} is ${slot.status.replaceAll('_', ' ')}; its weight can no longer be acknowledged.`,
        );
      }
      if (request.grossWeightLb !== slot.grossWeightLb) {
        throw new LineupException(
          'weight_mismatch',
          `You entered ${lb(request.grossWeightLb)}; the planned gross weight of ${side} is ${lb(slot.grossWeightLb)}. Settle it with the catapult officer.`,
        );
      }
      await updateSlot(manager, slot, { pilotWeightAckAt: this.clock.now(), pilotWeightAckLb: request.grossWeightLb });
      return {
        summary: `Pilot of ${side} acknowledged ${lb(request.grossWeightLb)}`,
        command: { type: 'weight_ack', slotId, ...request },
        mirrored: true,
      };
    });
  }

  private pilotAgreed(slot: Slot): boolean {
    return slot.pilotWeightAckAt !== null && slot.pilotWeightAckLb === slot.grossWeightLb;
  }

  /** A catapult officer acts only on their own catapult's lane. */
  private ownCatapult(state: LineupState, user: AuthenticatedUser, slot: Slot): Catapult {
    const side = slot.aircraft.sideNumber;
    if (user.catapultId === null) throw new LineupException('not_your_catapult', 'You are not assigned to a catapult.');
    if (slot.catapultId !== user.catapultId) {
      const yours = state.catapults.find((catapult) => catapult.id === user.catapultId);
      throw new LineupException(
        'not_your_catapult',
        `${side} is not on your catapult${yours ? ` (cat ${yours.number})` : ''}.`,
      );
    }
    return this.basis.catapult(state, slot.catapultId);
  }

  private async recordLaunch(
    manager: EntityManager,
    slot: Slot,
    user: AuthenticatedUser,
    key: string,
    waived: string | null,
    record: LaunchRecord | null,
    now: Date,
  ) {
    try {
      await updateSlot(manager, slot, {
        status: 'launched',
        launchedAt: now,
        launchRecord: record,
        launchIdempotencyKey: key,
        overrideReason: waived,
        statusAt: now,
        statusBy: user,
      });
    } catch (error) {
      if (!isDuplicateKey(error)) throw error;
      throw new LineupException(
        'idempotency_key_reused',
        'This launch key was already used for another launch; the client must choose a new one per launch.',
      );
    }
  }
}
