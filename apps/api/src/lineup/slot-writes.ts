import type { EntityManager, QueryDeepPartialEntity } from 'typeorm';
import { Slot } from './entities/slot.entity.js';

const movedPastVersion = (ids: number[]) =>
  new Error(`Slot ${ids.join(', ')} moved past the version read while its cycle was locked`);

/** Writes a slot and bumps its version, guarded by the version the command read under the cycle lock. */
export async function updateSlot(manager: EntityManager, slot: Slot, values: QueryDeepPartialEntity<Slot>): Promise<void> {
  const result = await manager
    .createQueryBuilder()
    .update(Slot)
    .set({ ...values, version: () => 'version + 1' })
    .where('id = :id AND version = :version', { id: slot.id, version: slot.version })
    .execute();
  if (result.affected !== 1) throw movedPastVersion([slot.id]);
}

/**
 * Puts `slots` in this order on a catapult's lane (or the deck pool for null), writing only the slots
 * whose place changes, in one guarded UPDATE: a move into a full lane shifts every slot behind it, and
 * one statement instead of one per slot keeps the time the cycle stays locked short.
 */
export async function placeSlots(manager: EntityManager, slots: readonly Slot[], catapultId: number | null): Promise<void> {
  const moved = slots
    .map((slot, index) => ({ slot, position: catapultId === null ? null : index }))
    .filter(({ slot, position }) => slot.catapultId !== catapultId || slot.position !== position);
  if (moved.length === 0) return;
  const result: { affectedRows: number } = await manager.query(
    `UPDATE slots SET catapult_id = ?, position = CASE id ${moved.map(() => 'WHEN ? THEN ?').join(' ')} END,
       version = version + 1
     WHERE ${moved.map(() => '(id = ? AND version = ?)').join(' OR ')}`,
    [
      catapultId,
      ...moved.flatMap(({ slot, position }) => [slot.id, position]),
      ...moved.flatMap(({ slot }) => [slot.id, slot.version]),
    ],
  );
  if (result.affectedRows !== moved.length) throw movedPastVersion(moved.map(({ slot }) => slot.id));
}
