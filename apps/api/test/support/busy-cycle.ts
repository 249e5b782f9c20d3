import type { LineupSnapshot } from '@catline/contracts';
import { TEST_PASSWORD, createUser } from './fleet-fixtures.js';
import { DEMO_PILOTS, HANDLER, pilot, type LineupDriver } from './lineup-fixtures.js';
import { demoEmail, signIn } from './sign-in.js';

const SIDES = [
  ...Array.from({ length: 12 }, (_, i) => `C${21 + i}`),
  ...Array.from({ length: 10 }, (_, i) => `D${33 + i}`),
];
const IN_LANES = 12;

export interface BusyCycle {
  cycleId: number;
  /** The new cycle's snapshot at version 0, before any slot: replaying the whole log on it gives the lineup. */
  first: LineupSnapshot;
  /** How many changes the set-up made (each slot added, then the first twelve placed). */
  setUpVersions: number;
}

/** A cycle in planning with 22 aircraft: twelve spread over the four lanes, ten in the deck pool. */
export async function createBusyCycle(deck: LineupDriver): Promise<BusyCycle> {
  const { id: cycleId } = await deck.createCycle();
  const first = await deck.snapshot(cycleId);
  for (const [index, side] of SIDES.entries()) {
    // Each with a pilot of its own, as an aircraft needs one to join a lane.
    const slot = await deck.addSlot(cycleId, side, { pilotEmail: pilot(DEMO_PILOTS - index) });
    if (index < IN_LANES) await deck.place(cycleId, slot.id, (index % 4) + 1);
  }
  return { cycleId, first, setUpVersions: SIDES.length + IN_LANES };
}

/** Access tokens of `count` handlers: the demo handler and people created for the run. */
export async function handlerTokens(deck: LineupDriver, count: number): Promise<string[]> {
  const admin = await deck.token(demoEmail('admin'));
  const tokens = [await deck.token(HANDLER)];
  while (tokens.length < count)
    tokens.push(await signIn(deck.url, (await createUser(deck.url, admin, 'handler')).email, TEST_PASSWORD));
  return tokens;
}

/** Places the first `count` aircraft of the deck pool at the end of lanes 1–4 in turn, one command each. */
export async function placeFromPool(deck: LineupDriver, cycleId: number, count: number): Promise<void> {
  const pool = (await deck.snapshot(cycleId)).slots.filter((slot) => slot.catapultId === null).slice(0, count);
  for (const [index, slot] of pool.entries()) await deck.place(cycleId, slot.id, (index % 4) + 1);
}
