import type { EntityManager } from 'typeorm';
import type { Slot } from '../database/entities/slot.entity.js';
import { updateSlot, type SlotValues } from '../cycle-changes/slot-writes.js';

/**
 * The down aircraft's pilot walks to the spare: in the same change the spare gets the pilot (its own,
 * if it had one, is freed) and the down aircraft none. A new pilot has not seen the weight, so the
 * spare's acknowledgement starts again. Returns the moving pilot's name for the summary, or null.
 */
export async function movePilotToSpare(
  manager: EntityManager,
  down: Slot,
  spare: Slot,
  spareValues: SlotValues = {},
): Promise<string | null> {
  const { pilot, pilotId } = down;
  if (pilotId === null) {
    if (Object.keys(spareValues).length > 0) await updateSlot(manager, spare, spareValues);
    return null;
  }
  await updateSlot(manager, down, { pilotId: null, pilotWeightAckAt: null, pilotWeightAckLb: null });
  await updateSlot(manager, spare, {
    ...spareValues,
    pilotId,
    pilotWeightAckAt: null,
    pilotWeightAckLb: null,
  });
  // updateSlot mirrors columns; the loaded person goes with the id.
  spare.pilot = pilot;
  down.pilot = null;
  return pilot?.name ?? 'the pilot';
}
