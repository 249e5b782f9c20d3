import type { LaunchGateCode, LaunchGateView, LineupRefusalCode, ReadinessStep, SlotStatus } from '@catline/contracts';

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
  /** The slot's launch gates (slotLaunchGates), with a sentence per gate. */
  gates: readonly LaunchGateView[];
  refusals: readonly LaunchGateCode[];
}

/**
 * Why a launch may not happen now, or null when it may: every launch gate open or waived, then the
 * aircraft at the last readiness step. The first gate refusing names the code and the message gives
 * every one. Nothing overrides a hard gate.
 */
export function launchRefusal(facts: LaunchFacts): Refusal | null {
  const [first] = facts.refusals;
  if (first) {
    const messages = facts.gates.filter((gate) => facts.refusals.includes(gate.gate)).map((gate) => gate.message);
    return { code: first, message: messages.join(' ') };
  }
  const transition = facts.status === 'tensioned' ? null : wrongStep(facts.side, facts.status, 'launched');
  return transition && !transition.ok ? transition.refusal : null;
}
