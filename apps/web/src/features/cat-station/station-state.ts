import type { LaneView, ReadinessStep, ReverifyCause, SlotView } from '@catline/contracts';
import { limitVerdict } from '../../lib/launch-verdict.js';
import { refusalReason } from '../../lib/refusal-texts.js';
import { STEP_LABELS } from '../../lib/readiness-step-labels.js';
import { stepIndex } from './cat-station-model.js';

export type StationStateKind = 'cat_down' | 'suspended' | 'reverify' | 'nogo' | 'waiver' | 'waiting' | 'go';

/** What the station's banner says: the state in one or two words, and why or what next in a sentence. */
export interface StationState {
  kind: StationStateKind;
  title: string;
  detail: string | null;
}

const REVERIFY_CAUSE_WORDS: Record<ReverifyCause, string> = {
  wind: 'wind',
  ship_speed: 'ship’s speed',
  weight: 'gross weight',
  launch_data: 'launch data',
};

const sentence = (words: string) => `${words.charAt(0).toUpperCase()}${words.slice(1)}.`;

/** Whom or what the next step waits for, in the deck crew's words. */
function waitingFor(step: ReadinessStep): string {
  if (step === 'weight_agreed') return 'The pilot and the catapult officer to agree the gross weight.';
  if (step === 'setting_set') return 'The deck crew to read the setting back from the console.';
  if (step === 'pilot_ready') return 'The pilot to signal ready.';
  return `The deck crew — ${STEP_LABELS[step].toLowerCase()}.`;
}

/**
 * The one state of my catapult, for the banner at the top of the station. The order is the order of
 * what stops a shot first: the catapult itself, the aircraft held, figures to read back again, a limit
 * refused, a waiver missing, a step still to take. GO only once every step is done and no gate refuses.
 */
export function stationState(
  lane: Pick<LaneView, 'status'>,
  slot: SlotView | undefined,
  steps: readonly ReadinessStep[],
): StationState {
  const gates = slot?.gates ?? [];
  if (lane.status === 'down' || gates.some((gate) => gate.gate === 'catapult_down'))
    return { kind: 'cat_down', title: 'CAT DOWN', detail: sentence(refusalReason('catapult_down')) };
  if (!slot) return { kind: 'waiting', title: 'WAITING FOR', detail: 'The handler to put an aircraft in this lane.' };
  if (slot.status === 'suspended')
    return { kind: 'suspended', title: 'SUSPENDED', detail: slot.suspendReason ?? 'No reason given yet.' };
  if (slot.reverifyCause || gates.some((gate) => gate.gate === 'reverify_required')) {
    const cause = slot.reverifyCause ? ` (${REVERIFY_CAUSE_WORDS[slot.reverifyCause]})` : '';
    return { kind: 'reverify', title: 'RE-VERIFY', detail: `Figures changed${cause} — re-verify the setting.` };
  }
  const limits = limitVerdict(gates);
  if (limits.kind === 'nogo')
    return { kind: 'nogo', title: 'NO-GO', detail: sentence(refusalReason(limits.gate.gate)) };
  if (limits.kind === 'waiver')
    return {
      kind: 'waiver',
      title: 'WAIVER NEEDED',
      detail: `${sentence(refusalReason(limits.gate.gate))} Only the air boss may waive it.`,
    };
  const next = steps[stepIndex(slot, steps) + 1];
  if (next) return { kind: 'waiting', title: 'WAITING FOR', detail: waitingFor(next) };
  const refusing = gates.find((gate) => !gate.waived);
  if (refusing) return { kind: 'nogo', title: 'NO-GO', detail: sentence(refusalReason(refusing.gate)) };
  return { kind: 'go', title: 'GO', detail: null };
}
