import type { EntityManager, QueryDeepPartialEntity } from 'typeorm';
import { Slot } from './entities/slot.entity.js';

/** Writes a slot and bumps its version, guarded by the version the command read under the cycle lock. */
export async function updateSlot(manager: EntityManager, slot: Slot, values: QueryDeepPartialEntity<Slot>): Promise<void> {
  const result = await manager
    .createQueryBuilder()
    .update(Slot)
    .set({ ...values, version: () => 'version + 1' })
    .where('id = :id AND version = :version', { id: slot.id, version: slot.version })
    .execute();
  if (result.affected !== 1) throw new Error(`Slot ${slot.id} moved past version ${slot.version} while its cycle was locked`);
}

/** Puts `slots` in this order on a catapult's lane (or the deck pool for null), writing only the slots whose place changes. */
export async function placeSlots(manager: EntityManager, slots: readonly Slot[], catapultId: number | null): Promise<void> {
  for (const [index, slot] of slots.entries()) {
    const position = catapultId === null ? null : index;
    if (slot.catapultId !== catapultId || slot.position !== position) {
      await updateSlot(manager, slot, { catapultId, position });
    }
  }
}
