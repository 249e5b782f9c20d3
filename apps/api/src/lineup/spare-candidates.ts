import type { SpareCandidate, SpareMatch } from '@catline/contracts';
import type { Slot } from '../database/entities/slot.entity.js';

const MATCH_ORDER: Record<SpareMatch, number> = { type: 0, mission: 1, other: 2 };

/** "9" before "10". */
const SIDE_NUMBER_ORDER = new Intl.Collator('en', { numeric: true });

const sameMission = (a: string, b: string) => a.trim().toLowerCase() === b.trim().toLowerCase();

/** A spare of the down aircraft's type flies its sortie as it was planned; one of its mission at least does the job. */
export function spareMatch(down: Slot, spare: Slot): SpareMatch {
  if (spare.aircraft.typeId === down.aircraft.typeId) return 'type';
  return sameMission(spare.mission, down.mission) ? 'mission' : 'other';
}

/** The held spares offered for a down aircraft: same type first, then same mission, then the rest; by side number within each. */
export function spareCandidates(down: Slot, heldSpares: readonly Slot[]): SpareCandidate[] {
  return heldSpares
    .map((spare) => ({ spare, match: spareMatch(down, spare) }))
    .sort(
      (a, b) =>
        MATCH_ORDER[a.match] - MATCH_ORDER[b.match] ||
        SIDE_NUMBER_ORDER.compare(a.spare.aircraft.sideNumber, b.spare.aircraft.sideNumber),
    )
    .map(({ spare, match }) => ({
      slotId: spare.id,
      sideNumber: spare.aircraft.sideNumber,
      typeDesignation: spare.aircraft.type.designation,
      mission: spare.mission,
      match,
    }));
}
