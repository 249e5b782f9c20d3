import { orderSpares, type SpareCandidate } from '@catline/contracts';
import type { Slot } from '../database/entities/slot.entity.js';

const spareFacts = (slot: Slot) => ({
  typeId: slot.aircraft.typeId,
  mission: slot.mission,
  sideNumber: slot.aircraft.sideNumber,
});

/** The held spares offered for a down aircraft, in the shared order (contracts' orderSpares). */
export function spareCandidates(down: Slot, heldSpares: readonly Slot[]): SpareCandidate[] {
  return orderSpares(spareFacts(down), heldSpares, spareFacts).map(({ spare, match }) => ({
    slotId: spare.id,
    sideNumber: spare.aircraft.sideNumber,
    typeDesignation: spare.aircraft.type.designation,
    mission: spare.mission,
    match,
  }));
}
