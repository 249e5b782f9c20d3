import { isDeepStrictEqual } from 'node:util';
import type { LineupPatch, LineupSnapshot } from '@catline/contracts';

function changedById<T>(before: readonly T[], after: readonly T[], idOf: (item: T) => number): T[] {
  const previous = new Map(before.map((item) => [idOf(item), item]));
  return after.filter((item) => !isDeepStrictEqual(previous.get(idOf(item)), item));
}

/**
 * What a client holding `before` replaces to hold `after`: changed (or new) slots and lanes by id,
 * the pool, the cycle and the last launch when they differ. Pure.
 */
export function diffSnapshots(before: LineupSnapshot, after: LineupSnapshot): LineupPatch {
  const patch: LineupPatch = {};
  if (!isDeepStrictEqual(before.cycle, after.cycle)) patch.cycle = after.cycle;
  const lanes = changedById(before.lanes, after.lanes, (lane) => lane.catapultId);
  if (lanes.length > 0) patch.lanes = lanes;
  if (!isDeepStrictEqual(before.pool, after.pool)) patch.pool = after.pool;
  const slots = changedById(before.slots, after.slots, (slot) => slot.id);
  if (slots.length > 0) patch.slots = slots;
  if (before.lastLaunchAt !== after.lastLaunchAt) patch.lastLaunchAt = after.lastLaunchAt;
  return patch;
}
