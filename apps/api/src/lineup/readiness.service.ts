import type {
  AdvanceSlotRequest,
  LaunchRecord,
  LaunchSlotRequest,
  LineupCommandResult,
  SlotStatus,
  SuspendReasonRequest,
  SuspendSlotRequest,
  UndoStepRequest,
  WeightAckRequest,
} from '@catline/contracts';
import { SUSPEND_REASON_LABELS, shipClock, shipTimeZone } from '@catline/contracts';
import {
  afterburnerRequired,
  pounds,
  takeOffTrim,
  type ReadinessCommand,
  type SlotReadiness,
} from '@catline/launch-math';
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
import { launchWeight, slotFigures } from '../cycle-changes/lineup-snapshot.builder.js';
import { recordShot } from '../cycle-changes/launch-record.js';
import { slotLaunchGates, waiverNote } from '../cycle-changes/slot-launch-gates.js';
import { dropBackForReverify } from '../cycle-changes/reverify-drop-back.js';
import type { LineupState } from '../cycle-changes/lineup-state.js';
import { LineupException } from '../cycle-changes/lineup.exception.js';
import { transition } from './readiness-facts.js';
import { type SlotValues, updateSlot } from '../cycle-changes/slot-writes.js';
import { lb, statusWords } from '../common/wording.js';

const ANSWERED_AFTER: readonly SlotStatus[] = ['launched', 'down', 'scratched'];

/** Who agreed the weight, and the read-back, go with the agreement and the step they belong to. */
function readBackValues(slot: Slot, next: SlotReadiness): SlotValues {
  const values: SlotValues = {};
  if (next.agreedWeight === null && slot.weightAgreedBy !== null) values.weightAgreedBy = null;
  if (next.settingReadBack === null && slot.settingReadBack !== null) values.settingReadBack = null;
  return values;
}

