import { randomBytes } from 'node:crypto';
import { rmSync } from 'node:fs';
import {
  type MariaDBServer,
  isMariaDBRunning,
  mariadbServer,
  queryValue,
  sql,
  startMariaDB,
  stopMariaDB,
} from '../../../../../scripts/lib/mariadb.mjs';
import { freePort } from '../../support/mail-catcher.js';

/**
 * Two fresh MariaDB servers of a spec's own under .data, the second an asynchronous replica of the first
 * (CHANGE MASTER TO over 127.0.0.1, GTID positions), as a primary and its replica would run apart.
 */
export class ReplicaPair {
  readonly primary: MariaDBServer;
  readonly replica: MariaDBServer;
  primaryPort = 0;
  replicaPort = 0;

  constructor(name: string) {
    this.primary = mariadbServer(`mariadb-${name}-primary`);
    this.replica = mariadbServer(`mariadb-${name}-replica`);
  }

  async start(): Promise<void> {
    this.removeFiles();
    this.primaryPort = await freePort();
    this.replicaPort = await freePort();
    await startMariaDB(this.primary, this.primaryPort);
    await startMariaDB(this.replica, this.replicaPort, { extraArgs: ['--server-id=2', '--read-only'] });
    const password = randomBytes(12).toString('hex');
    sql(
      this.primary,
      `CREATE USER 'replicator'@'127.0.0.1' IDENTIFIED BY '${password}'; GRANT REPLICATION SLAVE ON *.* TO 'replicator'@'127.0.0.1'`,
    );
    sql(
      this.replica,
      `CHANGE MASTER TO MASTER_HOST='127.0.0.1', MASTER_PORT=${this.primaryPort}, MASTER_USER='replicator', ` +
        `MASTER_PASSWORD='${password}', MASTER_USE_GTID=slave_pos; START SLAVE`,
    );
  }

  /** Resolves once the replica has applied everything the primary has committed. */
  async caughtUp(timeoutMs = 30_000): Promise<void> {
    const deadline = Date.now() + timeoutMs;
    for (;;) {
      const written = queryValue(this.primary, 'SELECT @@gtid_binlog_pos');
      if (written !== null && queryValue(this.replica, 'SELECT @@gtid_slave_pos') === written) return;
      if (Date.now() > deadline)
        throw new Error(`The replica did not catch up: ${queryValue(this.replica, 'SHOW SLAVE STATUS\\G')}`);
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
  }

  /** The replica keeps receiving the primary's log but applies none of it until `resume`. */
  pause(): void {
    sql(this.replica, 'STOP SLAVE SQL_THREAD');
  }

  resume(): void {
    sql(this.replica, 'START SLAVE SQL_THREAD');
  }

  stop(): void {
    for (const server of [this.replica, this.primary]) if (isMariaDBRunning(server)) stopMariaDB(server);
    this.removeFiles();
  }

  private removeFiles(): void {
    for (const server of [this.primary, this.replica]) {
      for (const file of [server.dataDir, server.logFile]) rmSync(file, { recursive: true, force: true });
    }
  }
}
