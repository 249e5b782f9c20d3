import { READINESS_STEP_CATALOGUE, type ReadinessStepKey } from './readiness-steps.js';
import type { ReverifyCause } from './reverify.js';

/** Where an aircraft of a lane stands: before the steps, at one of them, or out of them. */
export type ReadinessStatus = 'planned' | ReadinessStepKey | 'launched' | 'suspended' | 'down';

/** How long the person who took a step may take it back, ms (Catline's rule: a mis-tap, not a rethink). */
export const UNDO_WINDOW_MS = 10_000;

/** Who sends a command, as far as the readiness rules care. */
export interface ReadinessActor {
  readonly id: number;
  /** One of Catline's role names. */
  readonly role: string;
  /** A catapult officer or deck edge operator bound to this aircraft's catapult. */
  readonly atThisCatapult: boolean;
  /** The pilot of this aircraft. */
  readonly fliesIt: boolean;
}

/** The last step taken, which its taker may undo for a short while. */
export interface LastStep {
  readonly byId: number;
  /** Epoch ms. */
  readonly at: number;
  readonly from: ReadinessStatus;
  /** The step taken; anything since (a drop-back, a suspend) leaves nothing to undo. */
  readonly to: ReadinessStatus;
  /** What waited for a read-back before the step; undoing a read-back restores it. */
  readonly reverifyBefore: ReverifyCause | null;
}

export interface SlotReadiness {
  readonly status: ReadinessStatus;
  /** 0 for the first aircraft of its lane not yet gone, 1 for the one behind it, and so on. */
  readonly placeInLane: number;
  /** The gross weight the crew recorded as agreed (lb); null until then. */
  readonly agreedWeight: number | null;
  /** The figure the pilot answered from the tablet (lb); null when the pilot agreed by signal or not yet. */
  readonly pilotAnswer: number | null;
  /** What changed under agreed figures since the setting was read back; null when nothing waits. */
  readonly reverify: ReverifyCause | null;
  /**
   * The setting the crew read back from the catapult's console, equal to the approved one for the agreed
   * weight; null until read back, and again once the aircraft is back before the read-back.
   */
  readonly settingReadBack: number | null;
  readonly lastStep: LastStep | null;
}

export type ReadinessCommand =
  | {
      readonly kind: 'advance';
      readonly to: ReadinessStepKey;
      readonly at: number;
      readonly agreedWeight?: number;
      /** With `setting_set`: the setting the crew read on the catapult's console. */
      readonly settingReadBack?: number;
      /** With `setting_set`: the approved setting for the agreed weight; null when the launch data give none. */
      readonly approvedSetting?: number | null;
    }
  | { readonly kind: 'undo'; readonly at: number }
  | { readonly kind: 'suspend' }
  /** The reason for a suspend, chosen after the one tap that suspended. */
  | { readonly kind: 'suspend_reason' }
  | { readonly kind: 'resume' }
  /** `refusals`: the launch gates that refuse now (launchGates' `refusals`). */
  | { readonly kind: 'launch'; readonly refusals: readonly string[] }
  /** The catapult fired and the aircraft did not go. */
  | { readonly kind: 'hangfire' }
  /** The aircraft went, but the crew suspect the shot was short of end speed: a report on a launched aircraft. */
  | { readonly kind: 'cold_shot' }
  /** The aircraft went unserviceable on the catapult: back to the deck pool, or down for good. */
  | { readonly kind: 'down_on_catapult'; readonly outcome: 'pool' | 'down' };

export const READINESS_REFUSALS = [
  'forbidden_role',
  'not_your_catapult',
  'not_your_slot',
  'not_current_aircraft',
  'wrong_step',
  'weight_not_agreed',
  'weight_mismatch',
  'setting_not_read_back',
  'setting_mismatch',
  'approved_setting_missing',
  'nothing_to_undo',
  'not_your_step',
  'undo_expired',
] as const;
export type ReadinessRefusal = (typeof READINESS_REFUSALS)[number];

export type ReadinessTransition =
  | { readonly ok: true; readonly state: SlotReadiness }
  /** `code` is a readiness refusal, or for a launch the first launch gate refusing. */
  | { readonly ok: false; readonly code: ReadinessRefusal | string };

const CATAPULT_ROLES = ['catapult_officer', 'deck_edge_operator'];
/** Who may call a suspend: the catapult's crew, the pilot, the air boss (from primary flight control). */
const SUSPEND_ROLES = [...CATAPULT_ROLES, 'pilot', 'air_boss'];

const refuse = (code: ReadinessRefusal | string): ReadinessTransition => ({ ok: false, code });

const inSteps = (steps: readonly ReadinessStepKey[], status: ReadinessStatus) =>
  steps.includes(status as ReadinessStepKey);

/** Past `step` in the ship's order (a step the ship leaves out counts by the catalogue's order). */
export function isPast(status: ReadinessStatus, step: ReadinessStepKey): boolean {
  const at = READINESS_STEP_CATALOGUE.indexOf(status as ReadinessStepKey);
  return at >= 0 && at > READINESS_STEP_CATALOGUE.indexOf(step);
}

/** The step after `status` in the ship's steps; null after the last one or out of the steps. */
export function nextStep(steps: readonly ReadinessStepKey[], status: ReadinessStatus): ReadinessStepKey | null {
  if (status === 'planned') return steps[0] ?? null;
  if (!inSteps(steps, status)) return null;
  return steps[steps.indexOf(status as ReadinessStepKey) + 1] ?? null;
}

/** A crew command needs the catapult's own crew. */
function crewRefusal(actor: ReadinessActor): ReadinessRefusal | null {
  if (!CATAPULT_ROLES.includes(actor.role)) return 'forbidden_role';
  return actor.atThisCatapult ? null : 'not_your_catapult';
}

