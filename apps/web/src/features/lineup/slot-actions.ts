import {
  ARM_STATE_ACTION_LABELS,
  ARM_STATES,
  RETURNABLE_STATUSES,
  SOFT_LAUNCH_GATE_CODES,
  type ArmState,
  type LaunchGateView,
  type SlotView,
  type SoftLaunchGateCode,
} from '@catline/contracts';
import { refusalReason } from '../../lib/refusal-texts.js';
import { isDone } from './lineup-model.js';

/** A closed launch gate the air boss may waive. */
export type SoftGateView = LaunchGateView & { gate: SoftLaunchGateCode };

const waivable = (gate: LaunchGateView): gate is SoftGateView =>
  !gate.waived && (SOFT_LAUNCH_GATE_CODES as readonly string[]).includes(gate.gate);

/** One entry of a slot card's menu. */
export interface SlotAction {
  /** Stable within one card: the menu's item value and test handle. */
  id: string;
  label: string;
  /** `danger` for actions that take an aircraft out of the launch. */
  tone?: 'danger';
  run: () => void;
}

/** What the lineup screen can do to a slot; each handler opens its dialog or sends its command. */
export interface SlotActionHandlers {
  markDown: (slot: SlotView) => void;
  assignPilot: (slot: SlotView) => void;
  callSpare: (slot: SlotView) => void;
  upAgain: (slot: SlotView) => void;
  returnToPool: (slot: SlotView) => void;
  setLoad: (slot: SlotView) => void;
  recordArmState: (slot: SlotView, armState: ArmState) => void;
  waive: (slot: SlotView, gate: SoftGateView) => void;
}

/** What the signed-in person may do from a card: the handler arranges; air operations too plans each sortie. */
export interface SlotActionRights {
  arranges: boolean;
  /** Its pilot, fuel and stores. */
  plans: boolean;
  /** The air boss grants waivers of soft launch gates. */
  waives: boolean;
}

/**
 * The entries of a slot card's menu, in the order they are listed. An action belongs here when it
 * applies to one aircraft; add its handler above and its entry below, with the condition under which it
 * makes sense for this slot.
 */
export function slotActions(slot: SlotView, rights: SlotActionRights, handlers: SlotActionHandlers): SlotAction[] {
  const actions: SlotAction[] = [];
  // One entry per soft gate still closed: each waiver is its own decision with its own reason.
  if (rights.waives) {
    for (const gate of (slot.gates ?? []).filter(waivable)) {
      actions.push({
        id: `waive-${gate.gate}`,
        label: `Grant waiver: ${refusalReason(gate.gate)}…`,
        run: () => handlers.waive(slot, gate),
      });
    }
  }
  // Fuel changes until the launch (a hot refuel); the server refuses it on a launched or scratched slot.
  if (rights.plans && slot.status !== 'launched' && slot.status !== 'scratched') {
    actions.push({ id: 'set-load', label: 'Fuel and stores…', run: () => handlers.setLoad(slot) });
  }
  // The server lets a pilot change only while the aircraft is planned or down.
  if (rights.plans && ((slot.status === 'planned' && !slot.heldSpare) || slot.status === 'down')) {
    const label = slot.pilotId === null ? 'Assign pilot…' : 'Change pilot…';
    actions.push({ id: 'assign-pilot', label, run: () => handlers.assignPilot(slot) });
  }
  if (!rights.arranges) return actions;
  if (slot.status === 'down') {
    actions.push({ id: 'call-spare', label: 'Call a spare…', run: () => handlers.callSpare(slot) });
    actions.push({ id: 'up-again', label: 'Up again…', run: () => handlers.upAgain(slot) });
  }
  // The handler records armed or safe anywhere on deck, in the Cat station's words; the state in force is not offered.
  if (slot.status !== 'launched' && slot.status !== 'scratched') {
    for (const armState of ARM_STATES.filter((state) => state !== slot.armState)) {
      actions.push({
        id: `record-${armState}`,
        label: ARM_STATE_ACTION_LABELS[armState],
        run: () => handlers.recordArmState(slot, armState),
      });
    }
  }
  if (RETURNABLE_STATUSES.includes(slot.status)) {
    actions.push({ id: 'return-to-pool', label: 'Return to deck pool…', run: () => handlers.returnToPool(slot) });
  }
  if (!isDone(slot)) {
    actions.push({ id: 'mark-down', label: 'Mark down…', tone: 'danger', run: () => handlers.markDown(slot) });
  }
  return actions;
}
