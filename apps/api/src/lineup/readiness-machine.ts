import type { CycleState, LineupRefusalCode, ReadinessStep, SlotStatus } from '@catline/contracts';

// The readiness steps of the aircraft on a catapult, as a pure state machine: the services only
// gather the facts and write what it allows.

export interface Refusal {
  code: LineupRefusalCode;
  message: string;
}

export type Transition = { ok: true; status: SlotStatus } | { ok: false; refusal: Refusal };

const NEXT_STEP: Partial<Record<SlotStatus, ReadinessStep>> = {
  planned: 'taxiing',
  taxiing: 'on_catapult',
  on_catapult: 'weight_agreed',
  weight_agreed: 'tensioned',
};

/** Statuses a launch can be suspended from. */
export const SUSPENDABLE: readonly SlotStatus[] = ['taxiing', 'on_catapult', 'weight_agreed', 'tensioned'];

const label = (status: string) => status.replaceAll('_', ' ');

function wrongStep(side: string, status: SlotStatus, asked: string): Transition {
  const next = status === 'suspended' ? 'resume' : NEXT_STEP[status];
  return {
    ok: false,
    refusal: {
      code: 'wrong_step',
      message: next
        ? `${side} is ${label(status)}; the next step is ${label(next)}, not ${label(asked)}.`
        : `${side} is ${label(status)}; it takes no more readiness steps.`,
    },
  };
}

/** One step forward, or `resume` from suspended back to on catapult. */
export function advance(side: string, status: SlotStatus, to: ReadinessStep | 'resume'): Transition {
  if (to === 'resume')
    return status === 'suspended' ? { ok: true, status: 'on_catapult' } : wrongStep(side, status, to);
  return NEXT_STEP[status] === to ? { ok: true, status: to } : wrongStep(side, status, to);
}

export function suspend(side: string, status: SlotStatus): Transition {
  return SUSPENDABLE.includes(status) ? { ok: true, status: 'suspended' } : wrongStep(side, status, 'suspended');
}

export interface LaunchFacts {
  side: string;
  status: SlotStatus;
  cycleNumber: number;
  cycleState: CycleState;
  catapultNumber: number;
  catapultUp: boolean;
  /** A waist catapult while the landing area is in use. */
  catapultClosed: boolean;
  pilotWeightAgreed: boolean;
  catapultWeightAgreed: boolean;
  go: boolean;
  noGoReasons: readonly string[];
  overrideReason?: string;
}

/** Why a launch may not happen now, or null when it may. A no-go figure can be overridden; the rest cannot. */
export function launchRefusal(facts: LaunchFacts): Refusal | null {
  if (facts.cycleState !== 'executing') {
    return {
      code: 'cycle_not_executing',
      message: `Cycle ${facts.cycleNumber} is ${facts.cycleState}, not executing; nothing launches.`,
    };
  }
  if (!facts.catapultUp || facts.catapultClosed) {
    return {
      code: 'catapult_unavailable',
      message: facts.catapultUp
        ? `Cat ${facts.catapultNumber} is closed while the landing area is in use.`
        : `Cat ${facts.catapultNumber} is down.`,
    };
  }
  if (facts.status !== 'tensioned') {
    const transition = wrongStep(facts.side, facts.status, 'launched');
    return transition.ok ? null : transition.refusal;
  }
  if (!facts.pilotWeightAgreed || !facts.catapultWeightAgreed) {
    const missing = !facts.pilotWeightAgreed ? "the pilot's" : "the catapult officer's";
    return {
      code: 'weight_not_agreed',
      message: `${facts.side} cannot launch without ${missing} gross weight agreement.`,
    };
  }
  if (!facts.go && !facts.overrideReason) {
    return {
      code: 'no_go',
      message: `${facts.side} is no-go: ${facts.noGoReasons.join(' ')} Launch only with an override reason.`,
    };
  }
  return null;
}
