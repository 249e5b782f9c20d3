import type { SlotView } from '@catline/contracts';
import { isDone } from './lineup-model.js';

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
}

/**
 * The entries of a slot card's menu, in the order they are listed. An action belongs here when it
 * applies to one aircraft; add its handler above and its entry below, with the condition under which it
 * makes sense for this slot.
 */
export function slotActions(slot: SlotView, handlers: SlotActionHandlers): SlotAction[] {
  const actions: SlotAction[] = [];
  if (!isDone(slot)) {
    actions.push({ id: 'mark-down', label: 'Mark down…', tone: 'danger', run: () => handlers.markDown(slot) });
  }
  return actions;
}
