import type {
  DataSource,
  EntitySubscriberInterface,
  InsertEvent,
  QueryRunner,
  RemoveEvent,
  TransactionCommitEvent,
  TransactionRollbackEvent,
  UpdateEvent,
} from 'typeorm';

/**
 * Counts writes to some entities made through this process's TypeORM (its entity events, which
 * repository, entity manager and query builder writes all raise; plain SQL raises none): once when
 * the statement runs, and again when its transaction commits. A count read before reading such rows
 * and unchanged after means nothing was written to them meanwhile, committed or not. What other
 * processes write is not counted.
 */
export class EntityWriteCounter implements EntitySubscriberInterface {
  private writes = 0;
  /** Transactions that wrote a counted entity and have not ended. */
  private readonly open = new WeakSet<QueryRunner>();

  constructor(
    dataSource: DataSource,
    private readonly entities: ReadonlySet<unknown>,
  ) {
    dataSource.subscribers.push(this);
  }

  get count(): number {
    return this.writes;
  }

  afterInsert(event: InsertEvent<unknown>): void {
    this.note(event.metadata.target, event.queryRunner);
  }

  afterUpdate(event: UpdateEvent<unknown>): void {
    this.note(event.metadata.target, event.queryRunner);
  }

  afterRemove(event: RemoveEvent<unknown>): void {
    this.note(event.metadata.target, event.queryRunner);
  }

  afterTransactionCommit(event: TransactionCommitEvent): void {
    if (!this.open.delete(event.queryRunner)) return;
    this.writes += 1;
  }

  afterTransactionRollback(event: TransactionRollbackEvent): void {
    this.open.delete(event.queryRunner);
  }

  private note(target: unknown, queryRunner: QueryRunner): void {
    if (!this.entities.has(target)) return;
    this.writes += 1;
    if (queryRunner.isTransactionActive) this.open.add(queryRunner);
  }
}
