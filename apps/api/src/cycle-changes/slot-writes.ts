import type { EntityManager, QueryDeepPartialEntity } from 'typeorm';
import type { User } from '../database/entities/user.entity.js';
import { Slot } from '../database/entities/slot.entity.js';

const movedPastVersion = (ids: number[]) =>
  new Error(`Slot ${ids.join(', ')} moved past the version read while its cycle was locked`);

type SlotColumns = Omit<
  Slot,
  'id' | 'version' | 'cycle' | 'aircraft' | 'pilot' | 'catapult' | 'statusBy' | 'statusById'
>;

/** Values a command writes to a slot; `statusBy` is the person who changed its status. */
export type SlotValues = Partial<SlotColumns> & { statusBy?: Pick<User, 'id' | 'name'> };

/**
 * Writes a slot and bumps its version, guarded by the version the command read under the cycle lock,
 * then applies the same values to `slot`: the command's state stays equal to the rows, so the change
 * pipeline need not read them again (see ChangeDraft.mirrored).
 */
export async function updateSlot(manager: EntityManager, slot: Slot, values: SlotValues): Promise<void> {
  const { statusBy, ...columns } = values;
  const row: QueryDeepPartialEntity<Slot> = statusBy ? { ...columns, statusById: statusBy.id } : columns;
  const result = await manager
    .createQueryBuilder()
    .update(Slot)
    .set({ ...row, version: () => 'version + 1' })
    .where('id = :id AND version = :version', { id: slot.id, version: slot.version })
    .execute();
  if (result.affected !== 1) throw movedPastVersion([slot.id]);
  Object.assign(slot, columns);
  if (statusBy) Object.assign(slot, { statusById: statusBy.id, statusBy: { id: statusBy.id, name: statusBy.name } });
  slot.version += 1;
}

/** Slots in their order on a catapult's lane, or in the deck pool (catapultId null). */
export interface Placement {
  catapultId: number | null;
  slots: readonly Slot[];
}

/**
 * Puts slots in the given order on their lanes (or in the deck pool), writing only the slots whose
 * place changes, in one guarded UPDATE: a move into a full lane shifts every slot behind it and may
 * close a gap in the lane it left, and one statement instead of one per slot keeps the time the cycle
 * stays locked short. Like updateSlot, it applies the places to the slots it wrote.
 */
export async function placeSlots(manager: EntityManager, ...placements: Placement[]): Promise<void> {
  const moved = placements
    .flatMap(({ catapultId, slots }) =>
      slots.map((slot, index) => ({ slot, catapultId, position: catapultId === null ? null : index })),
    )
    .filter(({ slot, catapultId, position }) => slot.catapultId !== catapultId || slot.position !== position);
  if (moved.length === 0) return;
  const cases = moved.map(() => 'WHEN ? THEN ?').join(' ');
  const result: { affectedRows: number } = await manager.query(
    `UPDATE slots SET catapult_id = CASE id ${cases} END, position = CASE id ${cases} END, version = version + 1
     WHERE ${moved.map(() => '(id = ? AND version = ?)').join(' OR ')}`,
    [
      ...moved.flatMap(({ slot, catapultId }) => [slot.id, catapultId]),
      ...moved.flatMap(({ slot, position }) => [slot.id, position]),
      ...moved.flatMap(({ slot }) => [slot.id, slot.version]),
    ],
  );
  if (result.affectedRows !== moved.length) throw movedPastVersion(moved.map(({ slot }) => slot.id));
  for (const { slot, catapultId, position } of moved)
    Object.assign(slot, { catapultId, position, version: slot.version + 1 });
}