function advance(
  steps: readonly ReadinessStepKey[],
  slot: SlotReadiness,
  actor: ReadinessActor,
  command: Extract<ReadinessCommand, { kind: 'advance' }>,
): ReadinessTransition {
  const { to } = command;
  if (nextStep(steps, slot.status) !== to) return refuse('wrong_step');
  // The next aircraft may taxi up and wait behind the deflector; only the first goes further.
  const allowedPlace = to === 'taxiing' ? 1 : 0;
  if (slot.placeInLane > allowedPlace) return refuse('not_current_aircraft');
  let agreedWeight = slot.agreedWeight;
  if (to === 'weight_agreed') {
    if (command.agreedWeight === undefined) return refuse('weight_not_agreed');
    // The pilot's tablet is optional; when the pilot answered on it, the crew records that figure.
    if (slot.pilotAnswer !== null && slot.pilotAnswer !== command.agreedWeight) return refuse('weight_mismatch');
    agreedWeight = command.agreedWeight;
  }
  let settingReadBack = slot.settingReadBack;
  if (to === 'setting_set') {
    // The two-person check: what the console shows must be the setting for the agreed weight.
    if (command.approvedSetting === undefined || command.approvedSetting === null)
      return refuse('approved_setting_missing');
    if (command.settingReadBack === undefined) return refuse('setting_not_read_back');
    if (command.settingReadBack !== command.approvedSetting) return refuse('setting_mismatch');
    settingReadBack = command.settingReadBack;
  }
  return {
    ok: true,
    state: {
      ...slot,
      status: to,
      agreedWeight,
      settingReadBack,
      // Reading the setting back is the re-verify.
      reverify: to === 'setting_set' ? null : slot.reverify,
      lastStep: { byId: actor.id, at: command.at, from: slot.status, to, reverifyBefore: slot.reverify },
    },
  };
}

function undo(slot: SlotReadiness, actor: ReadinessActor, at: number): ReadinessTransition {
  const last = slot.lastStep;
  if (!last || last.to !== slot.status) return refuse('nothing_to_undo');
  if (last.byId !== actor.id) return refuse('not_your_step');
  if (at - last.at > UNDO_WINDOW_MS || at < last.at) return refuse('undo_expired');
  const undoneWeight = slot.status === 'weight_agreed';
  return {
    ok: true,
    state: {
      ...slot,
      status: last.from,
      agreedWeight: undoneWeight ? null : slot.agreedWeight,
      settingReadBack: slot.status === 'setting_set' ? null : slot.settingReadBack,
      reverify: slot.status === 'setting_set' ? last.reverifyBefore : slot.reverify,
      lastStep: null,
    },
  };
}

/**
 * One command on one aircraft by one person, by the ship's readiness steps: the new state, or the code
 * of the refusal. Pure; the API gathers the facts, calls it and writes what it answers.
 */
export function readinessTransition(
  steps: readonly ReadinessStepKey[],
  slot: SlotReadiness,
  actor: ReadinessActor,
  command: ReadinessCommand,
): ReadinessTransition {
  if (command.kind === 'suspend' || command.kind === 'suspend_reason') {
    if (!SUSPEND_ROLES.includes(actor.role)) return refuse('forbidden_role');
    if (actor.role === 'pilot' && !actor.fliesIt) return refuse('not_your_slot');
    if (CATAPULT_ROLES.includes(actor.role) && !actor.atThisCatapult) return refuse('not_your_catapult');
    if (command.kind === 'suspend_reason')
      return slot.status === 'suspended' ? { ok: true, state: slot } : refuse('wrong_step');
    if (!inSteps(steps, slot.status)) return refuse('wrong_step');
    return { ok: true, state: { ...slot, status: 'suspended', lastStep: null } };
  }
  const crew = crewRefusal(actor);
  if (crew) return refuse(crew);
  switch (command.kind) {
    case 'advance':
      return advance(steps, slot, actor, command);
    case 'undo':
      return undo(slot, actor, command.at);
    case 'resume': {
      if (slot.status !== 'suspended') return refuse('wrong_step');
      // The first aircraft is back on the catapult, hooked up again; one suspended while waiting behind
      // it goes back to waiting. Weight and setting are agreed and read back anew either way.
      const back: ReadinessStepKey = slot.placeInLane === 0 || !steps.includes('taxiing') ? 'on_catapult' : 'taxiing';
      return { ok: true, state: { ...slot, status: back, agreedWeight: null, settingReadBack: null } };
    }
    case 'launch': {
      if (command.refusals.length > 0) return refuse(command.refusals[0]);
      if (slot.status !== steps[steps.length - 1] || slot.placeInLane !== 0) return refuse('wrong_step');
      return { ok: true, state: { ...slot, status: 'launched', lastStep: null } };
    }
    case 'hangfire':
      // Only once tension is taken can the catapult be fired.
      return slot.status === 'tensioned' || isPast(slot.status, 'tensioned')
        ? { ok: true, state: { ...slot, status: 'suspended', lastStep: null } }
        : refuse('wrong_step');
    case 'cold_shot':
      return slot.status === 'launched' ? { ok: true, state: slot } : refuse('wrong_step');
    case 'down_on_catapult':
      return slot.status === 'suspended' || (inSteps(steps, slot.status) && slot.status !== 'taxiing')
        ? {
            ok: true,
            state: {
              ...slot,
              status: command.outcome === 'down' ? 'down' : 'planned',
              agreedWeight: null,
              settingReadBack: null,
              reverify: null,
              lastStep: null,
            },
          }
        : refuse('wrong_step');
  }
}
