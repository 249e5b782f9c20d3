import type { EntityManager } from 'typeorm';
import { cycleNotFound } from './lineup-state.js';

// The cycle row is the lock every change to a cycle takes first, and its version counts the changes.
// Plain SQL: these run once or twice per command while the lock is held, and need no entity.

/**
 * Takes the cycle's row lock until the transaction ends and moves its version on by one, answering the
 * new version: LAST_INSERT_ID(expr) hands the value back in the statement's own reply (the sequence
 * idiom of the MariaDB manual), so lock, bump and read are one round trip. 404 for no such cycle.
 */
export async function claimNextVersion(manager: EntityManager, cycleId: number): Promise<number> {
  const result: { affectedRows: number; insertId: number } = await manager.query(
    'UPDATE cycles SET version = LAST_INSERT_ID(version + 1) WHERE id = ?',
    [cycleId],
  );
  if (result.affectedRows === 0) throw cycleNotFound(cycleId);
  return result.insertId;
}

/** Moves the locked cycle's version from `from` to the next one, and says whether it was at `from`. */
export async function bumpVersion(manager: EntityManager, cycleId: number, from: number): Promise<boolean> {
  const result: { affectedRows: number } = await manager.query(
    'UPDATE cycles SET version = version + 1 WHERE id = ? AND version = ?',
    [cycleId, from],
  );
  return result.affectedRows === 1;
}
