import type { LaunchGateCode, LaunchGateView, SlotView } from '@catline/contracts';

/**
 * Gates that close on where the launch stands rather than on a limit: the cycle not started, the weight not
 * yet agreed, the setting not yet read back again. The cat station shows them as steps still to take.
 */
const STEP_GATES: readonly LaunchGateCode[] = ['cycle_not_executing', 'weight_not_agreed', 'reverify_required'];

/** What the limits say of a shot: go, refused (a hard gate), or held until the air boss waives a soft gate. */
export type LimitVerdict =
  { kind: 'go' } | { kind: 'nogo'; gate: LaunchGateView } | { kind: 'waiver'; gate: LaunchGateView };

/** The first closed limit gate that refuses the shot, hard ones before soft (the server's order). */
export function limitVerdict(gates: readonly LaunchGateView[]): LimitVerdict {
  const hard = gates.find((gate) => !gate.soft && !STEP_GATES.includes(gate.gate));
  if (hard) return { kind: 'nogo', gate: hard };
  const soft = gates.find((gate) => gate.soft && !gate.waived);
  if (soft) return { kind: 'waiver', gate: soft };
  return { kind: 'go' };
}

export type GoVerdict = LimitVerdict['kind'];

/**
 * A lineup card's go/no-go: by the server's gates while the aircraft waits, so a soft gate alone never reads
 * as a refusal; a launched aircraft (or one without gates) by its figures.
 */
export function slotGoVerdict(slot: Pick<SlotView, 'status' | 'gates' | 'figures'>): GoVerdict {
  if (slot.status === 'launched' || !slot.gates) return slot.figures?.go ? 'go' : 'nogo';
  return limitVerdict(slot.gates).kind;
}
