import type { EntityManager } from 'typeorm';
import { cycleNotFound } from './lineup-state.js';

// The cycle row is the lock every change to a cycle takes first, and its version counts the changes.
// Plain SQL: these run once or twice per command, and need no entity.

/** Takes the cycle's row lock until the transaction ends and answers its version (404 for no such cycle). */
export async function lockCycle(manager: EntityManager, cycleId: number): Promise<number> {
  const rows: { version: number }[] = await manager.query('SELECT version FROM cycles WHERE id = ? FOR UPDATE', [cycleId]);
  if (rows.length === 0) throw cycleNotFound(cycleId);
  return rows[0].version;
}

/** Moves the locked cycle's version from `from` to the next one, and says whether it was at `from`. */
export async function bumpVersion(manager: EntityManager, cycleId: number, from: number): Promise<boolean> {
  const result: { affectedRows: number } = await manager.query('UPDATE cycles SET version = version + 1 WHERE id = ? AND version = ?', [
    cycleId,
    from,
  ]);
  return result.affectedRows === 1;
}