/** The catapult crew's readiness steps, undo, suspend and launch, and the pilot's answer on the weight. */
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
      this.requireExecuting(state);
      const now = this.clock.now();
      const command: ReadinessCommand =
        request.to === 'resume'
          ? { kind: 'resume' }
          : {
              kind: 'advance',
              to: request.to,
              at: now.getTime(),
              agreedWeight: request.agreedWeightLb,
              settingReadBack: request.settingReadBack,
              // The setting the station shows large: the approved launch data's, for the agreed weight.
              approvedSetting:
                request.to === 'setting_set' ? (slotFigures(state, slot)?.catapultSetting ?? null) : null,
            };
      const next = transition(state, slot, user, command, request.to);
      const status = next.status as SlotStatus;
      const values: SlotValues = {
        status,
        statusAt: now,
        statusBy: user,
        agreedWeightLb: next.agreedWeight,
        reverifyCause: next.reverify,
        lastStep: next.lastStep,
        ...readBackValues(slot, next),
      };
      if (status === 'taxiing') values.taxiingAt = now;
      if (status === 'on_catapult') Object.assign(values, { onCatapultAt: now, suspendReason: null });
      if (next.agreedWeight === null) values.catapultWeightAckAt = null;
      if (status === 'tensioned') values.tensionedAt = now;
      if (status === 'weight_agreed') Object.assign(values, { catapultWeightAckAt: now, weightAgreedBy: user.name });
      if (status === 'setting_set') {
        values.settingReadBack = {
          setting: next.settingReadBack!,
          weightLb: next.agreedWeight!,
          setBy: slot.weightAgreedBy ?? user.name,
          readBackBy: user.name,
          at: now.toISOString(),
        };
      }
      await updateSlot(manager, slot, values);
      return {
        summary: this.stepSummary(slot, catapult, request, values),
        command: { type: 'advance', slotId, ...request },
        mirrored: true,
      };
    });
  }

  /** The person who took the last step takes it back, within 10 s: a mis-tap, not a rethink. */
  undo(
    cycleId: number,
    user: AuthenticatedUser,
    slotId: number,
    request: UndoStepRequest,
  ): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actorOf(user), 'slot_advanced', async (manager, state) => {
      const slot = this.basis.slot(state, slotId);
      const catapult = this.ownCatapult(state, user, slot);
      await this.basis.slotAsSeen(manager, state, slot, request.slotVersion);
      const undone = slot.status;
      const now = this.clock.now();
      const next = transition(state, slot, user, { kind: 'undo', at: now.getTime() }, 'undo');
      await updateSlot(manager, slot, {
        status: next.status as SlotStatus,
        statusAt: now,
        statusBy: user,
        agreedWeightLb: next.agreedWeight,
        catapultWeightAckAt: next.agreedWeight === null ? null : slot.catapultWeightAckAt,
        reverifyCause: next.reverify,
        lastStep: null,
        ...readBackValues(slot, next),
      });
      return {
        summary: `${slot.aircraft.sideNumber} on cat ${catapult.number}: ${statusWords(undone)} undone`,
        command: { type: 'undo', slotId, ...request },
        mirrored: true,
      };
    });
  }

  /** One tap: the crew, the pilot of the aircraft or the air boss. The reason may follow. */
  suspend(
    cycleId: number,
    user: AuthenticatedUser,
    slotId: number,
    request: SuspendSlotRequest,
  ): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actorOf(user), 'slot_suspended', async (manager, state) => {
      const slot = await this.basis.seenSlot(manager, state, slotId, request.slotVersion);
      const next = transition(state, slot, user, { kind: 'suspend' }, 'suspended');
      const now = this.clock.now();
      await updateSlot(manager, slot, {
        status: next.status as SlotStatus,
        suspendedAt: now,
        suspendReason: request.reason ?? null,
        statusAt: now,
        statusBy: user,
        lastStep: null,
      });
      const catapult = this.basis.catapult(state, slot.catapultId!);
      return {
        summary: `${slot.aircraft.sideNumber} suspended on cat ${catapult.number}${request.reason ? `: ${request.reason}` : ''}`,
        command: { type: 'suspend', slotId, ...request },
        mirrored: true,
      };
    });
  }

  /** The reason for a suspend, from the quick choices, chosen after the tap by anyone who may suspend. */
  giveSuspendReason(
    cycleId: number,
    user: AuthenticatedUser,
    slotId: number,
    request: SuspendReasonRequest,
  ): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actorOf(user), 'suspend_reason_given', async (manager, state) => {
      const slot = await this.basis.seenSlot(manager, state, slotId, request.slotVersion);
      const side = slot.aircraft.sideNumber;
      transition(
        state,
        slot,
        user,
        { kind: 'suspend_reason' },
        'suspend reason',
        `${side} is ${statusWords(slot.status)}; a reason is given only while it is suspended.`,
      );
      if (request.reason === 'other' && !request.text) {
        throw new LineupException('reason_required', `Say in a few words why ${side} was suspended.`);
      }
      const reason = request.reason === 'other' ? request.text! : SUSPEND_REASON_LABELS[request.reason];
      await updateSlot(manager, slot, { suspendReason: reason });
      return {
        summary: `${side} suspended for: ${reason}`,
        command: { type: 'suspend_reason', slotId, ...request },
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
            `${side} was launched at ${shipClock(slot.launchedAt!, shipTimeZone(state.ship.profile))}; this is a different launch request.`,
          );
        }
        await this.basis.slotAsSeen(manager, state, slot, request.slotVersion);
        const figures = slotFigures(state, slot);
        const now = this.clock.now();
        const gates = figures ? slotLaunchGates(state, slot, figures, now) : null;
        const refusals = gates?.verdict.refusals ?? ['outside_launch_table'];
        if (refusals.length > 0) {
          const words = gates?.views.filter((gate) => refusals.includes(gate.gate)).map((gate) => gate.message);
          throw new LineupException(refusals[0], words?.join(' ') || `${side} has no launch figures.`);
        }
        transition(state, slot, user, { kind: 'launch', refusals }, 'launch');
        const waived = waiverNote(slot, gates?.verdict.waivedGates ?? []);
        const profile = aircraftProfile(slot.aircraft.type);
        const record = figures
          ? recordShot({
              cycle: state.cycle,
              slot,
              catapult,
              figures,
              trimDeg: takeOffTrim(profile, pounds(launchWeight(slot))),
              afterburnerRequired: afterburnerRequired(profile, pounds(launchWeight(slot))),
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
      if (ANSWERED_AFTER.includes(slot.status)) {
        throw new LineupException(
          'wrong_step',
          `${side} is ${slot.status.replaceAll('_', ' ')}; its weight can no longer be answered.`,
        );
      }
      const now = this.clock.now();
      await updateSlot(manager, slot, { pilotWeightAckAt: now, pilotWeightAckLb: request.grossWeightLb });
      // A different figure after the crew recorded one: the agreement and the setting on it no longer hold.
      const reverify =
        slot.agreedWeightLb !== null && slot.agreedWeightLb !== request.grossWeightLb
          ? await dropBackForReverify(manager, state, 'weight', actorOf(user), now, [slot.id])
          : '';
      const answer =
        request.grossWeightLb === slot.grossWeightLb
          ? `agrees ${lb(request.grossWeightLb)}`
          : `answers ${lb(request.grossWeightLb)} (planned ${lb(slot.grossWeightLb)})`;
      return {
        summary: `Pilot of ${side} ${answer}${reverify}`,
        command: { type: 'weight_ack', slotId, ...request },
        mirrored: true,
      };
    });
  }

  /** The change log's line for a step: the weight with the plan beside it, the read-back with both people. */
  private stepSummary(slot: Slot, catapult: Catapult, request: AdvanceSlotRequest, values: SlotValues): string {
    const side = slot.aircraft.sideNumber;
    const on = `on cat ${catapult.number}`;
    if (request.to === 'resume') return `${side} resumed ${on}`;
    if (request.to === 'weight_agreed')
      return `${side} weight agreed ${on}: ${lb(values.agreedWeightLb!)} (planned ${lb(slot.grossWeightLb)})`;
    const readBack = values.settingReadBack;
    if (request.to === 'setting_set' && readBack)
      return `${side} setting ${readBack.setting} read back ${on} by ${readBack.readBackBy}, the approved setting for ${lb(readBack.weightLb)} (weight agreed by ${readBack.setBy})`;
    return `${side} ${statusWords(request.to)} ${on}`;
  }

  private requireExecuting(state: LineupState): void {
    if (state.cycle.state !== 'executing') {
      throw new LineupException(
        'cycle_not_executing',
        `Cycle ${state.cycle.number} is ${state.cycle.state}; readiness steps start once it is executing.`,
      );
    }
  }

  /** The catapult crew act only on their own catapult's lane. */
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
