import type { DataSource, EntitySubscriberInterface, QueryRunner } from 'typeorm';
import { EntityWriteCounter } from './entity-write-counter.js';

class Watched {}
class Other {}

function counter() {
  const dataSource = { subscribers: [] as EntitySubscriberInterface[] };
  return new EntityWriteCounter(dataSource as unknown as DataSource, new Set([Watched]));
}

const runner = (inTransaction: boolean) => ({ isTransactionActive: inTransaction }) as QueryRunner;
const event = (target: unknown, queryRunner: QueryRunner) => ({ metadata: { target }, queryRunner }) as never;

describe('EntityWriteCounter', () => {
  it('counts inserts, updates and removals of the entities it watches, and nothing else', () => {
    const writes = counter();
    const alone = runner(false);
    writes.afterInsert(event(Watched, alone));
    writes.afterUpdate(event(Watched, alone));
    writes.afterRemove(event(Watched, alone));
    writes.afterUpdate(event(Other, alone));
    expect(writes.count).toBe(3);
  });

  it('counts a write in a transaction again at its commit, so a read made before the commit is seen as stale', () => {
    const writes = counter();
    const transaction = runner(true);
    writes.afterUpdate(event(Watched, transaction));
    const readBeforeCommit = writes.count;
    writes.afterTransactionCommit({ queryRunner: transaction } as never);
    expect(writes.count).toBe(readBeforeCommit + 1);
  });

  it('adds nothing at the commit or rollback of a transaction that wrote nothing it watches', () => {
    const writes = counter();
    const other = runner(true);
    writes.afterUpdate(event(Other, other));
    writes.afterTransactionCommit({ queryRunner: other } as never);
    const rolledBack = runner(true);
    writes.afterUpdate(event(Watched, rolledBack));
    writes.afterTransactionRollback({ queryRunner: rolledBack } as never);
    writes.afterTransactionCommit({ queryRunner: rolledBack } as never);
    expect(writes.count).toBe(1);
  });
});
