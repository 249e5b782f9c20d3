import type { CatapultDeckHold } from '@catline/contracts';
import type { Cycle } from '../database/entities/cycle.entity.js';

/** The air boss's hold on a catapult of the cycle (deck not clear), or undefined when it is clear to launch. */
export const deckHoldOf = (cycle: Cycle, catapultId: number | null): CatapultDeckHold | undefined =>
  catapultId === null ? undefined : (cycle.deckHolds ?? []).find((hold) => hold.catapultId === catapultId);
