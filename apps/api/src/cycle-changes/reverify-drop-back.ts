import type { ChangeActor, SlotStatus } from '@catline/contracts';
import { reverifyDropBack, type ReverifyCause } from '@catline/launch-math';
import type { EntityManager } from 'typeorm';
import type { LineupState } from './lineup-state.js';
import { catapultReadinessSteps } from './readiness-steps.js';
import { updateSlot, type SlotValues } from './slot-writes.js';

const label = (status: string) => status.replaceAll('_', ' ');

/**
 * Inside a change that alters what agreed figures rest on (a wind reading, the ship's speed, fuel or
 * stores, launch data), takes every aircraft of the cycle already past the weight agreement back, as
 * launch-math's `reverifyDropBack` says, and marks it for re-verify until the crew reads the new
 * setting back. Give `slotIds` when the change touches some aircraft only (a weight change); leave it
 * out for the whole cycle. Returns a clause for the change's summary, or '' when nobody dropped back.
 */
export async function dropBackForReverify(
  manager: EntityManager,
  state: LineupState,
  cause: ReverifyCause,
  by: ChangeActor,
  now: Date,
  slotIds?: readonly number[],
): Promise<string> {
  const dropped: string[] = [];
  for (const slot of state.slots) {
    if (slotIds && !slotIds.includes(slot.id)) continue;
    const back = reverifyDropBack(catapultReadinessSteps(state, slot.catapultId), slot.status, cause);
    if (!back) continue;
    // A waiver was given for the figures as they were; the new ones need their own.
    // Back before the read-back: the setting read then was for the old figures, so the check is done anew.
    const values: SlotValues = {
      status: back.to as SlotStatus,
      reverifyCause: cause,
      waivers: null,
      lastStep: null,
      settingReadBack: null,
    };
    if (back.to !== slot.status) Object.assign(values, { statusAt: now, statusBy: by });
    if (back.weightAgreementVoid)
      Object.assign(values, { catapultWeightAckAt: null, agreedWeightLb: null, weightAgreedBy: null });
    await updateSlot(manager, slot, values);
    dropped.push(`${slot.aircraft.sideNumber} to ${label(back.to)}`);
  }
  return dropped.length === 0 ? '' : `; re-verify: ${dropped.join(', ')}`;
}
