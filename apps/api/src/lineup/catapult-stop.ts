import { READINESS_STEPS, type CatapultStatus, type ReadinessStep } from '@catline/contracts';
import { isPast } from '@catline/launch-math';
import type { EntityManager } from 'typeorm';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { laneSlots } from '../cycle-changes/lineup-snapshot.builder.js';
import type { LineupState } from '../cycle-changes/lineup-state.js';
import { updateSlot } from '../cycle-changes/slot-writes.js';
import { Catapult } from '../database/entities/catapult.entity.js';
import type { Slot } from '../database/entities/slot.entity.js';

/** Writes a catapult's status, guarded by the status the command read under the cycle lock. */
export async function writeCatapultStatus(
  manager: EntityManager,
  catapult: Catapult,
  status: CatapultStatus,
): Promise<void> {
  const result = await manager
    .createQueryBuilder()
    .update(Catapult)
    .set({ status })
    .where('id = :id AND status = :seen', { id: catapult.id, seen: catapult.status })
    .execute();
  if (result.affected !== 1) throw new Error(`Cat ${catapult.number} changed status while its cycle was locked`);
  catapult.status = status;
}

/** The aircraft past the deflector on a catapult (hooked up, tensioned, up to pilot ready); null for none. */
export function aircraftOnCatapult(state: LineupState, catapultId: number): Slot | null {
  return (
    laneSlots(state, catapultId).find(
      (slot) =>
        READINESS_STEPS.includes(slot.status as ReadinessStep) && isPast(slot.status as ReadinessStep, 'taxiing'),
    ) ?? null
  );
}

/**
 * A catapult stopping under an aircraft suspends it: the crew must not go on with a shot the catapult
 * cannot give. Returns the clause for the change's summary ('' when nothing was on it).
 */
export async function suspendOnStoppedCatapult(
  manager: EntityManager,
  state: LineupState,
  catapult: Catapult,
  user: Pick<AuthenticatedUser, 'id' | 'name'>,
  now: Date,
  reason: string,
): Promise<string> {
  const slot = aircraftOnCatapult(state, catapult.id);
  if (!slot) return '';
  await updateSlot(manager, slot, {
    status: 'suspended',
    suspendedAt: now,
    suspendReason: reason,
    statusAt: now,
    statusBy: user,
    lastStep: null,
  });
  return `; ${slot.aircraft.sideNumber} suspended on it`;
}
