import type { DataSource } from 'typeorm';
import { EntityWriteCounter } from './entity-write-counter.js';

/**
 * Values read from some entities' rows, kept in memory until this process writes any of those entities
 * (counted by EntityWriteCounter), then read again. A missing row (null) is not kept. Without a counter (several API processes, whose writes
 * this one cannot see) every get reads.
 */
export class RowsCache<K, V> {
  private readonly known = new Map<K, V>();
  private readonly writes?: EntityWriteCounter;
  private knownAt = 0;

  constructor(
    dataSource: DataSource,
    entities: ReadonlySet<unknown>,
    private readonly read: (key: K) => Promise<V>,
    options: { enabled: boolean },
  ) {
    if (options.enabled) this.writes = new EntityWriteCounter(dataSource, entities);
  }

  async get(key: K): Promise<V> {
    if (!this.writes) return this.read(key);
    const writes = this.writes.count;
    if (writes !== this.knownAt) {
      this.known.clear();
      this.knownAt = writes;
    }
    if (this.known.has(key)) return this.known.get(key) as V;
    const value = await this.read(key);
    if (value !== null && this.writes.count === writes) this.known.set(key, value);
    return value;
  }
}
