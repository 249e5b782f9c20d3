import type { LineupSnapshot } from '@catline/contracts';
import type { DataSource, EntitySubscriberInterface } from 'typeorm';
import { Aircraft } from '../database/entities/aircraft.entity.js';
import { Cycle } from '../database/entities/cycle.entity.js';
import { User } from '../database/entities/user.entity.js';
import { Slot } from '../database/entities/slot.entity.js';
import { LineupStateCache } from './lineup-state.cache.js';
import type { LineupState } from './lineup-state.js';

const stateAt = (version: number) =>
  ({
    cycle: Object.assign(new Cycle(), { id: 7, version }),
    ship: {},
    catapults: [{ id: 1, status: 'up' }],
    slots: [Object.assign(new Slot(), { id: 11, version: 2 })],
  }) as unknown as LineupState;
const snapshotAt = (version: number) => ({ version }) as LineupSnapshot;

/** What TypeORM hands a subscriber after a write of `target`, inside a transaction or not. */
const write = (target: unknown) => ({ metadata: { target }, queryRunner: { isTransactionActive: false } }) as never;

function cacheWithSubscribers(enabled = true) {
  const dataSource = { subscribers: [] as EntitySubscriberInterface[] };
  const cache = new LineupStateCache(dataSource as unknown as DataSource, enabled);
  /** TypeORM's side: it tells every subscriber of each write. */
  const wrote = (target: unknown) =>
    dataSource.subscribers.forEach((subscriber) => subscriber.afterUpdate?.(write(target)));
  return { cache, subscribers: dataSource.subscribers, wrote };
}

describe('LineupStateCache', () => {
  it('hands a kept state over once', () => {
    const { cache } = cacheWithSubscribers();
    const kept = stateAt(4);
    cache.keep(kept, snapshotAt(4), cache.generation);

    const taken = cache.take(7);
    expect(taken?.state).toBe(kept);
    expect(taken?.snapshot.version).toBe(4);
    expect(cache.take(7)).toBeUndefined();
  });

  it('drops what was read before a ship, catapult, aircraft, type, squadron or person was written', () => {
    const { cache, wrote } = cacheWithSubscribers();
    const generation = cache.generation;
    wrote(User);
    expect(cache.keep(stateAt(4), snapshotAt(4), generation)).toBeUndefined();

    cache.keep(stateAt(4), snapshotAt(4), cache.generation);
    wrote(Aircraft);
    expect(cache.take(7)).toBeUndefined();
  });

  it('is not spoiled by the lineup writes it mirrors itself', () => {
    const { cache, wrote } = cacheWithSubscribers();
    cache.keep(stateAt(4), snapshotAt(4), cache.generation);
    wrote(Slot);
    wrote(Cycle);
    expect(cache.take(7)).toBeDefined();
  });

  it('forgets a kept state whose commit failed, and only that one', () => {
    const { cache } = cacheWithSubscribers();
    const failed = cache.keep(stateAt(4), snapshotAt(4), cache.generation)!;
    cache.keep(stateAt(5), snapshotAt(5), cache.generation);
    cache.forget(failed);
    expect(cache.take(7)?.snapshot.version).toBe(5);

    const again = cache.keep(stateAt(6), snapshotAt(6), cache.generation)!;
    cache.forget(again);
    expect(cache.take(7)).toBeUndefined();
  });

  it('takes back where a refused command started only if nothing was written to it', () => {
    const { cache } = cacheWithSubscribers();
    const refused = cache.keep(stateAt(4), snapshotAt(4), cache.generation)!;
    expect(cache.take(7)).toBe(refused);
    cache.handBack(refused);
    expect(cache.take(7)).toBe(refused);

    refused.state.slots[0].version += 1;
    cache.handBack(refused);
    expect(cache.take(7)).toBeUndefined();

    const closedCat = cache.keep(stateAt(4), snapshotAt(4), cache.generation)!;
    cache.take(7);
    closedCat.state.catapults[0].status = 'down';
    cache.handBack(closedCat);
    expect(cache.take(7)).toBeUndefined();
  });

  it('keeps nothing and listens to nothing when off (several API processes)', () => {
    const { cache, subscribers } = cacheWithSubscribers(false);
    expect(subscribers).toHaveLength(0);
    expect(cache.keep(stateAt(4), snapshotAt(4), cache.generation)).toBeUndefined();
    expect(cache.take(7)).toBeUndefined();
  });
});
