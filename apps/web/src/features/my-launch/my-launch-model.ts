import { GROSS_WEIGHT_LB, READINESS_STEPS, type LineupSnapshot, type SlotView } from '@catline/contracts';

const gone = new Set(['launched', 'down', 'scratched']);

/** The pilot's slot in this cycle (the one still to fly, else the last one), its lane and place in line. */
export function findMySlot(snapshot: LineupSnapshot, pilotId: number) {
  const mine = snapshot.slots.filter((slot) => slot.pilotId === pilotId);
  const slot = mine.find((candidate) => !gone.has(candidate.status)) ?? mine.at(-1);
  if (!slot) return undefined;
  const lane = snapshot.lanes.find((candidate) => candidate.catapultId === slot.catapultId);
  const slots = new Map(snapshot.slots.map((candidate) => [candidate.id, candidate]));
  const waiting = lane?.slotIds
    .map((id) => slots.get(id))
    .filter((candidate): candidate is SlotView => !!candidate && !gone.has(candidate.status));
  const index = waiting?.findIndex((candidate) => candidate.id === slot.id) ?? -1;
  return { slot, lane, place: index >= 0 ? index + 1 : null };
}

/** The pilot's answer typed on the tablet: whole pounds within the request's limits, or why not. */
export function weightAnswer(typed: string): { weight: number } | { problem: string } {
  const text = typed.replaceAll(',', '').trim();
  if (!/^\d+$/.test(text)) return { problem: 'Type the gross weight in whole pounds.' };
  const weight = Number(text);
  if (weight < GROSS_WEIGHT_LB.min || weight > GROSS_WEIGHT_LB.max)
    return { problem: `Between ${GROSS_WEIGHT_LB.min} and ${GROSS_WEIGHT_LB.max.toLocaleString('en-US')} lb.` };
  return { weight };
}

/** In the catapult's readiness steps (taxiing up to pilot ready): the pilot may suspend with one tap. */
export const onTheCatapult = (slot: SlotView) => (READINESS_STEPS as readonly string[]).includes(slot.status);
