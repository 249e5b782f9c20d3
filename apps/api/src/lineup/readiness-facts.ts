import type { ReadinessStep, SlotStatus } from '@catline/contracts';
import {
  readinessTransition,
  type ReadinessActor,
  type ReadinessCommand,
  type ReadinessStatus,
  type SlotReadiness,
} from '@catline/launch-math';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { laneSlots } from '../cycle-changes/lineup-snapshot.builder.js';
import type { LineupState } from '../cycle-changes/lineup-state.js';
import { LineupException } from '../cycle-changes/lineup.exception.js';
import { catapultReadinessSteps } from '../cycle-changes/readiness-steps.js';
import type { Slot } from '../database/entities/slot.entity.js';
import { lb, statusWords } from '../common/wording.js';

const GONE: readonly SlotStatus[] = ['launched', 'down', 'scratched'];

/** The slot as launch-math's readiness machine sees it. */
export function slotReadiness(state: LineupState, slot: Slot): SlotReadiness {
  const ahead = slot.catapultId === null ? [] : laneSlots(state, slot.catapultId);
  const waiting = ahead.filter((other) => !GONE.includes(other.status));
  return {
    status: slot.status as ReadinessStatus,
    placeInLane: Math.max(0, waiting.indexOf(slot)),
    agreedWeight: slot.agreedWeightLb,
    pilotAnswer: slot.pilotWeightAckAt === null ? null : slot.pilotWeightAckLb,
    reverify: slot.reverifyCause,
    settingReadBack: slot.settingReadBack?.setting ?? null,
    lastStep: slot.lastStep,
  };
}

export function readinessActor(user: AuthenticatedUser, slot: Slot): ReadinessActor {
  return {
    id: user.id,
    role: user.role,
    atThisCatapult: user.catapultId !== null && user.catapultId === slot.catapultId,
    fliesIt: slot.pilotId === user.id,
  };
}

/** A refusal of the machine in a sentence for the deck crew. */
function refusal(
  state: LineupState,
  slot: Slot,
  code: string,
  command: ReadinessCommand,
  to: string,
  wrongStep?: string,
): LineupException {
  const side = slot.aircraft.sideNumber;
  const steps = catapultReadinessSteps(state, slot.catapultId);
  switch (code) {
    case 'not_your_catapult':
    case 'forbidden_role':
      return new LineupException('not_your_catapult', `${side} is not on your catapult.`);
    case 'not_your_slot':
      return new LineupException('not_your_slot', `${side} is not your aircraft in cycle ${state.cycle.number}.`);
    case 'not_current_aircraft': {
      const first = laneSlots(state, slot.catapultId ?? 0).find((other) => !GONE.includes(other.status));
      return new LineupException(
        'not_current_aircraft',
        `${side} may taxi up and wait behind the deflector; ${first?.aircraft.sideNumber ?? 'another aircraft'} is on the catapult.`,
      );
    }
    case 'weight_not_agreed':
      return new LineupException('weight_not_agreed', `Record the gross weight agreed with the pilot of ${side}.`);
    case 'weight_mismatch':
      return new LineupException(
        'weight_mismatch',
        `The pilot of ${side} answered ${slot.pilotWeightAckLb?.toLocaleString('en-US')} lb; record that figure or settle it with the pilot.`,
      );
    case 'approved_setting_missing':
      return new LineupException(
        'approved_setting_missing',
        `The approved launch data give no setting for ${side} at ${lb(slot.agreedWeightLb ?? 0)}; the setting cannot be read back against nothing.`,
      );
    case 'setting_not_read_back':
      return new LineupException(
        'setting_not_read_back',
        `Enter the setting read on the catapult's console for ${side}.`,
      );
    case 'setting_mismatch': {
      const { settingReadBack, approvedSetting } = command as Extract<ReadinessCommand, { kind: 'advance' }>;
      return new LineupException(
        'setting_mismatch',
        `The console reads ${settingReadBack}, but the approved setting for ${side} at ${lb(slot.agreedWeightLb ?? 0)} is ${approvedSetting}; set ${approvedSetting} and read it back again.`,
      );
    }
    case 'nothing_to_undo':
      return new LineupException('nothing_to_undo', `${side} has no step to undo.`);
    case 'not_your_step':
      return new LineupException('not_your_step', `Only the person who took the last step of ${side} may undo it.`);
    case 'undo_expired':
      return new LineupException('undo_expired', `The last step of ${side} was taken more than 10 seconds ago.`);
    default: {
      if (wrongStep) return new LineupException('wrong_step', wrongStep);
      const status = slot.status as ReadinessStatus;
      const next = status === 'suspended' ? 'resume' : nextOf(steps, status);
      return new LineupException(
        'wrong_step',
        next
          ? `${side} is ${statusWords(status)}; the next step is ${statusWords(next)}, not ${statusWords(to)}.`
          : `${side} is ${statusWords(status)}; it takes no more readiness steps.`,
      );
    }
  }
}

function nextOf(steps: readonly ReadinessStep[], status: ReadinessStatus): string | null {
  if (status === 'planned') return steps[0];
  const at = steps.indexOf(status as ReadinessStep);
  if (at < 0) return null;
  return steps[at + 1] ?? 'launch';
}

/**
 * The machine's answer for this slot, or its refusal as an exception. Launch refusals by gate are the
 * caller's; `wrongStep` words a wrong-step refusal of a command that is not a step.
 */
export function transition(
  state: LineupState,
  slot: Slot,
  user: AuthenticatedUser,
  command: ReadinessCommand,
  asked: string,
  wrongStep?: string,
): SlotReadiness {
  const result = readinessTransition(
    catapultReadinessSteps(state, slot.catapultId),
    slotReadiness(state, slot),
    readinessActor(user, slot),
    command,
  );
  if (!result.ok) throw refusal(state, slot, result.code, command, asked, wrongStep);
  return result.state;
}
