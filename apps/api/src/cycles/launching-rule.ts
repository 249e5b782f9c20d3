import type { EntityManager } from 'typeorm';
import { Not } from 'typeorm';
import { isDuplicateKey } from '../common/errors/database-errors.js';
import { Cycle } from '../database/entities/cycle.entity.js';
import { CyclesException } from './cycles.exception.js';

// One launching cycle per ship. The service refuses a start it can see is a second one; the unique index
// over the cycles' `launching_ship_id` refuses the one it cannot (two starts of two cycles racing, each
// checking before the other wrote).

const refusal = (other: string) =>
  new CyclesException(
    'ship_already_launching',
    `${other} of this ship is launching; stop or close it before starting another.`,
  );

/** Marks the cycle launching, unless another cycle of its ship already is. */
export async function startLaunching(manager: EntityManager, cycle: Cycle): Promise<void> {
  const launching = await manager.findOneBy(Cycle, { shipId: cycle.shipId, state: 'executing', id: Not(cycle.id) });
  if (launching) throw refusal(`Cycle ${launching.number}`);
  try {
    await manager.update(Cycle, { id: cycle.id }, { state: 'executing' });
  } catch (error) {
    if (isDuplicateKey(error)) throw refusal('Another cycle');
    throw error;
  }
}
