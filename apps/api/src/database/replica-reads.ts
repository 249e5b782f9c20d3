import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource, type EntityManager } from 'typeorm';

/**
 * Reads that may be a little behind: reports and exports. They run on the replica when DB_REPLICA_HOST
 * is set (the primary otherwise), in one repeatable-read transaction so that every query of
 * one answer sees the same moment of the replica. Anything that must see the latest commit (commands,
 * socket joins, the lineup) reads through the data source as usual, which stays on the primary.
 */
@Injectable()
export class ReplicaReads {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  async read<T>(work: (manager: EntityManager) => Promise<T>): Promise<T> {
    const runner = this.dataSource.createQueryRunner('slave');
    try {
      await runner.startTransaction('REPEATABLE READ');
      const result = await work(runner.manager);
      await runner.commitTransaction();
      return result;
    } catch (error) {
      if (runner.isTransactionActive) await runner.rollbackTransaction();
      throw error;
    } finally {
      await runner.release();
    }
  }
}
